package io.github.atomledger.atommapper.structure.internal;

import io.github.atomledger.atommapper.structure.StructureException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;
import org.openscience.cdk.aromaticity.Aromaticity;
import org.openscience.cdk.aromaticity.ElectronDonation;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IPseudoAtom;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;

/**
 * Turns a parsed CDK container into the heavy-atom arrays of a {@code MoleculeGraph}, its
 * automorphism orbits and canonical SMILES. Works on copies only; the input is not changed.
 * The orbits are computed here, so that a structure whose symmetry cannot be analysed is refused
 * when it is read (see {@link #SYMMETRY_STEP_LIMIT}); they cost microseconds for a metabolite.
 * The canonical SMILES is computed on first use: it costs milliseconds (InChI labelling for
 * stereo), and a run that takes every map from the cache never needs it.
 */
public record GraphBuilder(String[] elements, int[][] neighbours, int[][] bondCodes, int[] orbits,
                           int[] hydrogens, int[] heavyToAtom, Supplier<String> canonicalSmiles) {

    /**
     * Work limit of the orbit computation, in the steps of {@code StepBudget} (array elements
     * scanned, sorted or written; deterministic, unlike a time limit). A structure that needs
     * more is refused with a {@link StructureException}, which the checker reports as
     * {@code structure.invalid}.
     *
     * <p>Why refuse rather than fall back to something cheaper: the cheap stand-ins are
     * partitions coarser or finer than the true orbits, and neither is harmless. Coarser classes
     * (the colour-refinement cells alone) let {@code Search} try one atom per class as the image
     * in an untouched product molecule, so it could skip an image that no automorphism relates to
     * the one tried, miss the optimum and still call it proven. Finer classes keep the search
     * exact (it only tries more images), but they change what is reported:
     * {@code AtomMapper.sameUpToSymmetry}, the phase-2 class keys and the status would tell
     * symmetric maps apart, and {@code Prochirality} would miss centres whose two branches no
     * longer share a class. Measured with every atom alone: nine reactions of the mapping tests
     * (citrate synthase, aconitase, succinate dehydrogenase, fumarase and phenylalanine
     * hydroxylase among them) turn from "mapped" to "ambiguous" with a spurious alternative, and
     * {@code sameUpToSymmetry} tells the two ends of succinate apart. So neither is safe, and a
     * structure whose symmetry cannot be analysed is refused.
     *
     * <p>The value: a yeast-GEM molecule needs at most about 6 000 steps (mean under 1 000); the
     * hostile inputs of {@code SymmetricStructureTest} at most about 630 000 (polyisobutylene of
     * 200 units, 601 atoms); a 600-atom Cai–Fürer–Immerman graph about 7 million. Twenty million
     * steps take a few tenths of a second, and a polyisobutylene of 1 500 units (4 501 atoms) is
     * refused.
     */
    public static final long SYMMETRY_STEP_LIMIT = 20_000_000L;

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
        for (int k = 0; k < n; k++) {
            IAtom a = mol.getAtom(heavy.get(k));
            boolean pseudo = a instanceof IPseudoAtom || a.getAtomicNumber() == null
                    || a.getAtomicNumber() == 0;
            elements[k] = pseudo ? "R" : a.getSymbol();
            hydrogens[k] = a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
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
        }
        int[][] neighbours = new int[n][];
        int[][] codes = new int[n][];
        for (int k = 0; k < n; k++) {
            List<int[]> list = adj.get(k);
            list.sort((x, y) -> Integer.compare(x[0], y[0]));
            neighbours[k] = list.stream().mapToInt(e -> e[0]).toArray();
            codes[k] = list.stream().mapToInt(e -> e[1]).toArray();
        }
        int[] orbits;
        try {
            // Element and bond code only: charges and hydrogens are left out, as in the cost of
            // a map, and aromatic bonds have a code of their own, so that the two Kekulé forms of
            // a ring do not hide its flip symmetry.
            orbits = Orbits.of(elements, neighbours, codes, new StepBudget(SYMMETRY_STEP_LIMIT));
        } catch (StepBudget.Exhausted e) {
            throw new StructureException("symmetry of '" + source + "' is too complex to analyse within "
                    + SYMMETRY_STEP_LIMIT + " steps (" + n + " heavy atoms)", e);
        }
        Supplier<String> canonical = new Lazy<>(() -> canonicalOf(mol, source));
        return new GraphBuilder(elements, neighbours, codes, orbits, hydrogens,
                heavy.stream().mapToInt(Integer::intValue).toArray(), canonical);
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
