package io.github.atomledger.atommapper.depict;

import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;

import io.github.atomledger.atommapper.depict.internal.LayoutRoutes;
import io.github.atomledger.atommapper.depict.internal.ReactionScene;

import java.awt.Color;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
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
 * Draws a mapped reaction as SVG with CDK's layout and structure generator. Molecules (or parts of
 * molecules) that the map carries over unchanged, such as cofactors, carriers and currency
 * metabolites, are drawn muted; every carbon that moves between molecules or changes a bond gets a
 * look of its own: a colour (cycling through {@link #PALETTE}) and its map number as a small label
 * (reactant heavy atoms numbered 1..n in input order, copies expanded), and each product carbon
 * glows in the colour and carries the number of the reactant carbon it came from, so the eye can
 * follow it across the arrow. How carbons are chosen: {@link CarbonLooks}. Optionally the map
 * numbers of all other unmuted mapped atoms are printed too.
 *
 * <pre>{@code
 * String svg = ReactionPicture.of(input, result).titles(Map.of("pyr_c", "pyruvate")).svg();
 * }</pre>
 *
 * <p>The picture is drawn from {@link MappingResult#mappedSmiles()}; a result without a map
 * (unmappable, too large) has no picture and {@link #svg()} throws. Where CDK's layout fails, the
 * picture falls back rather than failing ({@link #draw()}: each molecule laid out alone, then a
 * frame in place of a molecule CDK cannot lay out or draw), and says so in its notes. Output is
 * deterministic for equal inputs: CDK's layout is deterministic and the SVG contains no dates.
 * Sizes are in pixels. Atom symbols are glyph outlines from AWT fonts, so a host without any font
 * may fail and different hosts may draw slightly different glyphs; titles are SVG text. Not
 * thread-safe per instance; build one per picture (distinct pictures may be drawn in parallel).
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

    /** Opacity of muted atoms and bonds. */
    private static final String MUTED_OPACITY = "0.3";

    private static final java.util.regex.Pattern MUTED_ELEMENT = java.util.regex.Pattern.compile(
            "(<[a-z]+\\b[^>]*?\\sclass=(['\"])" + CarbonLooks.MUTED + "\\b[^'\"]*\\2)");

    /** Titles and indices: near-black, readable on white whatever the colour vision. */
    private static final Color TEXT = new Color(0x33, 0x33, 0x33);

    /**
     * The version of how pictures look. Anything that changes the drawing for the same input
     * (colours, sizes, layout routes, the SVG writer) must increase it: caches of drawn pictures
     * key on it, so a stale picture is never shown. 4: cofactors muted, only carbons that move
     * or change a bond coloured, each with its map number.
     */
    public static final int STYLE_VERSION = 4;

    /**
     * What a cache of drawn pictures must key on besides the input: {@link #STYLE_VERSION} and
     * the CDK version (its layout and glyphs are part of the picture).
     */
    public static String styleKey() {
        return "style=" + STYLE_VERSION + ";cdk=" + org.openscience.cdk.CDK.getVersion();
    }

    private static final String SPECIES = "atomledger.species";
    private static final String POSITION = "atomledger.position";

    private final String reactionId;
    private final String mappedSmiles;
    private final String status;
    private final List<String> left;
    private final List<String> right;
    private Map<String, String> titles = Map.of();
    private boolean atomIndices;
    private boolean indicesOnRequest;

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

    /**
     * With {@link #atomIndices(boolean)} on, hides the map numbers unless the SVG is opened at its
     * fragment {@code #indices} ({@code picture.svg#indices}), so one file serves both views. Default off.
     */
    public ReactionPicture indicesOnRequest(boolean on) {
        this.indicesOnRequest = on;
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
     * @throws IllegalStateException    when CDK cannot read the mapped SMILES or draw it at all
     */
    public String svg() {
        Drawing d = draw();
        if (!d.drawn()) {
            throw new IllegalStateException("cannot draw " + reactionId + ": " + String.join(" ", d.notes()));
        }
        return d.svg();
    }

    /**
     * The picture, or the reason there is none: CDK failing on one molecule or on the whole
     * layout does not throw; the picture falls back (see {@link Drawing#notes()}) and, when even
     * that fails, has no SVG. A failure of our own code still throws.
     *
     * @throws IllegalArgumentException when the result has no map
     */
    public Drawing draw() {
        if (!drawable()) {
            throw new IllegalArgumentException("reaction " + reactionId + " has no atom map to draw (" + status + ")");
        }
        IReaction rxn;
        try {
            rxn = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseReactionSmiles(mappedSmiles);
        } catch (CDKException | RuntimeException e) {
            return Drawing.failed("CDK cannot read the mapped SMILES of " + reactionId + " ("
                    + LayoutRoutes.describe(e) + ").");
        }
        setTitles(rxn.getReactants(), left, "reactant");
        setTitles(rxn.getProducts(), right, "product");
        LayoutRoutes.Outcome layout = LayoutRoutes.layOut(rxn, ReactionPicture::name);
        List<String> notes = new ArrayList<>(layout.notes());
        Set<IAtomContainer> frames = new HashSet<>(layout.failed());

        CarbonLooks looks = CarbonLooks.of(rxn, PALETTE);
        Map<IChemObject, Color> highlight = new HashMap<>();
        looks.highlights().forEach((colour, objects) -> objects.forEach(o -> highlight.put(o, colour)));
        Set<IAtom> indexed = new HashSet<>();
        if (atomIndices) {
            for (org.openscience.cdk.interfaces.IAtomContainerSet set : List.of(rxn.getReactants(), rxn.getProducts())) {
                for (IAtomContainer mol : set.atomContainers()) {
                    for (IAtom a : mol.atoms()) {
                        // coloured carbons carry their number already; muted atoms stay quiet
                        if (a.getMapIdx() > 0 && a.getProperty(StandardGenerator.ANNOTATION_LABEL) == null
                                && !CarbonLooks.MUTED.equals(a.getProperty(MarkedElement.CLASS_KEY))) {
                            indexed.add(a);
                        }
                    }
                }
            }
        }
        ReactionScene.Options options = new ReactionScene.Options(highlight, 6.0, indexed, indicesOnRequest,
                TEXT, TEXT);
        while (true) {
            try {
                ReactionScene.Svg svg = ReactionScene.draw(rxn, frames, options);
                return new Drawing(mute(svg.text()), svg.width(), svg.height(), notes);
            } catch (ReactionScene.MoleculeFailure e) {
                if (!frames.add(e.molecule())) {
                    throw new IllegalStateException("drawing " + reactionId + " failed twice on one molecule", e);
                }
                notes.add("CDK could not draw " + name(e.molecule()) + " (" + LayoutRoutes.describe(e.getCause())
                        + "); it is shown as an empty frame.");
            }
        }
    }

    /**
     * Gives muted atoms and bonds ({@code class="muted ..."}) a low opacity, in the SVG itself so
     * the drawing looks the same wherever it is shown (also as a CSS background image).
     */
    static String mute(String svg) {
        return MUTED_ELEMENT.matcher(svg).replaceAll(m -> java.util.regex.Matcher.quoteReplacement(
                m.group(1) + " opacity=" + m.group(2) + MUTED_OPACITY + m.group(2)));
    }

    /** One title per molecule, copies expanded, when the SMILES has one molecule per copy. */
    private void setTitles(org.openscience.cdk.interfaces.IAtomContainerSet mols, List<String> species, String side) {
        for (int i = 0; i < mols.getAtomContainerCount(); i++) {
            mols.getAtomContainer(i).setProperty(POSITION, side + " " + (i + 1));
        }
        if (species.size() != mols.getAtomContainerCount()) {
            return;
        }
        for (int i = 0; i < species.size(); i++) {
            IAtomContainer mol = mols.getAtomContainer(i);
            mol.setProperty(CDKConstants.TITLE, titles.getOrDefault(species.get(i), species.get(i)));
            mol.setProperty(SPECIES, species.get(i));
        }
    }

    /** How a note names a molecule: species id, title and position, as far as known. */
    private static String name(IAtomContainer mol) {
        String species = mol.getProperty(SPECIES);
        String title = mol.getProperty(CDKConstants.TITLE);
        String position = mol.getProperty(POSITION);
        if (species == null) {
            return position == null ? "a molecule" : position;
        }
        return species + (title == null || title.equals(species) ? "" : " (" + title + ")")
                + (position == null ? "" : ", " + position);
    }

    /**
     * A drawn picture.
     *
     * @param svg    the SVG document, or "" when nothing could be drawn
     * @param width  its width in px (0 without a drawing)
     * @param height its height in px
     * @param notes  sentences for people on every fallback taken (empty when CDK drew everything)
     */
    public record Drawing(String svg, int width, int height, List<String> notes) {

        public Drawing {
            Objects.requireNonNull(svg, "svg");
            notes = List.copyOf(notes);
        }

        static Drawing failed(String note) {
            return new Drawing("", 0, 0, List.of(note));
        }

        /** True when there is a picture (perhaps with fallbacks). */
        public boolean drawn() {
            return !svg.isEmpty();
        }
    }
}
