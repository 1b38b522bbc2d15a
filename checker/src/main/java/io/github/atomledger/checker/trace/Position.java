package io.github.atomledger.checker.trace;

import java.util.Comparator;
import java.util.Objects;

/**
 * A heavy atom of a species: where a followed carbon can be. Copies of a species are not told
 * apart (a carbon in "pyruvate" may sit in any pyruvate molecule).
 *
 * @param species the species id
 * @param atom    1-based heavy-atom index in the species' structure
 */
public record Position(String species, int atom) implements Comparable<Position> {

    private static final Comparator<Position> ORDER = Comparator.comparing(Position::species)
            .thenComparingInt(Position::atom);

    public Position {
        Objects.requireNonNull(species, "species");
        if (atom < 1) {
            throw new IllegalArgumentException("atom is 1-based: " + atom);
        }
    }

    @Override
    public int compareTo(Position o) {
        return ORDER.compare(this, o);
    }
}
