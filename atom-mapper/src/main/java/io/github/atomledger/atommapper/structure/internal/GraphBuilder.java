package io.github.atomledger.atommapper.structure.internal;

import io.github.atomledger.atommapper.structure.StructureException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Supplier;
import org.openscience.cdk.aromaticity.Aromaticity;
import org.openscience.cdk.aromaticity.ElectronDonation;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.group.Permutation;
import org.openscience.cdk.group.PermutationGroup;
import org.openscience.cdk.group.PartitionRefinement;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IPseudoAtom;
import org.openscience.cdk.isomorphism.AtomMatcher;
import org.openscience.cdk.isomorphism.BondMatcher;
import org.openscience.cdk.isomorphism.VentoFoggia;
import org.openscience.cdk.silent.Atom;
import org.openscience.cdk.silent.AtomContainer;
import org.openscience.cdk.silent.PseudoAtom;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;

/**
 * Turns a parsed CDK container into the heavy-atom arrays of a {@code MoleculeGraph}, its
 * automorphism classes and canonical SMILES. Works on copies only; the input is not changed.
 * The automorphism classes and the canonical SMILES are computed on first use: they cost
 * milliseconds per molecule (partition refinement; InChI labelling for stereo), and a run that
 * takes every map from the cache never needs the classes.
 */
public record GraphBuilder(String[] elements, int[][] neighbours, int[][] bondCodes, Supplier<int[]> orbits,
                           int[] hydrogens, int[] heavyToAtom, Supplier<String> canonicalSmiles) {


    /** Builds the arrays from {@code parsed}; {@code source} only names the input in errors. */
    public static GraphBuilder build(IAtomContainer parsed, String source) throws StructureException {
        IAtomContainer mol;
        try {
            mol = parsed.clone();
            // Aromaticity as in Daylight SMILES; made per call so that no CDK object is shared
            // between threads. Cycles up to size 6 are the fallback for large ring systems.
            new Aromaticity(ElectronDonation.daylight(), Cycles.or(Cycles.all(), Cycles.all(6))).apply(mol);
        } catch (CloneNotSupportedException | CDKException e) {
            throw new StructureException("cannot perceive aromaticity in '" + source + "': "
                    + e.getMessage(), e);
        }
        int[] atomToHeavy = new int[mol.getAtomCount()];
        List<Integer> heavy = new ArrayList<>();
        for (int i = 0; i < mol.getAtomCount(); i++) {
            IAtom a = mol.getAtom(i);
            boolean hydrogen = !(a instanceof IPseudoAtom) && a.getAtomicNumber() != null
                    && a.getAtomicNumber() == 1;
            atomToHeavy[i] = hydrogen ? -1 : heavy.size();
            if (!hydrogen) {
                heavy.add(i);
            }
        }
        int n = heavy.size();
        String[] elements = new String[n];
        int[] hydrogens = new int[n];
        IAtomContainer symmetryCopy = new AtomContainer();
        for (int k = 0; k < n; k++) {
            IAtom a = mol.getAtom(heavy.get(k));
            boolean pseudo = a instanceof IPseudoAtom || a.getAtomicNumber() == null
                    || a.getAtomicNumber() == 0;
            elements[k] = pseudo ? "R" : a.getSymbol();
            hydrogens[k] = a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
            // Charges and hydrogens are left out: the cost of a map does not look at them.
            IAtom s = pseudo ? new PseudoAtom("R") : new Atom(a.getSymbol());
            s.setFormalCharge(0);
            s.setImplicitHydrogenCount(0);
            symmetryCopy.addAtom(s);
        }
        List<List<int[]>> adj = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            adj.add(new ArrayList<>());
        }
        for (IBond b : mol.bonds()) {
            int u = atomToHeavy[b.getBegin().getIndex()];
            int v = atomToHeavy[b.getEnd().getIndex()];
            if (u < 0 || v < 0) {
                if (u >= 0 || v >= 0) {
                    hydrogens[Math.max(u, v)]++;
                }
                continue;
            }
            int code = code(b);
            adj.get(u).add(new int[] {v, code});
            adj.get(v).add(new int[] {u, code});
            // A bond order no organic input uses stands for "aromatic" in the symmetry copy, so
            // that the two Kekule forms of a ring do not hide its flip symmetry.
            symmetryCopy.addBond(u, v, code == 4 ? IBond.Order.QUADRUPLE : b.getOrder() == null
                    || b.getOrder() == IBond.Order.UNSET ? IBond.Order.SINGLE : b.getOrder());
        }
        int[][] neighbours = new int[n][];
        int[][] codes = new int[n][];
        for (int k = 0; k < n; k++) {
            List<int[]> list = adj.get(k);
            list.sort((x, y) -> Integer.compare(x[0], y[0]));
            neighbours[k] = list.stream().mapToInt(e -> e[0]).toArray();
            codes[k] = list.stream().mapToInt(e -> e[1]).toArray();
        }
        refuseCrowdedAtoms(neighbours, source);
        Supplier<int[]> orbits = new Lazy<>(() -> orbits(symmetryCopy, n));
        Supplier<String> canonical = new Lazy<>(() -> canonicalOf(mol, source));
        return new GraphBuilder(elements, neighbours, codes, orbits, hydrogens,
                heavy.stream().mapToInt(Integer::intValue).toArray(), canonical);
    }

    private static int[] orbits(IAtomContainer symmetryCopy, int n) {
        int[] orbits = new int[n];
        Arrays.setAll(orbits, i -> i);
        if (n > 1) {
            orbits = orbitsByPiece(symmetryCopy);
        }
        return orbits;
    }

    private static String canonicalOf(IAtomContainer mol, String source) {
        String canonical = canonical(mol, SmiFlavor.Absolute | SmiFlavor.UseAromaticSymbols);
        if (canonical == null) {
            // CDK labels stereo through InChI, which refuses some inputs (a bare proton, for
            // one); the constitution alone is canonical enough for a fingerprint then.
            canonical = canonical(mol, SmiFlavor.Canonical | SmiFlavor.UseAromaticSymbols);
        }
        // Last resort, never seen on real input: the input text, which is at least deterministic.
        return canonical != null ? canonical : "input:" + source;
    }

    /**
     * Most heavy-atom neighbours one atom may have. CDK's exact symmetry computation grows
     * steeply with the number of interchangeable neighbours (twelve methyls on one atom: under a
     * second; sixty: minutes), and no metabolite comes near (coordination numbers above twelve
     * are rare even in inorganic chemistry; common practice).
     */
    static final int MAX_NEIGHBOURS = 12;

    private static void refuseCrowdedAtoms(int[][] neighbours, String source) throws StructureException {
        for (int k = 0; k < neighbours.length; k++) {
            if (neighbours[k].length > MAX_NEIGHBOURS) {
                throw new StructureException("cannot analyse '" + source + "': atom " + (k + 1) + " has "
                        + neighbours[k].length + " bonds to heavy atoms, more than " + MAX_NEIGHBOURS);
            }
        }
    }

    /**
     * Automorphism orbits computed per connected piece, joined across identical pieces by one
     * isomorphism each: exactly the orbits of the whole graph (its automorphisms are those of the
     * pieces and exchanges of identical pieces), without asking CDK for the symmetry of many
     * identical pieces at once, which takes minutes for a dozen benzenes.
     */
    private static int[] orbitsByPiece(IAtomContainer symmetryCopy) {
        int n = symmetryCopy.getAtomCount();
        int[] parent = new int[n];
        Arrays.setAll(parent, i -> i);
        for (IBond b : symmetryCopy.bonds()) {
            union(parent, b.getBegin().getIndex(), b.getEnd().getIndex());
        }
        java.util.Map<Integer, List<Integer>> pieces = new java.util.TreeMap<>();
        for (int k = 0; k < n; k++) {
            pieces.computeIfAbsent(root(parent, k), r -> new ArrayList<>()).add(k);
        }
        Arrays.setAll(parent, i -> i);
        List<int[]> repAtoms = new ArrayList<>();
        List<IAtomContainer> repContainers = new ArrayList<>();
        for (List<Integer> atoms : pieces.values()) {
            int[] global = atoms.stream().mapToInt(Integer::intValue).toArray();
            IAtomContainer piece = piece(symmetryCopy, global);
            if (global.length > 1) {
                PermutationGroup group = PartitionRefinement.forAtoms().create().getAutomorphismGroup(piece);
                int[] local = orbits(group, global.length);
                for (int i = 0; i < global.length; i++) {
                    union(parent, global[i], global[local[i]]);
                }
            }
            boolean matched = false;
            for (int r = 0; r < repContainers.size() && !matched; r++) {
                int[] rep = repAtoms.get(r);
                if (rep.length != global.length) {
                    continue;
                }
                int[] iso = VentoFoggia.findIdentical(repContainers.get(r), AtomMatcher.forElement(),
                        BondMatcher.forOrder()).match(piece);
                if (iso.length == rep.length) {
                    for (int i = 0; i < rep.length; i++) {
                        union(parent, rep[i], global[iso[i]]);
                    }
                    matched = true;
                }
            }
            if (!matched) {
                repAtoms.add(global);
                repContainers.add(piece);
            }
        }
        int[] orbits = new int[n];
        for (int k = 0; k < n; k++) {
            orbits[k] = root(parent, k);
        }
        return orbits;
    }

    private static IAtomContainer piece(IAtomContainer all, int[] atoms) {
        IAtomContainer piece = new AtomContainer();
        java.util.Map<Integer, Integer> local = new java.util.HashMap<>();
        for (int i = 0; i < atoms.length; i++) {
            IAtom a = all.getAtom(atoms[i]);
            IAtom c = a instanceof IPseudoAtom ? new PseudoAtom("R") : new Atom(a.getSymbol());
            c.setFormalCharge(0);
            c.setImplicitHydrogenCount(0);
            piece.addAtom(c);
            local.put(atoms[i], i);
        }
        for (IBond b : all.bonds()) {
            Integer u = local.get(b.getBegin().getIndex());
            Integer v = local.get(b.getEnd().getIndex());
            if (u != null && v != null) {
                piece.addBond(u, v, b.getOrder());
            }
        }
        return piece;
    }

    private static void union(int[] parent, int x, int y) {
        int a = root(parent, x);
        int b = root(parent, y);
        parent[Math.max(a, b)] = Math.min(a, b);
    }

    /**
     * The orbits of an automorphism group, each atom labelled by the smallest atom of its orbit:
     * the classes joined by the permutations stored in the group's Schreier-Sims table, which
     * generate the group. (CDK's getAutomorphismPartition enumerates every group element instead,
     * which never ends for inputs like twenty disconnected methanes, order 20!.)
     */
    private static int[] orbits(PermutationGroup group, int n) {
        int[] parent = new int[n];
        Arrays.setAll(parent, i -> i);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                Permutation p = group.get(i, j);
                if (p == null) {
                    continue;
                }
                for (int k = 0; k < n; k++) {
                    union(parent, k, p.get(k));
                }
            }
        }
        int[] orbits = new int[n];
        for (int k = 0; k < n; k++) {
            orbits[k] = root(parent, k);
        }
        return orbits;
    }

    private static int root(int[] parent, int k) {
        while (parent[k] != k) {
            parent[k] = parent[parent[k]];
            k = parent[k];
        }
        return k;
    }

    private static String canonical(IAtomContainer mol, int flavor) {
        try {
            return new SmilesGenerator(flavor).create(mol);
        } catch (CDKException | RuntimeException e) {
            return null;
        }
    }

    private static int code(IBond b) {
        if (b.isAromatic()) {
            return 4;
        }
        if (b.getOrder() == null) {
            return 1;
        }
        return switch (b.getOrder()) {
            case DOUBLE -> 2;
            case TRIPLE -> 3;
            default -> 1;
        };
    }
}
