package io.github.atomledger.atommapper.mapping;

import java.util.List;
import java.util.Objects;

/**
 * A rearrangement pattern recognised in a map: the kinds of bond change with which an enzyme can
 * move part of a skeleton, and which minimum bond edits is known to explain the cheap way
 * instead (by moving a heteroatom). Recognising one says "look closer", not "this is wrong".
 *
 * @param kind        the pattern
 * @param atoms       the reactant atoms involved, in the order the kind documents
 * @param description the pattern in words, naming the atoms, one sentence without final stop
 */
public record Rearrangement(Kind kind, List<AtomRef> atoms, String description) {

    /** The patterns recognised. */
    public enum Kind {
        /**
         * A carbon group leaves one atom for a bonded neighbour of it in the same molecule (a
         * 1,2-shift, as in methylmalonyl-CoA mutase or the alkyl migration of a
         * reductoisomerase); also a carbon group moving further around one ring. Atoms: the
         * group's first carbon, the atom it leaves, the atom it joins.
         */
        CARBON_SHIFT("1,2-shift"),
        /**
         * Within one molecule a skeleton bond (C–C, or C to a heteroatom with two heavy
         * neighbours, such as an ether oxygen) is broken and a C–C bond formed, as in a
         * sigmatropic rearrangement. Atoms: the broken bond's two atoms, then the formed bond's.
         */
        SKELETON_REARRANGEMENT("skeleton rearrangement"),
        /**
         * A heteroatom outside a ring leaves one ring atom for another atom of the same ring,
         * the cheap stand-in for a carbon group migrating the other way (the NIH shift of
         * aromatic hydroxylations). Atoms: the heteroatom, the ring atom it leaves, the one it joins.
         */
        RING_WALK("heteroatom moving around a ring");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        /** The pattern's name in words, e.g. "1,2-shift". */
        public String label() {
            return label;
        }
    }

    /** Rejects nulls and copies the list. */
    public Rearrangement {
        Objects.requireNonNull(kind, "kind");
        atoms = List.copyOf(atoms);
        Objects.requireNonNull(description, "description");
    }
}
