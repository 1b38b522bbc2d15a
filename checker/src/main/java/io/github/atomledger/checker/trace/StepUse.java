package io.github.atomledger.checker.trace;

import io.github.atomledger.atommapper.mapping.AtomTransition;

import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * How a pathway step was taken: which species it consumes and makes in the direction it runs, and
 * the carbon map it used (as stored in the model: reactant to product, whatever the direction).
 *
 * @param step     the step as written
 * @param present  false when the model lacks the reaction
 * @param from     species the step consumes (its products when it runs backwards)
 * @param to       species it makes
 * @param curated  true when a curated map of the model was used
 * @param unusable why the step has no map to use, or null
 * @param carbons  the carbon transitions used (the optimum for an ambiguous step), empty when unusable
 */
public record StepUse(Step step, boolean present, Set<String> from, Set<String> to, boolean curated, String unusable,
                      List<AtomTransition> carbons) {

    public StepUse {
        Objects.requireNonNull(step, "step");
        from = Set.copyOf(from);
        to = Set.copyOf(to);
        carbons = List.copyOf(carbons);
    }
}
