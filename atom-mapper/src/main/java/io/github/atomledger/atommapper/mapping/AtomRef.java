package io.github.atomledger.atommapper.mapping;

import java.util.Comparator;
import java.util.Objects;

/**
 * One heavy atom of one copy of a species on one side of a reaction.
 *
 * @param species the species id
 * @param copy 1-based copy number (a species with coefficient 2 has copies 1 and 2)
 * @param atom 1-based index among the structure's non-hydrogen atoms, in input order (SMILES
 *     string order, or InChI's own numbering)
 */
public record AtomRef(String species, int copy, int atom) implements Comparable<AtomRef> {

    private static final Comparator<AtomRef> ORDER = Comparator.comparing(AtomRef::species)
            .thenComparingInt(AtomRef::copy).thenComparingInt(AtomRef::atom);

    /** Rejects a null species and non-positive numbers. */
    public AtomRef {
        Objects.requireNonNull(species, "species");
        if (copy < 1 || atom < 1) {
            throw new IllegalArgumentException("copy and atom are 1-based: " + copy + ", " + atom);
        }
    }

    /** Orders by species, then copy, then atom. */
    @Override
    public int compareTo(AtomRef o) {
        return ORDER.compare(this, o);
    }

    /** {@code species#copy:atom}, e.g. {@code s_0001#1:3}. */
    @Override
    public String toString() {
        return species + "#" + copy + ":" + atom;
    }
}
