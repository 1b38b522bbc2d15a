package io.github.atomledger.atommapper.depict;

import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import java.util.TreeSet;
import org.openscience.cdk.depict.Depiction;
import org.openscience.cdk.depict.DepictionGenerator;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IChemObject;
import org.openscience.cdk.interfaces.IReaction;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;
import org.openscience.cdk.CDKConstants;

/**
 * Draws a mapped reaction as SVG with CDK's depiction: every carbon of the reactants gets a
 * colour of its own (by its map number, cycling through {@link #PALETTE}), and each product carbon
 * glows in the colour of the reactant carbon it came from, so the eye can follow each carbon
 * across the arrow. Optionally the map numbers (reactant atom indices: heavy atoms numbered
 * 1..n over the reactants in input order, copies expanded) are printed beside every mapped atom.
 *
 * <pre>{@code
 * String svg = ReactionPicture.of(input, result).titles(Map.of("pyr_c", "pyruvate")).svg();
 * }</pre>
 *
 * <p>The picture is drawn from {@link MappingResult#mappedSmiles()}; a result without a map
 * (unmappable, too large) has no picture and {@link #svg()} throws. Output is deterministic for
 * equal inputs: CDK's layout is deterministic and the SVG contains no dates. Sizes are in pixels
 * ({@link Depiction#UNITS_PX}), not CDK's default millimetres. CDK measures text with AWT fonts, so
 * a host without any font may fail. Not thread-safe per instance; build one per picture.
 *
 * <p>Does not handle: hydrogen transitions (hydrogens are implicit), stereo marks beyond what
 * CDK draws from the SMILES, more than seven carbons in distinct colours (colours repeat; switch
 * on {@link #atomIndices(boolean)} to tell them apart).
 */
public final class ReactionPicture {

    /**
     * The Okabe–Ito palette (Okabe &amp; Ito 2008, "Color Universal Design") without black, in a
     * order that keeps neighbours far apart in hue: orange, sky blue, bluish green, reddish purple,
     * blue, vermillion, yellow. Chosen because it stays distinguishable under protanopia,
     * deuteranopia and tritanopia.
     */
    public static final List<Color> PALETTE = List.of(
            new Color(0xE6, 0x9F, 0x00), new Color(0x56, 0xB4, 0xE9), new Color(0x00, 0x9E, 0x73),
            new Color(0xCC, 0x79, 0xA7), new Color(0x00, 0x72, 0xB2), new Color(0xD5, 0x5E, 0x00),
            new Color(0xF0, 0xE4, 0x42));

    /** Titles and indices: near-black, readable on white whatever the colour vision. */
    private static final Color TEXT = new Color(0x33, 0x33, 0x33);

    private final String reactionId;
    private final String mappedSmiles;
    private final String status;
    private final List<String> left;
    private final List<String> right;
    private Map<String, String> titles = Map.of();
    private boolean atomIndices;

    private ReactionPicture(String reactionId, String mappedSmiles, String status, List<String> left,
                            List<String> right) {
        this.reactionId = Objects.requireNonNull(reactionId, "reactionId");
        this.mappedSmiles = Objects.requireNonNull(mappedSmiles, "mappedSmiles");
        this.status = status;
        this.left = List.copyOf(left);
        this.right = List.copyOf(right);
    }

    /** A picture of this mapping of this reaction (the same input the mapper was given). */
    public static ReactionPicture of(ReactionInput input, MappingResult result) {
        Objects.requireNonNull(input, "input");
        return new ReactionPicture(result.reactionId(), result.mappedSmiles(), result.status().label(),
                expand(input.reactants()), expand(input.products()));
    }

    /**
     * A picture from a mapped reaction SMILES as {@link MappingResult#mappedSmiles()} writes it.
     *
     * @param reactants the species id of each reactant molecule of the SMILES, in order (copies
     *                  repeated); used for titles only, ignored when the count does not match
     * @param products  the same for the products
     */
    public static ReactionPicture of(String reactionId, String mappedSmiles, List<String> reactants,
                                     List<String> products) {
        return new ReactionPicture(reactionId, mappedSmiles, "no map", reactants, products);
    }

    private static List<String> expand(List<Participant> side) {
        List<String> out = new ArrayList<>();
        for (Participant p : side) {
            for (int k = 0; k < p.coefficient(); k++) {
                out.add(p.species());
            }
        }
        return out;
    }

    /** Titles under the molecules, by species id (a missing id shows the id itself). */
    public ReactionPicture titles(Map<String, String> speciesTitles) {
        this.titles = Map.copyOf(speciesTitles);
        return this;
    }

    /** Prints the map number beside each mapped atom. Default off. */
    public ReactionPicture atomIndices(boolean on) {
        this.atomIndices = on;
        return this;
    }

    /** True when the result has a map to draw. */
    public static boolean drawable(MappingResult result) {
        return !result.mappedSmiles().isEmpty();
    }

    /** True when this picture has a map to draw. */
    public boolean drawable() {
        return !mappedSmiles.isEmpty();
    }

    /**
     * The SVG document (UTF-8 text, sizes in px).
     *
     * @throws IllegalArgumentException when the result has no map
     * @throws IllegalStateException    when CDK cannot read the mapped SMILES or draw it
     */
    public String svg() {
        if (!drawable()) {
            throw new IllegalArgumentException("reaction " + reactionId + " has no atom map to draw (" + status + ")");
        }
        IReaction rxn;
        try {
            rxn = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseReactionSmiles(mappedSmiles);
        } catch (CDKException e) {
            throw new IllegalStateException("cannot read the mapped SMILES of " + reactionId + ": "
                    + e.getMessage(), e);
        }
        setTitles(rxn.getReactants(), left);
        setTitles(rxn.getProducts(), right);

        TreeSet<Integer> reactantCarbons = new TreeSet<>();
        for (IAtomContainer mol : rxn.getReactants().atomContainers()) {
            for (IAtom a : mol.atoms()) {
                if (isCarbon(a) && a.getMapIdx() > 0) {
                    reactantCarbons.add(a.getMapIdx());
                }
            }
        }
        Map<Integer, Integer> colourOf = new TreeMap<>();
        for (int map : reactantCarbons) {
            colourOf.put(map, colourOf.size() % PALETTE.size());
        }
        List<List<IChemObject>> groups = new ArrayList<>();
        for (int i = 0; i < PALETTE.size(); i++) {
            groups.add(new ArrayList<>());
        }
        collect(rxn.getReactants(), colourOf, groups);
        collect(rxn.getProducts(), colourOf, groups);

        DepictionGenerator gen = new DepictionGenerator().withMolTitle().withMappedRxnAlign(true)
                .withOuterGlowHighlight(6.0).withFillToFit()
                .withTitleColor(TEXT).withAnnotationColor(TEXT);
        for (int i = 0; i < PALETTE.size(); i++) {
            if (!groups.get(i).isEmpty()) {
                gen = gen.withHighlight(groups.get(i), PALETTE.get(i));
            }
        }
        if (atomIndices) {
            gen = gen.withAtomMapNumbers();
        }
        try {
            return gen.depict(rxn).toSvgStr(Depiction.UNITS_PX);
        } catch (CDKException e) {
            throw new IllegalStateException("cannot draw " + reactionId + ": " + e.getMessage(), e);
        }
    }

    private static void collect(Iterable<IAtomContainer> mols, Map<Integer, Integer> colourOf,
                                List<List<IChemObject>> groups) {
        for (IAtomContainer mol : mols) {
            for (IAtom a : mol.atoms()) {
                Integer c = isCarbon(a) ? colourOf.get(a.getMapIdx()) : null;
                if (c != null) {
                    groups.get(c).add(a);
                }
            }
        }
    }

    private static void collect(org.openscience.cdk.interfaces.IAtomContainerSet set, Map<Integer, Integer> colourOf,
                                List<List<IChemObject>> groups) {
        collect(set.atomContainers(), colourOf, groups);
    }

    private static boolean isCarbon(IAtom a) {
        return a.getAtomicNumber() != null && a.getAtomicNumber() == 6;
    }

    /** One title per molecule, copies expanded, when the SMILES has one molecule per copy. */
    private void setTitles(org.openscience.cdk.interfaces.IAtomContainerSet mols, List<String> species) {
        List<String> names = species.stream().map(id -> titles.getOrDefault(id, id)).toList();
        if (names.size() != mols.getAtomContainerCount()) {
            return;
        }
        for (int i = 0; i < names.size(); i++) {
            mols.getAtomContainer(i).setProperty(CDKConstants.TITLE, names.get(i));
        }
    }
}
