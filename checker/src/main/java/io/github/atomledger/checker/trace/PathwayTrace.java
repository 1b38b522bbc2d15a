package io.github.atomledger.checker.trace;

import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * A pathway traced in one model: every carbon of the source, in atom order.
 *
 * @param pathway   the pathway
 * @param carbons   one trace per carbon of the source structure, by atom index; empty when the
 *                  pathway cannot be traced
 * @param products  per step (0-based), the species the step makes in the direction it runs
 *                  (empty for a reaction the model lacks)
 * @param problems  why the pathway cannot be traced or has steps the model lacks; empty when fine
 */
public record PathwayTrace(Pathway pathway, List<CarbonTrace> carbons, List<Set<String>> products,
                           List<String> problems) {

    public PathwayTrace {
        Objects.requireNonNull(pathway, "pathway");
        carbons = List.copyOf(carbons);
        products = products.stream().map(Set::copyOf).toList();
        problems = List.copyOf(problems);
    }

    /** The trace of the source carbon with this heavy-atom index, or null. */
    public CarbonTrace carbon(int atom) {
        for (CarbonTrace c : carbons) {
            if (c.atom() == atom) {
                return c;
            }
        }
        return null;
    }
}
