package io.github.atomledger.atommapper.depict;

import io.github.atomledger.atommapper.structure.Structure;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.TreeMap;
import org.openscience.cdk.CDKConstants;
import org.openscience.cdk.depict.Depiction;
import org.openscience.cdk.depict.DepictionGenerator;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IChemObject;
import org.openscience.cdk.interfaces.IReaction;
import org.openscience.cdk.renderer.SymbolVisibility;
import org.openscience.cdk.renderer.color.IAtomColorer;
import org.openscience.cdk.renderer.generators.standard.StandardGenerator;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

/**
 * Draws one step of a traced pathway as SVG: the followed carbons glow in the colour of the source
 * carbon they carry, with its label ({@code C1}) beside them, on both sides of the arrow; every
 * other atom and bond is drawn in a muted grey, so the eye follows the source carbons from step to
 * step. The caller says which atom carries which colour key (a source carbon keeps its key across
 * all steps) and gives map numbers only to align the products with the reactants.
 *
 * <pre>{@code
 * String svg = TracedStepPicture.of("R_BCKD", List.of(kic, coa), List.of(ivcoa, co2)).svg();
 * }</pre>
 *
 * <p>Deterministic for equal input (CDK's layout is deterministic, the SVG has no dates); sizes in
 * pixels. Keys cycle through {@link ReactionPicture#PALETTE}; labels tell repeated colours apart.
 * Not thread-safe per instance. Does not handle: hydrogens (implicit), more than one label per atom
 * beyond what fits ({@code C5/C9} is written as given).
 */
public final class TracedStepPicture {

    /** Skeleton, symbols and titles of what is not followed: readable, but quieter than the colours. */
    static final Color MUTED = new Color(0x9A, 0x9A, 0x9A);
    /** Labels of followed carbons: near-black. */
    private static final Color TEXT = new Color(0x33, 0x33, 0x33);

    /**
     * One molecule (one copy of a species) of the step, with per-heavy-atom arrays (0-based by
     * heavy-atom index, each as long as the structure's heavy-atom count).
     *
     * @param structure  the structure
     * @param title      the title under it (usually the species name)
     * @param mapNumbers map number per atom for alignment, 0 for none (reactant numbers must be
     *                   distinct; a product atom repeats the number of the reactant atom it came from)
     * @param keys       colour key per atom: 0 not followed, else 1-based (key k draws in
     *                   {@link #colour(int) colour(k)})
     * @param labels     label per atom ({@code "C1"}), null or "" for none
     */
    public record Molecule(Structure structure, String title, int[] mapNumbers, int[] keys, String[] labels) {
        public Molecule {
            Objects.requireNonNull(structure, "structure");
            int n = structure.heavyAtomCount();
            if (mapNumbers.length != n || keys.length != n || labels.length != n) {
                throw new IllegalArgumentException("expected " + n + " entries per atom array for " + structure.source());
            }
            mapNumbers = mapNumbers.clone();
            keys = keys.clone();
            labels = labels.clone();
        }
    }

    private final String id;
    private final List<Molecule> left;
    private final List<Molecule> right;

    private TracedStepPicture(String id, List<Molecule> left, List<Molecule> right) {
        this.id = Objects.requireNonNull(id, "id");
        this.left = List.copyOf(left);
        this.right = List.copyOf(right);
    }

    /** A picture of a step: consumed molecules on the left, made ones on the right. */
    public static TracedStepPicture of(String id, List<Molecule> left, List<Molecule> right) {
        return new TracedStepPicture(id, left, right);
    }

    /** The colour of key {@code k} (1-based), cycling through {@link ReactionPicture#PALETTE}. */
    public static Color colour(int key) {
        if (key < 1) {
            throw new IllegalArgumentException("keys are 1-based: " + key);
        }
        return ReactionPicture.PALETTE.get((key - 1) % ReactionPicture.PALETTE.size());
    }

    /**
     * The SVG document (UTF-8 text, sizes in px).
     *
     * @throws IllegalStateException when CDK cannot read a structure back or draw the step
     */
    public String svg() {
        StringBuilder smiles = new StringBuilder();
        side(left, smiles);
        smiles.append(">>");
        side(right, smiles);
        IReaction rxn;
        try {
            rxn = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseReactionSmiles(smiles.toString());
        } catch (CDKException e) {
            throw new IllegalStateException("cannot read the step " + id + " back: " + e.getMessage(), e);
        }
        TreeMap<Integer, List<IChemObject>> byKey = new TreeMap<>();
        mark(rxn.getReactants().atomContainers(), left, byKey);
        mark(rxn.getProducts().atomContainers(), right, byKey);
        DepictionGenerator gen = new DepictionGenerator().withMolTitle().withMappedRxnAlign(true)
                .withOuterGlowHighlight(7.0).withFillToFit().withTitleColor(MUTED).withAnnotationColor(TEXT).withAnnotationScale(0.6)
                .withAtomColors(new Muted())
                // Carbons stay skeletal even though they carry map numbers (CDK would spell them out).
                .withParam(StandardGenerator.Visibility.class, SymbolVisibility.iupacRecommendationsWithoutTerminalCarbon());
        for (var e : byKey.entrySet()) {
            gen = gen.withHighlight(e.getValue(), colour(e.getKey()));
        }
        try {
            return gen.depict(rxn).toSvgStr(Depiction.UNITS_PX);
        } catch (CDKException | RuntimeException e) {
            throw new IllegalStateException("cannot draw the step " + id + ": " + e.getMessage(), e);
        }
    }

    private static void side(List<Molecule> molecules, StringBuilder out) {
        for (int i = 0; i < molecules.size(); i++) {
            if (i > 0) {
                out.append('.');
            }
            Molecule m = molecules.get(i);
            out.append(m.structure().smilesWithAtomClasses(m.mapNumbers()));
        }
    }

    /** Sets titles and labels, clears the map numbers once alignment no longer needs them, groups atoms by key. */
    private static void mark(Iterable<IAtomContainer> containers, List<Molecule> molecules, TreeMap<Integer, List<IChemObject>> byKey) {
        int i = 0;
        for (IAtomContainer mol : containers) {
            if (i >= molecules.size()) {
                break;
            }
            Molecule m = molecules.get(i++);
            mol.setProperty(CDKConstants.TITLE, m.title());
            List<IAtom> heavy = new ArrayList<>();
            for (IAtom a : mol.atoms()) {
                if (a.getAtomicNumber() == null || a.getAtomicNumber() != 1) {
                    heavy.add(a);
                }
            }
            for (int k = 0; k < heavy.size() && k < m.keys().length; k++) {
                IAtom a = heavy.get(k);
                if (m.keys()[k] > 0) {
                    byKey.computeIfAbsent(m.keys()[k], x -> new ArrayList<>()).add(a);
                    for (var bond : mol.getConnectedBondsList(a)) {
                        int other = heavy.indexOf(bond.getOther(a));
                        if (other > k && other < m.keys().length && m.keys()[other] == m.keys()[k]) {
                            byKey.get(m.keys()[k]).add(bond);
                        }
                    }
                }
                String label = m.labels()[k];
                if (label != null && !label.isEmpty()) {
                    a.setProperty(StandardGenerator.ANNOTATION_LABEL, label);
                }
            }
        }
    }

    /** Every atom symbol, and so (CDK takes the foreground from a plain carbon) every bond, in grey. */
    private static final class Muted implements IAtomColorer {
        @Override
        public Color getAtomColor(IAtom atom) {
            return MUTED;
        }

        @Override
        public Color getAtomColor(IAtom atom, Color defaultColor) {
            return MUTED;
        }
    }
}
