package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.transitions.CarbonMapText;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Curated carbon maps (AtomLedger annotations with {@code origin="curated"}):
 * {@code mapping.curated-invalid} when the map is not a carbon map of the reaction's structures
 * (unknown atoms, non-carbons, atoms used twice or not at all), and {@code mapping.curated-differs}
 * when it is valid but differs from every minimum-cost map (not merely by symmetry): the finding
 * names the carbons that go elsewhere and how many more weighted bond edits the curated map needs.
 * A map within the review margin of the optimum is not reported here ("criterion undecided", see
 * {@link MappingReviewCheck}).
 * A curated map can be right where the criterion is not (enzymes do not always take the
 * cheapest route); the finding asks for a look, it does not settle the chemistry.
 */
public final class CuratedMapCheck implements ModelCheck {

    private final boolean validity;

    private CuratedMapCheck(boolean validity) {
        this.validity = validity;
    }

    public static List<ModelCheck> all() {
        return List.of(new CuratedMapCheck(true), new CuratedMapCheck(false));
    }

    @Override
    public String ruleId() {
        return validity ? "mapping.curated-invalid" : "mapping.curated-differs";
    }

    @Override
    public String description() {
        return validity ? "A curated carbon map is not a valid map of the reaction's carbons."
                : "A curated carbon map differs from the minimum bond-edit map.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.ERROR;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            CuratedVerdict v = context.mapping().curated().get(r.id());
            if (v == null) {
                continue;
            }
            // Issue 15: a map read from an RXN file says so, and names the file.
            ImportedMap file = context.mapping().imported().get(r.id());
            String from = file != null && file.read() ? " (from " + file.file() + ")" : "";
            if (validity && !v.valid()) {
                Map<String, String> data = new TreeMap<>(Map.of("problems", String.join("; ", v.problems()),
                        "problemCount", Integer.toString(v.problems().size())));
                if (!from.isEmpty()) {
                    data.put("file", file.file());
                }
                out.add(context.finding(this, r.id(), r.line(), "The curated carbon map of reaction " + r.id() + from
                        + " is invalid: " + String.join("; ", v.problems()) + ".", data));
            } else if (!validity && v.valid() && !v.agrees() && !v.undecided() && !v.differing().isEmpty()) {
                Map<String, String> data = new TreeMap<>();
                List<String> moved = new ArrayList<>();
                List<String> named = new ArrayList<>();
                SpeciesStructures structures = context.mapping().structures();
                for (AtomTransition t : v.differing()) {
                    moved.add(t.from() + "->" + t.to());
                    named.add(structures.name(t.from()) + "->" + structures.name(t.to()));
                }
                data.put("differing", String.join(",", moved));
                data.put("differingCount", Integer.toString(moved.size()));
                data.put("extraCost", Integer.toString(v.extraCost()));
                ReactionMapping m = context.mapping().mappings().get(r.id());
                if (m != null) {
                    data.put("optimum", String.join("; ", CarbonMapText.format(m.carbons())));
                }
                String cost = v.extraCost() >= 0 ? " and needs " + Wording.count(v.extraCost(), "weighted bond edit") + " more than the optimum" : "";
                if (!from.isEmpty()) {
                    data.put("file", file.file());
                }
                out.add(context.finding(this, r.id(), r.line(), "The curated carbon map of reaction " + r.id() + from
                        + " differs from the minimum bond-edit map: " + Wording.count(moved.size(), "carbon")
                        + (moved.size() == 1 ? " goes" : " go") + " elsewhere (" + Wording.shortList(named, 6) + ")"
                        + cost + ".", data));
            }
        }
        return out;
    }
}
