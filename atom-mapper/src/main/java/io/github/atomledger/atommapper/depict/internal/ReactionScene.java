package io.github.atomledger.atommapper.depict.internal;

import java.awt.Color;
import java.awt.Font;
import java.awt.font.FontRenderContext;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Set;
import javax.vecmath.Point2d;
import org.openscience.cdk.CDKConstants;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IChemObject;
import org.openscience.cdk.interfaces.IReaction;
import org.openscience.cdk.renderer.RendererModel;
import org.openscience.cdk.renderer.elements.Bounds;
import org.openscience.cdk.renderer.elements.IRenderingElement;
import org.openscience.cdk.renderer.generators.BasicSceneGenerator;
import org.openscience.cdk.renderer.generators.standard.StandardGenerator;

/**
 * Composes one reaction picture: each molecule drawn by CDK's {@code StandardGenerator} from
 * coordinates already laid out, reactants left of an arrow and products right of it in one row,
 * joined by plus signs, each molecule's title (its {@link CDKConstants#TITLE}) as SVG text under
 * it. Written through {@link SvgSink}. CDK's {@code DepictionGenerator} does the same job, but its
 * SVG writer is the slow part and is not replaceable (package-private), hence this class.
 *
 * <p>Sizes follow CDK's depiction defaults: 26.1 px per median bond, the SansSerif font at 13 px
 * for atom symbols. Molecules in {@code placeholders} (no coordinates: the layout failed) are
 * shown as a dashed frame with their title. Output depends only on the reaction, its coordinates
 * and the options. Not thread-safe per reaction; distinct reactions may be drawn concurrently.
 */
public final class ReactionScene {

    /** CDK's default depiction bond length in px ({@code DepictionGenerator}). */
    static final double BOND_PX = 26.1;
    private static final double MARGIN = 10;
    private static final double GAP = 14;
    private static final double PLUS = 8;
    private static final double ARROW = 44;
    private static final double TITLE_PX = 12;
    private static final double INDEX_PX = 8;
    private static final Font SYMBOLS = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    private static final Font TITLES = new Font(Font.SANS_SERIF, Font.PLAIN, (int) TITLE_PX);
    private static final FontRenderContext FRC = new FontRenderContext(null, true, true);

    /**
     * How to draw.
     *
     * @param highlight        colour per atom or bond, drawn as an outer glow
     * @param glowWidth        the glow's width (CDK's {@code OuterGlowWidth})
     * @param indexed          atoms whose map number is printed beside them as SVG text (class
     *                         {@value SvgSink#INDEX}); CDK's own annotation labels are drawn as
     *                         well, whatever this says
     * @param indicesOnRequest hide those numbers unless the SVG is opened at {@code #indices}
     * @param text             colour of titles, signs and the arrow
     * @param annotation       colour of the map numbers
     */
    public record Options(Map<IChemObject, Color> highlight, double glowWidth, Set<IAtom> indexed,
                          boolean indicesOnRequest, Color text, Color annotation) {
        public Options {
            highlight = Map.copyOf(highlight);
            indexed = Set.copyOf(indexed);
        }
    }

    /** The picture as an SVG document, with its size in px. */
    public record Svg(String text, int width, int height) {
    }

    /** Thrown when CDK's generator fails on one molecule (the caller may draw a placeholder). */
    public static final class MoleculeFailure extends RuntimeException {
        private final transient IAtomContainer molecule;

        MoleculeFailure(IAtomContainer molecule, RuntimeException cause) {
            super(cause.toString(), cause);
            this.molecule = molecule;
        }

        public IAtomContainer molecule() {
            return molecule;
        }
    }

    private ReactionScene() {
    }

    /**
     * Draws the reaction.
     *
     * @throws MoleculeFailure when CDK's generator throws on one molecule
     */
    public static Svg draw(IReaction rxn, Set<IAtomContainer> placeholders, Options options) {
        List<IAtomContainer> left = new ArrayList<>();
        rxn.getReactants().atomContainers().forEach(left::add);
        List<IAtomContainer> right = new ArrayList<>();
        rxn.getProducts().atomContainers().forEach(right::add);
        List<IAtomContainer> all = new ArrayList<>(left);
        all.addAll(right);

        double scale = BOND_PX / medianBondLength(all, placeholders);
        RendererModel model = new RendererModel();
        StandardGenerator generator = new StandardGenerator(SYMBOLS);
        model.registerParameters(new BasicSceneGenerator());
        model.registerParameters(generator);
        model.set(BasicSceneGenerator.Scale.class, scale);
        model.set(BasicSceneGenerator.BondLength.class, BOND_PX);
        model.set(StandardGenerator.HashSpacing.class, 26 / 8d);
        model.set(StandardGenerator.WaveSpacing.class, 26 / 8d);
        model.set(StandardGenerator.Highlighting.class, StandardGenerator.HighlightStyle.OuterGlow);
        model.set(StandardGenerator.OuterGlowWidth.class, options.glowWidth());
        model.set(StandardGenerator.AnnotationColor.class, options.annotation());

        List<Placed> placed = new ArrayList<>();
        for (IAtomContainer mol : all) {
            placed.add(placeholders.contains(mol) || mol.isEmpty() ? Placed.frame(mol)
                    : generate(mol, generator, model, options, scale));
        }

        double molHeight = 0;
        for (Placed p : placed) {
            molHeight = Math.max(molHeight, p.height());
        }
        boolean titled = all.stream().anyMatch(m -> title(m) != null);
        double titleBand = titled ? GAP / 2 + TITLE_PX * 1.2 : 0;
        double height = 2 * MARGIN + molHeight + titleBand;
        double mid = MARGIN + molHeight / 2;

        SvgSink sink = new SvgSink();
        double x = MARGIN;
        for (int i = 0; i < placed.size(); i++) {
            if (i == left.size()) {
                x = arrow(sink, x, mid, options.text());
            } else if (i > 0) {
                x = plus(sink, x, mid, options.text());
            }
            Placed p = placed.get(i);
            double column = Math.max(p.width(), titleWidth(all.get(i)));
            double centre = x + column / 2;
            p.draw(sink, scale, centre, mid, options);
            String title = title(all.get(i));
            if (title != null) {
                sink.text(centre, MARGIN + molHeight + GAP / 2 + TITLE_PX, TITLE_PX, options.text(), title, "title");
            }
            x += column;
        }
        if (left.size() == placed.size()) {
            x = arrow(sink, x, mid, options.text());
        }
        double width = x + MARGIN;
        return new Svg(sink.toSvg(width, height, options.indicesOnRequest()), (int) Math.ceil(width),
                (int) Math.ceil(height));
    }

    private static Placed generate(IAtomContainer mol, StandardGenerator generator, RendererModel model,
                                   Options options, double scale) {
        List<IChemObject> marked = new ArrayList<>();
        try {
            for (IAtom a : mol.atoms()) {
                mark(a, options, marked);
            }
            for (IBond b : mol.bonds()) {
                mark(b, options, marked);
            }
            IRenderingElement element = generator.generate(mol, model);
            Bounds bounds = new Bounds(element);
            return new Placed(element, bounds, bounds.width() * scale, bounds.height() * scale, mol);
        } catch (RuntimeException e) {
            throw new MoleculeFailure(mol, e);
        } finally {
            for (IChemObject o : marked) {
                o.removeProperty(StandardGenerator.HIGHLIGHT_COLOR);
            }
        }
    }

    private static void mark(IChemObject o, Options options, List<IChemObject> marked) {
        Color c = options.highlight().get(o);
        if (c != null) {
            o.setProperty(StandardGenerator.HIGHLIGHT_COLOR, c);
            marked.add(o);
        }
    }

    private static double plus(SvgSink sink, double x, double mid, Color colour) {
        double c = x + GAP + PLUS / 2;
        sink.line(c - PLUS / 2, mid, c + PLUS / 2, mid, 1.4, colour);
        sink.line(c, mid - PLUS / 2, c, mid + PLUS / 2, 1.4, colour);
        return x + 2 * GAP + PLUS;
    }

    private static double arrow(SvgSink sink, double x, double mid, Color colour) {
        double start = x + GAP;
        double end = start + ARROW;
        sink.line(start, mid, end - 6, mid, 1.4, colour);
        sink.polygon(new double[] {end, mid, end - 9, mid - 4, end - 9, mid + 4}, colour);
        return end + GAP;
    }

    private static String title(IAtomContainer mol) {
        String t = mol.getProperty(CDKConstants.TITLE);
        return t == null || t.isBlank() ? null : t;
    }

    private static double titleWidth(IAtomContainer mol) {
        String t = title(mol);
        return t == null ? 0 : TITLES.getStringBounds(t, FRC).getWidth() + 4;
    }

    /** The median bond length over the laid-out molecules (CDK's rule; 1.5 without any bond). */
    private static double medianBondLength(List<IAtomContainer> mols, Set<IAtomContainer> placeholders) {
        List<Double> lengths = new ArrayList<>();
        for (IAtomContainer mol : mols) {
            if (placeholders.contains(mol)) {
                continue;
            }
            for (IBond b : mol.bonds()) {
                Point2d p = b.getBegin().getPoint2d();
                Point2d q = b.getEnd().getPoint2d();
                if (p != null && q != null && !p.equals(q)) {
                    lengths.add(p.distance(q));
                }
            }
        }
        if (lengths.isEmpty()) {
            return 1.5;
        }
        double[] sorted = lengths.stream().mapToDouble(Double::doubleValue).toArray();
        Arrays.sort(sorted);
        return sorted[sorted.length / 2];
    }

    /**
     * Where an atom's index goes: half a bond length from the atom, away from its bonds (the
     * opposite of the sum of the unit vectors to its neighbours; up and to the right for a lone
     * atom or when the bonds cancel out). Returns the offset in model units.
     */
    static double[] indexOffset(IAtomContainer mol, IAtom atom, double bondLength) {
        Point2d p = atom.getPoint2d();
        double dx = 0;
        double dy = 0;
        for (IAtom n : mol.getConnectedAtomsList(atom)) {
            Point2d q = n.getPoint2d();
            double len = q == null ? 0 : p.distance(q);
            if (len > 0) {
                dx += (q.x - p.x) / len;
                dy += (q.y - p.y) / len;
            }
        }
        double len = Math.hypot(dx, dy);
        if (len < 1e-6) {
            dx = -Math.sqrt(0.5);
            dy = -Math.sqrt(0.5);
            len = 1;
        }
        return new double[] {-dx / len * bondLength * 0.5, -dy / len * bondLength * 0.5};
    }

    /** A molecule's elements and size in px, or a frame for a molecule that could not be laid out. */
    private record Placed(IRenderingElement element, Bounds bounds, double width, double height, IAtomContainer mol) {

        static Placed frame(IAtomContainer mol) {
            return new Placed(null, null, 3 * BOND_PX, 2 * BOND_PX, mol);
        }

        void draw(SvgSink sink, double scale, double centreX, double centreY, Options options) {
            Color colour = options.text();
            if (element == null) {
                double x0 = centreX - width / 2;
                double y0 = centreY - height / 2;
                double[][] sides = {{x0, y0, x0 + width, y0}, {x0 + width, y0, x0 + width, y0 + height},
                        {x0 + width, y0 + height, x0, y0 + height}, {x0, y0 + height, x0, y0}};
                for (double[] s : sides) {
                    sink.line(s[0], s[1], s[2], s[3], 1, colour);
                }
                sink.text(centreX, centreY + 4, 11, colour, "not drawn", "missing");
                return;
            }
            sink.place(scale, (bounds.minX + bounds.maxX) / 2, (bounds.minY + bounds.maxY) / 2, centreX, centreY);
            sink.add(element);
            double bond = BOND_PX / scale;
            for (IAtom a : mol.atoms()) {
                if (a.getMapIdx() > 0 && options.indexed().contains(a) && a.getPoint2d() != null) {
                    double[] off = indexOffset(mol, a, bond);
                    sink.modelText(a.getPoint2d().x + off[0], a.getPoint2d().y + off[1], INDEX_PX, options.annotation(),
                            Integer.toString(a.getMapIdx()), SvgSink.INDEX);
                }
            }
        }
    }
}
