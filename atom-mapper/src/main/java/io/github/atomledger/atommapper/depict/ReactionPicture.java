package io.github.atomledger.atommapper.depict;

import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
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
import org.openscience.cdk.renderer.elements.MarkedElement;
import org.openscience.cdk.renderer.generators.standard.StandardGenerator;

/**
 * Draws a mapped reaction as SVG with CDK's depiction. Molecules (or parts of molecules) that the
 * map carries over unchanged, such as cofactors, carriers and currency metabolites, are drawn
 * muted; every carbon that moves between molecules or changes a bond gets a look of its own: a
 * colour (cycling through {@link #PALETTE}) and its map number as a small label (reactant heavy
 * atoms numbered 1..n in input order, copies expanded), and each product carbon glows in the
 * colour and carries the number of the reactant carbon it came from, so the eye can follow it
 * across the arrow. How carbons are chosen: {@link CarbonLooks}. Optionally the map numbers of
 * all other unmuted mapped atoms are printed too.
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
 * CDK draws from the SMILES, more than seven distinct colours (colours repeat past seven; the
 * labels keep every coloured carbon distinct).
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

    /**
     * The drawing style; part of every cache key of pictures, so a change of colours, muting or
     * labels here redraws cached pictures. 2: cofactors muted, only carbons that move or change
     * coloured, each with its map number (issue 13).
     */
    public static final int STYLE_VERSION = 2;

    /** Opacity of muted atoms and bonds. */
    private static final String MUTED_OPACITY = "0.3";

    private static final java.util.regex.Pattern MUTED_ELEMENT = java.util.regex.Pattern.compile(
            "(<[a-z]+\\b[^>]*?\\sclass=(['\"])" + CarbonLooks.MUTED + "\\b[^'\"]*\\2)");

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

    /** Prints the map number beside every mapped atom that is not muted (coloured carbons always have one). Default off. */
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

        CarbonLooks looks = CarbonLooks.of(rxn, PALETTE);
        DepictionGenerator gen = new DepictionGenerator().withMolTitle().withMappedRxnAlign(true)
                .withOuterGlowHighlight(6.0).withFillToFit()
                .withTitleColor(TEXT).withAnnotationColor(TEXT);
        for (Map.Entry<Color, List<IChemObject>> e : looks.highlights().entrySet()) {
            gen = gen.withHighlight(e.getValue(), e.getKey());
        }
        if (atomIndices) {
            labelEveryMappedAtom(rxn);
        }
        try {
            return mute(gen.depict(rxn).toSvgStr(Depiction.UNITS_PX));
        } catch (CDKException e) {
            throw new IllegalStateException("cannot draw " + reactionId + ": " + e.getMessage(), e);
        }
    }

    /** Map numbers beside every mapped atom that is not muted (coloured carbons have theirs already). */
    private static void labelEveryMappedAtom(IReaction rxn) {
        for (org.openscience.cdk.interfaces.IAtomContainerSet set : List.of(rxn.getReactants(), rxn.getProducts())) {
            for (IAtomContainer mol : set.atomContainers()) {
                for (IAtom a : mol.atoms()) {
                    if (a.getMapIdx() > 0 && !CarbonLooks.MUTED.equals(a.getProperty(MarkedElement.CLASS_KEY))) {
                        a.setProperty(StandardGenerator.ANNOTATION_LABEL, Integer.toString(a.getMapIdx()));
                    }
                }
            }
        }
    }

    /**
     * Gives CDK's muted atoms and bonds ({@code class="muted ..."}) a low opacity, in the SVG itself
     * so the drawing looks the same wherever it is shown.
     */
    static String mute(String svg) {
        return MUTED_ELEMENT.matcher(svg).replaceAll(m -> java.util.regex.Matcher.quoteReplacement(
                m.group(1) + " opacity=" + m.group(2) + MUTED_OPACITY + m.group(2)));
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
