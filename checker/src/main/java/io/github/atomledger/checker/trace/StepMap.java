package io.github.atomledger.checker.trace;

import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.check.mapping.CuratedVerdict;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.transitions.TransitionAnnotation;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The carbon map a step uses, in the direction it runs: which species it consumes and makes, and
 * for every consumed carbon the product carbons it can become (copies of a species merged). A
 * valid curated map in the model wins over the inferred one and is taken atom for atom; an inferred
 * map is only known up to the symmetry of the molecules, so it is applied to whole symmetry classes.
 * Several tables mean co-optimal maps (ambiguous). {@code unusable} says why there is no map to use.
 */
record StepMap(Step step, boolean present, Set<String> from, Set<String> to, String unusable,
               List<Map<Position, List<Position>>> tables, boolean curated, List<String> stereoNotes,
               List<AtomTransition> used) {

    /** What a report shows of this step. */
    StepUse use() {
        return new StepUse(step, present, from, to, curated, unusable, used);
    }

    static StepMap of(Step step, ReactionInfo reaction, MappingData data) {
        return of(step, reaction, data, false);
    }

    /**
     * @param bestFoundToo use a best-found map as well (where label can go, not where it goes)
     */
    static StepMap of(Step step, ReactionInfo reaction, MappingData data, boolean bestFoundToo) {
        if (reaction == null) {
            return new StepMap(step, false, Set.of(), Set.of(), "is not a reaction of the model", List.of(), false, List.of(),
                    List.of());
        }
        Set<String> reactants = species(reaction.reactants());
        Set<String> products = species(reaction.products());
        Set<String> from = step.backwards() ? products : reactants;
        Set<String> to = step.backwards() ? reactants : products;
        String id = reaction.id();
        TransitionAnnotation stored = data.stored().get(id);
        CuratedVerdict verdict = data.curated().get(id);
        if (stored != null && stored.isCurated() && verdict != null) {
            if (!verdict.valid()) {
                return unusable(step, from, to, "has a curated map that is not a valid carbon map (mapping.curated-invalid)");
            }
            return new StepMap(step, true, from, to, null, List.of(table(stored.carbons(), step.backwards())), true, List.of(),
                    stored.carbons());
        }
        ReactionMapping m = data.mappings().get(id);
        if (m == null) {
            return unusable(step, from, to, "was not mapped");
        }
        return switch (m.status()) {
            case BEST_FOUND -> bestFoundToo
                    ? new StepMap(step, true, from, to, null, List.of(table(m.carbons(), step.backwards())), false,
                    m.stereoNotes(), m.carbons())
                    : unusable(step, from, to, "has only the best map found within the time budget (cost "
                    + m.cost() + ", proven lower bound " + m.lowerBound() + "), not a proven one");
            case MAPPED, AMBIGUOUS -> {
                List<Map<Position, List<Position>>> tables = new ArrayList<>();
                tables.add(table(m.carbons(), step.backwards()));
                m.alternatives().forEach(a -> tables.add(table(a, step.backwards())));
                yield new StepMap(step, true, from, to, null, tables, false, m.stereoNotes(), m.carbons());
            }
            default -> unusable(step, from, to, "has no atom map (" + m.status().label()
                    + (m.reason().isEmpty() ? "" : ": " + m.reason()) + ")");
        };
    }

    private static StepMap unusable(Step step, Set<String> from, Set<String> to, String why) {
        return new StepMap(step, true, from, to, why, List.of(), false, List.of(), List.of());
    }

    private static Set<String> species(List<Participant> side) {
        Set<String> out = new LinkedHashSet<>();
        side.forEach(p -> out.add(p.species()));
        return out;
    }

    private static Map<Position, List<Position>> table(List<AtomTransition> carbons, boolean backwards) {
        Map<Position, List<Position>> out = new HashMap<>();
        for (AtomTransition t : carbons) {
            var a = backwards ? t.to() : t.from();
            var b = backwards ? t.from() : t.to();
            out.computeIfAbsent(new Position(a.species(), a.atom()), k -> new ArrayList<>())
                    .add(new Position(b.species(), b.atom()));
        }
        return out;
    }
}
