package io.github.atomledger.checker.engine;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.check.balance.ReactionClass;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/** Turns a model reaction into mapper input, or into the status that makes mapping pointless. */
public final class MappingInputs {

    /** Only reactions that conserve atoms by nature are mapped. */
    private static final Set<ReactionClass> MAPPED_CLASSES = io.github.atomledger.checker.check.mapping.Coverage.MAPPED_CLASSES;

    private MappingInputs() {
    }

    /**
     * The mapper's input for a reaction, exactly as the mapping stage builds it (species merged per
     * side, copies by coefficient), or empty when the reaction is not mapped (its class, a missing
     * structure, a coefficient that is not a small whole number). For exports of finished runs.
     */
    public static java.util.Optional<ReactionInput> inputOf(ReactionInfo r, ReactionBalance b, SpeciesStructures structures) {
        return java.util.Optional.ofNullable(prepare(r, b, structures).input());
    }

    static MappingStage.Prepared prepare(ReactionInfo r, ReactionBalance b, SpeciesStructures structures) {
        if (!MAPPED_CLASSES.contains(b.reactionClass())) {
            return early(ReactionMapping.without(r.id(), MapStatus.SKIPPED,
                    b.reactionClass().label() + " reaction: not mapped", List.of()));
        }
        TreeSet<String> missing = new TreeSet<>();
        for (Participant p : r.participants()) {
            if (structures.get(p.species()).isEmpty()) {
                missing.add(p.species());
            }
        }
        if (!missing.isEmpty()) {
            return early(ReactionMapping.without(r.id(), MapStatus.NO_STRUCTURE,
                    "no structure for " + String.join(", ", missing), List.copyOf(missing)));
        }
        Map<String, Integer> reactants = new LinkedHashMap<>();
        Map<String, Integer> products = new LinkedHashMap<>();
        for (int side = 0; side < 2; side++) {
            Map<String, Integer> into = side == 0 ? reactants : products;
            for (Participant p : side == 0 ? r.reactants() : r.products()) {
                Rational c;
                try {
                    c = p.stoichiometryText() == null ? null : Rational.parse(p.stoichiometryText());
                } catch (NumberFormatException e) {
                    c = null;
                }
                if (c == null || !c.isInteger() || c.signum() <= 0 || c.numerator().bitLength() > 16) {
                    String text = p.stoichiometryText() == null ? "unset" : p.stoichiometryText();
                    return early(ReactionMapping.without(r.id(), MapStatus.UNMAPPABLE, "the coefficient of " + p.species()
                            + " is " + text + ", not a small positive whole number", List.of()));
                }
                into.merge(p.species(), c.numerator().intValueExact(), Integer::sum);
            }
        }
        List<io.github.atomledger.atommapper.mapping.Participant> in = new ArrayList<>();
        List<io.github.atomledger.atommapper.mapping.Participant> out = new ArrayList<>();
        StringBuilder canonical = new StringBuilder();
        for (int side = 0; side < 2; side++) {
            Map<String, Integer> m = side == 0 ? reactants : products;
            List<io.github.atomledger.atommapper.mapping.Participant> list = side == 0 ? in : out;
            canonical.append(side == 0 ? "R=" : ";P=");
            m.forEach((species, n) -> {
                SpeciesStructures.Resolved s = structures.get(species).orElseThrow();
                list.add(new io.github.atomledger.atommapper.mapping.Participant(species, s.structure(), n));
            });
            new TreeMap<>(m).forEach((species, n) -> canonical.append(species).append('*').append(n).append('*')
                    .append(structures.get(species).orElseThrow().structure().source()).append('|'));
        }
        return new MappingStage.Prepared(new ReactionInput(r.id(), in, out), canonical.toString(), null);
    }

    private static MappingStage.Prepared early(ReactionMapping m) {
        return new MappingStage.Prepared(null, "", m);
    }
}
