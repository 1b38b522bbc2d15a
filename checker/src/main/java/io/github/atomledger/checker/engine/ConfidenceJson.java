package io.github.atomledger.checker.engine;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.MapConfidence;
import io.github.atomledger.atommapper.mapping.Rearrangement;
import io.github.atomledger.atommapper.mapping.WeightCheck;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.List;

/**
 * The {@code confidence} object of a {@link MappingCache} entry: {@link MapConfidence} as JSON and
 * back. An entry without it (or with null) reads as {@link MapConfidence#NONE}.
 */
final class ConfidenceJson {

    private ConfidenceJson() {
    }

    static ObjectNode write(MapConfidence c) {
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        o.put("computed", c.computed());
        o.put("margin", c.margin());
        o.put("marginProven", c.marginProven());
        o.put("runnerUpCost", c.runnerUpCost());
        o.set("runnerUp", MappingCache.transitions(c.runnerUp()));
        o.set("atStake", atoms(c.atStake()));
        o.set("rearrangements", rearrangements(c.rearrangements()));
        o.set("runnerUpRearrangements", rearrangements(c.runnerUpRearrangements()));
        ArrayNode weights = o.putArray("weights");
        for (WeightCheck w : c.weights()) {
            ObjectNode row = weights.addObject();
            row.put("carbonCarbonWeight", w.carbonCarbonWeight());
            row.put("outcome", w.outcome().label());
            row.set("carbons", MappingCache.transitions(w.carbons()));
            row.set("rearrangements", rearrangements(w.rearrangements()));
        }
        o.put("note", c.note());
        return o;
    }

    private static ArrayNode atoms(List<AtomRef> atoms) {
        ArrayNode a = JsonNodeFactory.instance.arrayNode();
        atoms.forEach(r -> a.addArray().add(r.species()).add(r.copy()).add(r.atom()));
        return a;
    }

    private static ArrayNode rearrangements(List<Rearrangement> list) {
        ArrayNode a = JsonNodeFactory.instance.arrayNode();
        for (Rearrangement r : list) {
            ObjectNode row = a.addObject();
            row.put("kind", r.kind().name());
            row.set("atoms", atoms(r.atoms()));
            row.put("description", r.description());
        }
        return a;
    }

    static MapConfidence read(JsonNode o) {
        if (o == null || o.isNull()) {
            return MapConfidence.NONE;
        }
        List<WeightCheck> weights = new ArrayList<>();
        o.get("weights").forEach(w -> weights.add(new WeightCheck(w.get("carbonCarbonWeight").asInt(),
                WeightCheck.Outcome.fromLabel(w.get("outcome").asText()), MappingCache.transitions(w.get("carbons")),
                rearrangements(w.get("rearrangements")))));
        return new MapConfidence(o.get("computed").asBoolean(), o.get("margin").asInt(), o.get("marginProven").asBoolean(),
                o.get("runnerUpCost").asInt(), MappingCache.transitions(o.get("runnerUp")), atoms(o.get("atStake")),
                rearrangements(o.get("rearrangements")), rearrangements(o.get("runnerUpRearrangements")), weights,
                o.get("note").asText());
    }

    private static List<AtomRef> atoms(JsonNode a) {
        List<AtomRef> out = new ArrayList<>();
        a.forEach(r -> out.add(new AtomRef(r.get(0).asText(), r.get(1).asInt(), r.get(2).asInt())));
        return out;
    }

    private static List<Rearrangement> rearrangements(JsonNode a) {
        List<Rearrangement> out = new ArrayList<>();
        a.forEach(r -> out.add(new Rearrangement(Rearrangement.Kind.valueOf(r.get("kind").asText()),
                atoms(r.get("atoms")), r.get("description").asText())));
        return out;
    }
}
