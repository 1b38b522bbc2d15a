package io.github.atomledger.atommapper.depict;

import java.awt.Color;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.openscience.cdk.aromaticity.Aromaticity;
import org.openscience.cdk.aromaticity.ElectronDonation;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IChemObject;
import org.openscience.cdk.interfaces.IReaction;
import org.openscience.cdk.renderer.elements.MarkedElement;
import org.openscience.cdk.renderer.generators.standard.StandardGenerator;

/**
 * Decides how each carbon of a mapped reaction looks: coloured and labelled, or muted.
 *
 * <p>A <em>fragment</em> is the set of carbons one reactant molecule gives to one product molecule.
 * A fragment is <em>carried</em> when it is a whole molecule's carbons on at least one side and
 * none of its carbons changes a bond: the same heavy neighbours (by map number), the same bond
 * orders (an aromatic bond, CDK's Daylight model, matches any order, so the nicotinamide ring of
 * NAD+ and NADH counts as unchanged), the same charge. Carried fragments are the cofactors,
 * carriers and currency metabolites of the reaction, recognised from the map alone, with no list
 * of names: the ADP part of ATP, NAD(P)/NAD(P)H, the CoA part of acetyl-CoA in citrate synthase.
 * Their atoms and bonds are drawn muted; every other carbon (one that moves between molecules or
 * changes a bond) gets a look of its own, a colour and its map number as a label, so no two coloured
 * carbons of one reaction look alike even past the palette's seven colours. When no carbon is left
 * to colour (a transport, a phosphorylation such as hexokinase's, where each carbon keeps its
 * molecule and its bonds) nothing is muted either and the molecules are drawn plain.
 *
 * <p>Works on the parsed mapped reaction in place: sets CDK's annotation label on coloured
 * carbons and the markup class {@value #MUTED} on muted atoms and bonds. Not thread-safe.
 */
final class CarbonLooks {

    /** The SVG class of muted atoms and bonds; {@link ReactionPicture} gives it an opacity. */
    static final String MUTED = "muted";

    private final Map<Color, List<IChemObject>> highlights = new LinkedHashMap<>();
    private int coloured;
    private int muted;

    private CarbonLooks() {
    }

    /** Atoms to glow, grouped by colour, in palette order. */
    Map<Color, List<IChemObject>> highlights() {
        return highlights;
    }

    /** Reactant carbons with a colour and label. */
    int coloured() {
        return coloured;
    }

    /** Reactant carbons drawn muted. */
    int muted() {
        return muted;
    }

    static CarbonLooks of(IReaction rxn, List<Color> palette) {
        CarbonLooks looks = new CarbonLooks();
        List<IAtomContainer> reactants = new ArrayList<>();
        rxn.getReactants().atomContainers().forEach(reactants::add);
        List<IAtomContainer> products = new ArrayList<>();
        rxn.getProducts().atomContainers().forEach(products::add);
        Side left = Side.of(reactants);
        Side right = Side.of(products);

        // fragment key: reactant molecule index and product molecule index; value: map numbers
        Map<Long, TreeSet<Integer>> fragments = new TreeMap<>();
        for (Map.Entry<Integer, IAtom> e : left.carbons.entrySet()) {
            Integer to = right.molOf.get(e.getKey());
            if (to != null) {
                long key = ((long) left.molOf.get(e.getKey()) << 32) | to;
                fragments.computeIfAbsent(key, k -> new TreeSet<>()).add(e.getKey());
            }
        }
        Set<Integer> mutedMaps = new HashSet<>();
        Set<Long> mutedPairs = new HashSet<>();
        for (Map.Entry<Long, TreeSet<Integer>> f : fragments.entrySet()) {
            int from = (int) (f.getKey() >> 32);
            int to = (int) (long) f.getKey();
            boolean whole = f.getValue().size() == left.carbonCount(from) || f.getValue().size() == right.carbonCount(to);
            if (whole && f.getValue().stream().allMatch(m -> kept(m, left, right))) {
                mutedMaps.addAll(f.getValue());
                mutedPairs.add(f.getKey());
            }
        }
        TreeSet<Integer> colouredMaps = new TreeSet<>(left.carbons.keySet());
        colouredMaps.removeAll(mutedMaps);
        if (colouredMaps.isEmpty()) {
            mutedMaps.clear();
        }
        int k = 0;
        for (int map : colouredMaps) {
            Color c = palette.get(k++ % palette.size());
            for (Side side : List.of(left, right)) {
                IAtom a = side.byMap.get(map);
                if (a != null && isCarbon(a)) {
                    a.setProperty(StandardGenerator.ANNOTATION_LABEL, Integer.toString(map));
                    looks.highlights.computeIfAbsent(c, x -> new ArrayList<>()).add(a);
                }
            }
        }
        looks.coloured = colouredMaps.size();
        looks.muted = (int) left.carbons.keySet().stream().filter(mutedMaps::contains).count();
        if (!mutedMaps.isEmpty()) {
            Set<Integer> mutedAtoms = new HashSet<>(mutedMaps);
            mutedAtoms.addAll(hetero(left, right, mutedMaps, mutedPairs));
            for (Side side : List.of(left, right)) {
                for (IAtomContainer mol : side.mols) {
                    for (IAtom a : mol.atoms()) {
                        if (mutedAtoms.contains(a.getMapIdx())) {
                            a.setProperty(MarkedElement.CLASS_KEY, MUTED);
                        }
                    }
                    for (IBond b : mol.bonds()) {
                        if (mutedAtoms.contains(b.getBegin().getMapIdx()) && mutedAtoms.contains(b.getEnd().getMapIdx())) {
                            b.setProperty(MarkedElement.CLASS_KEY, MUTED);
                        }
                    }
                }
            }
        }
        return looks;
    }

    /**
     * Heteroatoms that travel with a muted fragment (same reactant and product molecule) and hang on
     * it through heteroatoms only: ADP's phosphates, CoA's sulfur and nitrogens, not the phosphate
     * ATP hands on to another molecule.
     */
    private static Set<Integer> hetero(Side left, Side right, Set<Integer> mutedCarbons, Set<Long> pairs) {
        Set<Integer> out = new HashSet<>();
        List<IAtom> queue = new ArrayList<>();
        for (int m : mutedCarbons) {
            queue.add(left.byMap.get(m));
        }
        while (!queue.isEmpty()) {
            IAtom a = queue.remove(queue.size() - 1);
            for (IAtom n : left.neighbours(a)) {
                int m = n.getMapIdx();
                Integer to = m > 0 ? right.molOf.get(m) : null;
                if (!isCarbon(n) && to != null && pairs.contains(((long) left.molOf.get(m) << 32) | to) && out.add(m)) {
                    queue.add(n);
                }
            }
        }
        return out;
    }

    /** True when the carbon has the same heavy neighbours, bond orders (aromatic matches any) and charge on both sides. */
    private static boolean kept(int map, Side left, Side right) {
        IAtom a = left.byMap.get(map);
        IAtom b = right.byMap.get(map);
        if (a == null || b == null || !isCarbon(b) || charge(a) != charge(b)) {
            return false;
        }
        List<IAtom> na = left.neighbours(a);
        List<IAtom> nb = right.neighbours(b);
        if (na.size() != nb.size()) {
            return false;
        }
        for (IAtom n : na) {
            if (n.getMapIdx() <= 0) {
                return false;
            }
            IBond ba = left.bond(a, n);
            IBond bb = right.bond(b, right.byMap.get(n.getMapIdx()));
            if (bb == null) {
                return false;
            }
            boolean aromatic = left.aromatic.contains(key(map, n.getMapIdx())) || right.aromatic.contains(key(map, n.getMapIdx()));
            if (!aromatic && ba.getOrder() != bb.getOrder()) {
                return false;
            }
        }
        return true;
    }

    private static int charge(IAtom a) {
        return a.getFormalCharge() == null ? 0 : a.getFormalCharge();
    }

    static boolean isCarbon(IAtom a) {
        return a.getAtomicNumber() != null && a.getAtomicNumber() == 6;
    }

    private static long key(int a, int b) {
        return ((long) Math.min(a, b) << 32) | Math.max(a, b);
    }

    /** One side of the reaction, indexed by map number. */
    private static final class Side {
        final List<IAtomContainer> mols;
        final Map<Integer, IAtom> byMap = new HashMap<>();
        final Map<Integer, Integer> molOf = new HashMap<>();
        final Map<Integer, IAtom> carbons = new TreeMap<>();
        final Map<IAtom, IAtomContainer> container = new HashMap<>();
        final Set<Long> aromatic = new HashSet<>();

        private Side(List<IAtomContainer> mols) {
            this.mols = mols;
        }

        static Side of(List<IAtomContainer> mols) {
            Side s = new Side(mols);
            for (int i = 0; i < mols.size(); i++) {
                IAtomContainer mol = mols.get(i);
                for (IAtom a : mol.atoms()) {
                    s.container.put(a, mol);
                    if (a.getMapIdx() > 0) {
                        s.byMap.put(a.getMapIdx(), a);
                        s.molOf.put(a.getMapIdx(), i);
                        if (isCarbon(a)) {
                            s.carbons.put(a.getMapIdx(), a);
                        }
                    }
                }
                s.perceiveAromaticity(mol);
            }
            return s;
        }

        /** Aromatic bonds by map numbers, perceived on a copy so the drawing keeps its Kekulé bonds. */
        private void perceiveAromaticity(IAtomContainer mol) {
            try {
                IAtomContainer copy = mol.clone();
                // Daylight's model over all cycles (rings up to six atoms when a ring system is large).
                new Aromaticity(ElectronDonation.daylight(), Cycles.or(Cycles.all(), Cycles.all(6))).apply(copy);
                for (IBond b : copy.bonds()) {
                    if (b.isAromatic() && b.getBegin().getMapIdx() > 0 && b.getEnd().getMapIdx() > 0) {
                        aromatic.add(key(b.getBegin().getMapIdx(), b.getEnd().getMapIdx()));
                    }
                }
            } catch (CloneNotSupportedException | CDKException | RuntimeException e) {
                // Without aromaticity an aromatic ring compares by its Kekulé orders: stricter, never wrong.
            }
        }

        int carbonCount(int molIndex) {
            int n = 0;
            for (IAtom a : mols.get(molIndex).atoms()) {
                n += isCarbon(a) ? 1 : 0;
            }
            return n;
        }

        List<IAtom> neighbours(IAtom a) {
            List<IAtom> out = new ArrayList<>();
            for (IAtom n : container.get(a).getConnectedAtomsList(a)) {
                if (n.getAtomicNumber() != null && n.getAtomicNumber() > 1) {
                    out.add(n);
                }
            }
            return out;
        }

        IBond bond(IAtom a, IAtom b) {
            return b == null ? null : container.get(a).getBond(a, b);
        }
    }
}
