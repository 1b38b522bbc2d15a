package io.github.atomledger.atommapper.structure.internal;

import io.github.atomledger.atommapper.structure.StructureException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SortedSet;
import org.openscience.cdk.aromaticity.Aromaticity;
import org.openscience.cdk.aromaticity.ElectronDonation;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.group.Partition;
import org.openscience.cdk.group.PartitionRefinement;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IPseudoAtom;
import org.openscience.cdk.silent.Atom;
import org.openscience.cdk.silent.AtomContainer;
import org.openscience.cdk.silent.PseudoAtom;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;

/**
 * Turns a parsed CDK container into the heavy-atom arrays of a {@code MoleculeGraph}, its
 * automorphism classes and canonical SMILES. Works on copies only; the input is not changed.
 */
public record GraphBuilder(String[] elements, int[][] neighbours, int[][] bondCodes, int[] orbits,
                           int[] hydrogens, int[] heavyToAtom, String canonicalSmiles) {

    /** Aromaticity as in Daylight SMILES; cycles up to size 6 keep large ring systems cheap. */
    private static final Aromaticity AROMATICITY = new Aromaticity(ElectronDonation.daylight(),
            Cycles.or(Cycles.all(), Cycles.all(6)));

    /** Builds the arrays from {@code parsed}; {@code source} only names the input in errors. */
    public static GraphBuilder build(IAtomContainer parsed, String source) throws StructureException {
        IAtomContainer mol;
        try {
            mol = parsed.clone();
            AROMATICITY.apply(mol);
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
        int[] orbits = new int[n];
        Arrays.setAll(orbits, i -> i);
        if (n > 1) {
            Partition p = PartitionRefinement.forAtoms().create().getAutomorphismPartition(symmetryCopy);
            for (int c = 0; c < p.size(); c++) {
                SortedSet<Integer> cell = p.getCell(c);
                int first = cell.first();
                for (int atom : cell) {
                    orbits[atom] = first;
                }
            }
        }
        String canonical = canonical(mol, SmiFlavor.Absolute | SmiFlavor.UseAromaticSymbols);
        if (canonical == null) {
            // CDK labels stereo through InChI, which refuses some inputs (a bare proton, for
            // one); the constitution alone is canonical enough for a fingerprint then.
            canonical = canonical(mol, SmiFlavor.Canonical | SmiFlavor.UseAromaticSymbols);
        }
        if (canonical == null) {
            throw new StructureException("cannot write canonical SMILES for '" + source + "'");
        }
        return new GraphBuilder(elements, neighbours, codes, orbits, hydrogens,
                heavy.stream().mapToInt(Integer::intValue).toArray(), canonical);
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
