package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.trace.CarbonStatus;
import io.github.atomledger.checker.trace.CarbonTrace;
import io.github.atomledger.checker.trace.FateOutcome;
import io.github.atomledger.checker.trace.PathwayTrace;
import io.github.atomledger.checker.trace.TraceResults;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The one-line account of a traced pathway that the console and the HTML report share: how many
 * source carbons end in which species (by species name, in the order they arrive; a carbon split
 * over species counts its share in each), how many are split or undecided, and how the declared
 * fates fared: {@code 6 carbons: 1 carbon dioxide, 2 acetyl-CoA, 3 acetoacetate; fates: 3 hold}.
 */
final class TraceSummary {

    private TraceSummary() {
    }

    static String line(ModelView model, TraceResults results, PathwayTrace t) {
        if (t.carbons().isEmpty()) {
            return "not traced: " + String.join("; ", t.problems());
        }
        Map<String, Rational> shares = new TreeMap<>();
        Map<String, Integer> arrival = new HashMap<>();
        int split = 0;
        int undecided = 0;
        for (CarbonTrace c : t.carbons()) {
            if (c.status() == CarbonStatus.UNDECIDED) {
                undecided++;
                continue;
            }
            if (c.status() == CarbonStatus.SPLIT) {
                split++;
            }
            c.sharesBySpecies().forEach((s, w) -> {
                shares.merge(s, w, Rational::add);
                arrival.merge(s, c.lastMove(), Math::min);
            });
        }
        List<String> species = new ArrayList<>(shares.keySet());
        species.sort(Comparator.comparingInt((String s) -> arrival.get(s)).thenComparing(shares::get)
                .thenComparing(s -> name(model, s)));
        List<String> parts = new ArrayList<>();
        for (String s : species) {
            parts.add(amount(shares.get(s)) + " " + name(model, s));
        }
        if (undecided > 0) {
            parts.add(undecided + " undecided");
        }
        StringBuilder sb = new StringBuilder().append(t.carbons().size()).append(" carbon")
                .append(t.carbons().size() == 1 ? "" : "s").append(": ").append(String.join(", ", parts));
        if (split > 0) {
            sb.append(" (").append(split).append(" split over equivalent positions)");
        }
        List<FateOutcome> outcomes = results.outcomes(t.pathway().name());
        if (!outcomes.isEmpty()) {
            Map<FateOutcome.Verdict, Integer> n = new TreeMap<>();
            outcomes.forEach(o -> n.merge(o.verdict(), 1, Integer::sum));
            List<String> v = new ArrayList<>();
            n.forEach((k, count) -> v.add(count + " " + (k == FateOutcome.Verdict.HOLDS ? "hold" + (count == 1 ? "s" : "")
                    : k.label())));
            sb.append("; fates: ").append(String.join(", ", v));
        }
        if (!t.problems().isEmpty()) {
            sb.append("; ").append(String.join("; ", t.problems()));
        }
        return sb.toString();
    }

    /** A share sum as people read it: "3", "1.5", "1/3". */
    static String amount(Rational r) {
        return r.isInteger() ? r.numerator().toString() : r.isTerminatingDecimal() ? r.toDecimalString() : r.toString();
    }

    /** The species' name from the model, its id when it has none. */
    static String name(ModelView model, String species) {
        return model.species(species).map(s -> s.name()).orElse(species);
    }
}
