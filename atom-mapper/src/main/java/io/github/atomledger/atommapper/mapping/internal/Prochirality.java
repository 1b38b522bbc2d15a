package io.github.atomledger.atommapper.mapping.internal;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.structure.MoleculeGraph;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.SortedSet;
import java.util.TreeSet;

/**
 * Finds branches that are equivalent by constitution only and that a map tells apart.
 *
 * <p>A prochiral centre here is a saturated atom (single bonds only, four substituents counting
 * hydrogens) alone in its automorphism class, with exactly two heavy substituents in one class
 * and all other substituents different: citrate's C3 with its two CH2-COO⁻ arms, glycerol's C2.
 * The two branches look the same to the graph (and so to the mapper), but an enzyme binds them
 * differently. When the carbons of the two branches come from (or go to) different places, the
 * graph alone cannot say which branch is which, and a curated pin is needed. Stereo descriptors
 * of the input are not read.
 */
public final class Prochirality {

    /** A flagged pair of branches: the carbons concerned and a one-sentence note. */
    public record Flag(List<AtomRef> atoms, String note) {
    }

    private Prochirality() {
    }

    /**
     * @param side the side to inspect
     * @param place for each atom of {@code side}, the automorphism class of its partner on the
     *     other side (-1 when unmapped)
     */
    public static List<Flag> find(SideGraph side, int[] place) {
        List<Flag> flags = new ArrayList<>();
        for (int m = 0; m < side.moleculeCount(); m++) {
            MoleculeGraph g = side.structure(m).graph();
            int off = side.offset(m);
            int n = g.atomCount();
            int[] cell = new int[n];
            for (int i = 0; i < n; i++) {
                cell[g.orbit(i)]++;
            }
            for (int c = 0; c < n; c++) {
                int[] nb = g.neighbours(c);
                if (cell[g.orbit(c)] != 1 || nb.length < 3 || nb.length + g.hydrogens(c) != 4) {
                    continue;
                }
                boolean saturated = true;
                for (int code : g.bondCodes(c)) {
                    saturated &= code == 1;
                }
                if (!saturated) {
                    continue;
                }
                int[] pair = equalPair(g, nb);
                if (pair == null) {
                    continue;
                }
                SortedSet<Integer> a = branch(g, c, pair[0]);
                SortedSet<Integer> b = branch(g, c, pair[1]);
                if (a.contains(pair[1]) || !a.stream().anyMatch(i -> g.element(i).equals("C"))) {
                    continue;
                }
                List<Integer> placesA = places(g, a, off, place);
                List<Integer> placesB = places(g, b, off, place);
                if (!placesA.equals(placesB)) {
                    List<AtomRef> atoms = new ArrayList<>();
                    for (int i : a) {
                        if (g.element(i).equals("C")) {
                            atoms.add(side.ref(off + i));
                        }
                    }
                    for (int i : b) {
                        if (g.element(i).equals("C")) {
                            atoms.add(side.ref(off + i));
                        }
                    }
                    atoms.sort(null);
                    AtomRef centre = side.ref(off + c);
                    flags.add(new Flag(List.copyOf(atoms), centre.species() + " copy " + centre.copy()
                            + ": the branches at atoms " + name(side, m, pair[0]) + " and " + name(side, m, pair[1])
                            + " of prochiral centre " + name(side, m, c) + " are equivalent by constitution only, "
                            + "and the map sends their carbons to different places; which branch is which "
                            + "is the enzyme's stereospecific choice and needs a curated pin"));
                }
            }
        }
        return flags;
    }

    /** The atom's readable label (its atom class, "C3") or its 1-based index. */
    private static String name(SideGraph side, int molecule, int atom) {
        return side.structure(molecule).atomLabel(atom + 1);
    }

    private static int[] equalPair(MoleculeGraph g, int[] nb) {
        int[] found = null;
        for (int i = 0; i < nb.length; i++) {
            for (int j = i + 1; j < nb.length; j++) {
                if (g.orbit(nb[i]) == g.orbit(nb[j])) {
                    if (found != null) {
                        return null;
                    }
                    found = new int[] {nb[i], nb[j]};
                }
            }
        }
        return found;
    }

    private static SortedSet<Integer> branch(MoleculeGraph g, int centre, int start) {
        SortedSet<Integer> seen = new TreeSet<>();
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        seen.add(start);
        queue.add(start);
        while (!queue.isEmpty()) {
            for (int b : g.neighbours(queue.poll())) {
                if (b != centre && seen.add(b)) {
                    queue.add(b);
                }
            }
        }
        return seen;
    }

    private static List<Integer> places(MoleculeGraph g, SortedSet<Integer> atoms, int off, int[] place) {
        List<Integer> out = new ArrayList<>();
        for (int i : atoms) {
            if (g.element(i).equals("C")) {
                out.add(place[off + i]);
            }
        }
        out.sort(null);
        return out;
    }
}
