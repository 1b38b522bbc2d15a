package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.mapping.MapConfidence;
import io.github.atomledger.atommapper.mapping.Rearrangement;
import io.github.atomledger.atommapper.mapping.WeightCheck;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.transitions.CarbonMapText;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.BiFunction;

/**
 * Where the criterion may be confidently wrong. {@code mapping.review}: a proven optimal map
 * (mapped or ambiguous) that shows a rearrangement pattern, whose carbon fate loses under an
 * alternative C–C weight or ties there with a rearranging map, or whose margin to the runner-up
 * is at most the review margin; the
 * finding names the carbons at stake and the runner-up and offers a curated pin as the remedy.
 * Reactions with a valid curated map stay quiet (the curator has decided), and so do maps that
 * win by a wide margin. {@code mapping.curated-undecided}: a curated map that differs from the
 * optimum by no more than the criterion can tell apart, accepted as "curated, criterion undecided".
 * Statuses are not changed: this is advice for expert review, not a verdict on the chemistry.
 */
public final class MappingReviewCheck implements ModelCheck {

    /** How many runner-up lines a message quotes before "...". */
    private static final int QUOTED_LINES = 3;

    private final boolean review;

    private MappingReviewCheck(boolean review) {
        this.review = review;
    }

    public static List<ModelCheck> all() {
        return List.of(new MappingReviewCheck(true), new MappingReviewCheck(false));
    }

    @Override
    public String ruleId() {
        return review ? "mapping.review" : "mapping.curated-undecided";
    }

    @Override
    public String description() {
        return review ? "A proven optimal map may still show the wrong carbon fate: it rearranges a skeleton, "
                + "depends on the bond weights or barely beats the runner-up; pin the intended map."
                : "A curated carbon map differs from the optimum by less than the criterion can decide; it is accepted.";
    }

    @Override
    public Severity defaultSeverity() {
        return review ? Severity.WARNING : Severity.INFO;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        MappingData data = context.mapping();
        List<Finding> out = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            ReactionMapping m = data.mappings().get(r.id());
            CuratedVerdict curated = data.curated().get(r.id());
            if (m == null) {
                continue;
            }
            if (!review) {
                if (curated != null && curated.valid() && curated.undecided()) {
                    out.add(undecided(context, r, curated, data.reviewMargin()));
                }
                continue;
            }
            List<MapConfidence.Reason> reasons = m.confidence().reviewReasons(data.reviewMargin());
            boolean proven = m.status() == MapStatus.MAPPED || m.status() == MapStatus.AMBIGUOUS;
            if (proven && !reasons.isEmpty() && (curated == null || !curated.valid())) {
                out.add(finding(context, r, m, reasons));
            }
        }
        return out;
    }

    private Finding finding(CheckContext context, ReactionInfo r, ReactionMapping m, List<MapConfidence.Reason> reasons) {
        MapConfidence c = m.confidence();
        Map<String, String> data = new TreeMap<>();
        data.put("reasons", String.join(",", reasons.stream().map(MapConfidence.Reason::label).toList()));
        data.put("optimum", String.join("; ", CarbonMapText.format(m.carbons())));
        data.put("cost", Integer.toString(m.cost()));
        data.put("remedy", "pin the intended carbon map with a curated annotation");
        data.put("reviewMargin", Integer.toString(context.mapping().reviewMargin()));
        List<String> why = new ArrayList<>();
        if (reasons.contains(MapConfidence.Reason.REARRANGEMENT)) {
            List<String> words = c.rearrangements().stream().map(Rearrangement::description).toList();
            data.put("rearrangements", String.join("; ", words));
            why.add("it explains the change by " + (words.get(0).startsWith("a ") ? "" : "a ") + words.get(0)
                    + (words.size() > 1 ? " (and " + (words.size() - 1)
                    + " more pattern(s))" : ""));
        }
        List<String> weights = new ArrayList<>();
        for (WeightCheck w : c.weights()) {
            weights.add(w.carbonCarbonWeight() + ":" + w.outcome().label());
            if (!w.carbons().isEmpty()) {
                data.put("weight." + w.carbonCarbonWeight(), String.join("; ", CarbonMapText.format(w.carbons())));
            }
            if (w.questionsTheFate()) {
                why.add("with a C–C weight of " + w.carbonCarbonWeight() + " another carbon fate is "
                        + (w.outcome() == WeightCheck.Outcome.CHANGED ? "cheaper" : "as cheap")
                        + (w.rearrangements().isEmpty() ? "" : " (" + w.rearrangements().get(0).description() + ")"));
            }
        }
        data.put("weights", String.join(",", weights));
        if (c.hasMargin()) {
            data.put("margin", Integer.toString(c.margin()));
            data.put("marginProven", Boolean.toString(c.marginProven()));
        }
        if (reasons.contains(MapConfidence.Reason.MARGIN)) {
            why.add("it beats the runner-up by only " + (c.marginProven() ? "" : "at least ")
                    + Wording.count(c.margin(), "weighted bond edit"));
        }
        String runner = "";
        if (!c.runnerUp().isEmpty()) {
            data.put("runnerUp", String.join("; ", CarbonMapText.format(c.runnerUp())));
            data.put("runnerUpCost", Integer.toString(c.runnerUpCost()));
            data.put("atStake", atoms(c.atStake(), (species, atom) -> Integer.toString(atom)));
            SpeciesStructures structures = context.mapping().structures();
            List<String> lines = CarbonMapText.format(moved(c.runnerUp(), c.atStake()), structures::label);
            String dearer = reasons.contains(MapConfidence.Reason.MARGIN) ? "" : " (dearer by "
                    + (c.marginProven() ? "" : "at least ") + Wording.count(c.margin(), "weighted bond edit") + ")";
            runner = "; the runner-up" + dearer + " sends " + (c.atStake().size() == 1 ? "carbon " : "carbons ")
                    + atoms(c.atStake(), structures::label) + " elsewhere ("
                    + String.join("; ", lines.subList(0, Math.min(QUOTED_LINES, lines.size())))
                    + (lines.size() > QUOTED_LINES ? "; ..." : "") + ")";
        }
        String subject = m.status() == MapStatus.AMBIGUOUS ? "The reported map of ambiguous reaction " : "The map of reaction ";
        return context.finding(this, r.id(), r.line(), subject + r.id()
                + " may not show the enzyme's carbon fate: " + String.join(", and ", why) + runner
                + "; pin the intended map with a curated carbon map.", data);
    }

    private Finding undecided(CheckContext context, ReactionInfo r, CuratedVerdict v, int reviewMargin) {
        Map<String, String> data = new TreeMap<>();
        List<String> moved = new ArrayList<>();
        for (AtomTransition t : v.differing()) {
            moved.add(t.from() + "->" + t.to());
        }
        data.put("differing", String.join(",", moved));
        data.put("extraCost", Integer.toString(v.extraCost()));
        data.put("reviewMargin", Integer.toString(reviewMargin));
        return context.finding(this, r.id(), r.line(), "The curated carbon map of reaction " + r.id()
                + " differs from the minimum bond-edit map by " + Wording.count(v.extraCost(), "weighted bond edit")
                + ", closer than the criterion can decide; it is accepted (curated, criterion undecided).",
                data);
    }

    /** The transitions of {@code map} that start at one of {@code atoms}. */
    private static List<AtomTransition> moved(List<AtomTransition> map, List<AtomRef> atoms) {
        Set<AtomRef> wanted = new HashSet<>(atoms);
        return map.stream().filter(t -> wanted.contains(t.from())).toList();
    }

    /** Atoms grouped by molecule copy and named by {@code names}, e.g. {@code "hpp: 6 7 8; o2: 1"}. */
    private static String atoms(List<AtomRef> atoms, BiFunction<String, Integer, String> names) {
        Map<String, List<String>> byMolecule = new TreeMap<>();
        for (AtomRef a : atoms) {
            byMolecule.computeIfAbsent(a.copy() == 1 ? a.species() : a.species() + "#" + a.copy(),
                    k -> new ArrayList<>()).add(names.apply(a.species(), a.atom()));
        }
        List<String> parts = new ArrayList<>();
        byMolecule.forEach((k, v) -> parts.add(k + ": " + String.join(" ", v)));
        return String.join("; ", parts);
    }
}
