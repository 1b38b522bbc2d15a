package io.github.atomledger.atommapper.structure;

import java.util.Arrays;

/**
 * The heavy-atom graph of a {@link Structure}: what the atom mapper compares. Hydrogens are left
 * out (they are implicit); charges are left out (they never block a map).
 *
 * <p>Atoms are numbered 0..{@link #atomCount()}-1 in input order among the non-hydrogen atoms
 * (the public, 1-based atom index is this number plus one). Bond codes are 1 (single), 2
 * (double), 3 (triple) and 4 (aromatic, as perceived under the Daylight model so that two Kekulé
 * drawings of one ring compare equal); 0 means no bond. Immutable and thread-safe; accessors
 * return copies or primitives.
 */
public final class MoleculeGraph {

    /** Bond code for "no bond". */
    public static final int NO_BOND = 0;
    /** Bond code for an aromatic bond. */
    public static final int AROMATIC = 4;

    private final String[] elements;
    private final int[][] neighbours;
    private final int[][] bondCodes;
    private final int[] orbit;
    private final int[] hydrogens;

    MoleculeGraph(String[] elements, int[][] neighbours, int[][] bondCodes, int[] orbit, int[] hydrogens) {
        this.elements = elements;
        this.hydrogens = hydrogens;
        this.neighbours = neighbours;
        this.bondCodes = bondCodes;
        this.orbit = orbit;
    }

    /** Number of heavy atoms. */
    public int atomCount() {
        return elements.length;
    }

    /** Element symbol of atom {@code i}; "R" for a wildcard or pseudo atom. */
    public String element(int i) {
        return elements[i];
    }

    /** Hydrogens on atom {@code i}, implicit and explicit together. */
    public int hydrogens(int i) {
        return hydrogens[i];
    }

    /** Heavy-atom neighbours of atom {@code i}, ascending. */
    public int[] neighbours(int i) {
        return neighbours[i].clone();
    }

    /** Bond codes parallel to {@link #neighbours(int)}. */
    public int[] bondCodes(int i) {
        return bondCodes[i].clone();
    }

    /** Bond code between atoms {@code i} and {@code j}, {@link #NO_BOND} when not bonded. */
    public int bond(int i, int j) {
        int k = Arrays.binarySearch(neighbours[i], j);
        return k < 0 ? NO_BOND : bondCodes[i][k];
    }

    /**
     * Automorphism class of atom {@code i}: the smallest atom number in its orbit. Two atoms have
     * the same class exactly when some automorphism of this graph that keeps elements and bond
     * codes maps one onto the other; stereo, charges and hydrogens are not looked at. The classes
     * are exact, neither coarser nor finer than the orbits (computed by colour refinement and an
     * individualisation–refinement search after McKay 1981, when the structure is read), and
     * deterministic: the same graph in the same atom order gives the same numbers. A structure
     * whose symmetry needs more than a fixed number of steps to analyse is refused when it is
     * read, so every graph has its exact orbits.
     */
    public int orbit(int i) {
        return orbit[i];
    }
}
