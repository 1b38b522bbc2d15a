package io.github.atomledger.atommapper.mapping;

import java.util.List;
import java.util.Objects;

/**
 * The carbon fate under one alternative weighting of the criterion: the C–C weight one lower or
 * one higher than the options' (2 and 4 around the default 3), other weights unchanged.
 *
 * @param carbonCarbonWeight the alternative C–C weight
 * @param outcome            what the fate does under it
 * @param carbons            for {@link Outcome#CHANGED}: the carbon transitions of the map the
 *                           alternative weighting prefers; for {@link Outcome#TIED}: those of the
 *                           other fate that becomes as cheap; else empty. Sorted.
 * @param rearrangements     the rearrangement patterns of that other map (empty when there is none)
 */
public record WeightCheck(int carbonCarbonWeight, Outcome outcome, List<AtomTransition> carbons,
                          List<Rearrangement> rearrangements) {

    /** A check without another map (robust, same, undecided). */
    public WeightCheck(int carbonCarbonWeight, Outcome outcome, List<AtomTransition> carbons) {
        this(carbonCarbonWeight, outcome, carbons, List.of());
    }

    /** What the carbon fate does under the alternative weighting. */
    public enum Outcome {
        /** Proven unchanged without mapping again: the margin is too wide for the weight to matter. */
        ROBUST("robust"),
        /** Mapped again: the same carbon fate (or fates) come out optimal. */
        SAME("same"),
        /** Mapped again: the fate stays optimal, but another fate becomes just as cheap. */
        TIED("tied"),
        /** Mapped again: another carbon fate is strictly cheaper; the fate depends on the weights. */
        CHANGED("changed"),
        /** Mapping again did not finish within the budget. */
        UNDECIDED("undecided");

        private final String label;

        Outcome(String label) {
            this.label = label;
        }

        /** The machine name, e.g. "changed". */
        public String label() {
            return label;
        }

        /** The outcome with this label. */
        public static Outcome fromLabel(String label) {
            for (Outcome o : values()) {
                if (o.label.equals(label)) {
                    return o;
                }
            }
            throw new IllegalArgumentException("unknown weight outcome '" + label + "'");
        }
    }

    /** Rejects nulls and copies the list, sorted. */
    public WeightCheck {
        Objects.requireNonNull(outcome, "outcome");
        carbons = carbons.stream().sorted().toList();
        rearrangements = List.copyOf(rearrangements);
    }

    /**
     * True when this weighting calls the fate into question: another fate is strictly cheaper, or
     * as cheap and explained by a rearrangement pattern (the kind of move the criterion is known to
     * undervalue). A tie with an ordinary alternative, such as the known tie of transaminations at
     * C–C weight 2, does not.
     */
    public boolean questionsTheFate() {
        return outcome == Outcome.CHANGED || outcome == Outcome.TIED && !rearrangements.isEmpty();
    }
}
