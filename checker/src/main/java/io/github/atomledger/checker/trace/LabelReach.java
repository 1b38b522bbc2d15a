package io.github.atomledger.checker.trace;

import java.util.List;
import java.util.Objects;

/**
 * Where label from one source atom can go through the model's maps.
 *
 * @param source  the labelled atom
 * @param reached every position label can reach, the source first, then by distance and position
 */
public record LabelReach(Position source, List<Reached> reached) {

    /**
     * A position label can reach, with one shortest chain of reactions that takes it there.
     *
     * @param position the position
     * @param chain    the steps in order ({@code -R_X} when run backwards); empty for the source
     */
    public record Reached(Position position, List<Step> chain) {
        public Reached {
            Objects.requireNonNull(position, "position");
            chain = List.copyOf(chain);
        }
    }

    public LabelReach {
        Objects.requireNonNull(source, "source");
        reached = List.copyOf(reached);
    }
}
