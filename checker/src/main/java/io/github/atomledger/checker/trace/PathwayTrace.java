package io.github.atomledger.checker.trace;

import java.util.List;
import java.util.Objects;

/**
 * A pathway traced in one model: every carbon of the source, in atom order.
 *
 * @param pathway   the pathway
 * @param carbons   one trace per carbon of the source structure, by atom index; empty when the
 *                  pathway cannot be traced
 * @param steps     how each step was taken (in order): species consumed and made, the map used
 * @param problems  why the pathway cannot be traced or has steps the model lacks; empty when fine
 */
public record PathwayTrace(Pathway pathway, List<CarbonTrace> carbons, List<StepUse> steps, List<String> problems) {

    public PathwayTrace {
        Objects.requireNonNull(pathway, "pathway");
        carbons = List.copyOf(carbons);
        steps = List.copyOf(steps);
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
