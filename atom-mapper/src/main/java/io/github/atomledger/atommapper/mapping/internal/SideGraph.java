package io.github.atomledger.atommapper.mapping.internal;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.structure.MoleculeGraph;
import io.github.atomledger.atommapper.structure.Structure;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * All heavy atoms of one reaction side as one graph: copies expanded, molecules laid end to end in
 * participant order. Atom numbers are 0-based offsets into this concatenation. Immutable after
 * construction.
 */
public final class SideGraph {

    final int n;
    final String[] element;
    final int[] elementId;
    final int[][] nbr;
    final int[][] code;
    final byte[][] bond;
    final int[] molecule;
    final int[] local;
    final int[] orbitKey;
    final int[] hydrogens;
    final List<Structure> molStructure = new ArrayList<>();
    final List<String> molSpecies = new ArrayList<>();
    final List<Integer> molCopy = new ArrayList<>();
    final List<Integer> molOffset = new ArrayList<>();

    /**
     * @param participants the side
     * @param elementIds shared element numbering of both sides (filled as needed)
     * @param orbitIds shared numbering of (species, orbit) classes of both sides (filled as needed)
     */
    public SideGraph(List<Participant> participants, Map<String, Integer> elementIds,
                     Map<String, Integer> orbitIds) {
        Map<String, Integer> copies = new HashMap<>();
        int total = 0;
        for (Participant p : participants) {
            for (int c = 0; c < p.coefficient(); c++) {
                molStructure.add(p.structure());
                molSpecies.add(p.species());
                molCopy.add(copies.merge(p.species(), 1, Integer::sum));
                molOffset.add(total);
                total += p.structure().heavyAtomCount();
            }
        }
        n = total;
        element = new String[n];
        elementId = new int[n];
        nbr = new int[n][];
        code = new int[n][];
        bond = new byte[n][];
        molecule = new int[n];
        local = new int[n];
        orbitKey = new int[n];
        hydrogens = new int[n];
        for (int m = 0; m < molStructure.size(); m++) {
            MoleculeGraph g = molStructure.get(m).graph();
            int off = molOffset.get(m);
            for (int i = 0; i < g.atomCount(); i++) {
                int a = off + i;
                element[a] = g.element(i);
                elementId[a] = elementIds.computeIfAbsent(element[a], k -> elementIds.size());
                int[] nb = g.neighbours(i);
                for (int k = 0; k < nb.length; k++) {
                    nb[k] += off;
                }
                nbr[a] = nb;
                code[a] = g.bondCodes(i);
                molecule[a] = m;
                local[a] = i;
                hydrogens[a] = g.hydrogens(i);
                orbitKey[a] = orbitIds.computeIfAbsent(molStructure.get(m).fingerprint() + "/" + g.orbit(i),
                        k -> orbitIds.size());
            }
        }
        for (int a = 0; a < n; a++) {
            bond[a] = new byte[n];
            for (int k = 0; k < nbr[a].length; k++) {
                bond[a][nbr[a][k]] = (byte) code[a][k];
            }
        }
    }

    /** Number of heavy atoms on this side. */
    public int atomCount() {
        return n;
    }

    /** Number of molecule copies on this side. */
    public int moleculeCount() {
        return molStructure.size();
    }

    /** The public name of atom {@code a}. */
    public AtomRef ref(int a) {
        int m = molecule[a];
        return new AtomRef(molSpecies.get(m), molCopy.get(m), local[a] + 1);
    }

    /** The combined atom number of a public atom name, or -1 when there is no such atom. */
    public int indexOf(AtomRef ref) {
        for (int m = 0; m < molStructure.size(); m++) {
            if (molSpecies.get(m).equals(ref.species()) && molCopy.get(m) == ref.copy()) {
                return ref.atom() <= molStructure.get(m).heavyAtomCount() ? molOffset.get(m) + ref.atom() - 1 : -1;
            }
        }
        return -1;
    }

    /** Element symbol of atom {@code a}. */
    public String element(int a) {
        return element[a];
    }

    /** Bond code between two atoms, 0 when not bonded. */
    public int bond(int a, int b) {
        return bond[a][b];
    }

    /** Neighbours of atom {@code a}. */
    public int[] neighbours(int a) {
        return nbr[a];
    }

    /** The (species-level) automorphism class of atom {@code a}, shared numbering with the other side. */
    public int orbitKey(int a) {
        return orbitKey[a];
    }

    /** Molecule copy of atom {@code a}. */
    public int molecule(int a) {
        return molecule[a];
    }

    /** Structure of molecule copy {@code m}. */
    public Structure structure(int m) {
        return molStructure.get(m);
    }

    /** First combined atom number of molecule copy {@code m}. */
    public int offset(int m) {
        return molOffset.get(m);
    }

    /** Hydrogen count of atom {@code a}. */
    public int hydrogens(int a) {
        return hydrogens[a];
    }
}
