package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.mapping.MapConfidence;
import io.github.atomledger.atommapper.mapping.Rearrangement;
import io.github.atomledger.atommapper.mapping.WeightCheck;
import io.github.atomledger.checker.check.structure.SpeciesStructures;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The confidence fields of a reaction's {@code mapping} object in the JSON report (documented in
 * docs/report-schema.json): {@code margin} (a number, or null where none was computed),
 * {@code marginProven}, {@code runnerUp} (its carbon transitions as {@code carbon}, its cost and
 * patterns; null when there is none), {@code rearrangements} and {@code weights}.
 */
final class ConfidenceFields {

    private ConfidenceFields() {
    }

    static Map<String, Object> of(MapConfidence c, SpeciesStructures structures) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("margin", c.hasMargin() ? c.margin() : null);
        o.put("marginProven", c.hasMargin() ? c.marginProven() : null);
        if (c.runnerUp().isEmpty()) {
            o.put("runnerUp", null);
        } else {
            Map<String, Object> runner = new LinkedHashMap<>();
            runner.put("carbon", JsonReporter.transitions(c.runnerUp(), structures));
            runner.put("cost", c.runnerUpCost());
            runner.put("rearrangements", rearrangements(c.runnerUpRearrangements(), structures));
            o.put("runnerUp", runner);
        }
        o.put("rearrangements", rearrangements(c.rearrangements(), structures));
        List<Object> weights = new ArrayList<>();
        for (WeightCheck w : c.weights()) {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("carbonCarbonWeight", w.carbonCarbonWeight());
            row.put("outcome", w.outcome().label());
            row.put("carbon", JsonReporter.transitions(w.carbons(), structures));
            row.put("rearrangements", rearrangements(w.rearrangements(), structures));
            weights.add(row);
        }
        o.put("weights", weights);
        return o;
    }

    private static List<Object> rearrangements(List<Rearrangement> list, SpeciesStructures structures) {
        List<Object> out = new ArrayList<>();
        for (Rearrangement r : list) {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("kind", r.kind().label());
            row.put("description", r.description());
            List<Object> atoms = new ArrayList<>();
            r.atoms().forEach(a -> atoms.add(JsonReporter.atom(a, structures)));
            row.put("atoms", atoms);
            out.add(row);
        }
        return out;
    }
}
