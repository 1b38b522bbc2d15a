package io.github.atomledger.atommapper.depict.internal;

import java.awt.Color;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.openscience.cdk.renderer.elements.Bounds;
import org.openscience.cdk.renderer.elements.ElementGroup;
import org.openscience.cdk.renderer.elements.GeneralPath;
import org.openscience.cdk.renderer.elements.IRenderingElement;
import org.openscience.cdk.renderer.elements.LineElement;
import org.openscience.cdk.renderer.elements.MarkedElement;
import org.openscience.cdk.renderer.elements.OvalElement;
import org.openscience.cdk.renderer.elements.RectangleElement;
import org.openscience.cdk.renderer.elements.path.PathElement;

/**
 * Writes CDK rendering elements (what {@code StandardGenerator} builds) as compact SVG, in place
 * of CDK's own SVG writer: coordinates in whole tenths of a pixel written with integer arithmetic
 * (CDK's writer formats every number through {@code DecimalFormat}, which was 80% of a yeast-GEM
 * picture's drawing time), and every path drawn more than once (the glyph outlines of atom
 * labels, their glows, the map numbers) defined once and placed with {@code <use>}, which made
 * yeast-GEM pictures several times smaller.
 *
 * <p>Model coordinates go through one transform per element group ({@link #place}): scale, flip
 * of the y axis, offset. Elements this writer does not know are refused with
 * {@link IllegalStateException}, so a new CDK element never vanishes silently. Output is a
 * function of the elements and the calls alone. Not thread-safe; one per picture.
 */
public final class SvgSink {

    /** The class of map numbers shown on request (see {@link #toSvg}). */
    public static final String INDEX = "idx";

    /**
     * Classes CDK gives every element of a kind; dropped from the output, where they would only
     * add bytes. Any other class of a marked element (for example one set through an atom's
     * {@code MarkedElement.CLASS_KEY}) is kept on the elements inside it.
     */
    private static final java.util.Set<String> CDK_CLASSES = java.util.Set.of("atom", "bond", "mol", "reactant",
            "product", "agent", "title", "outerglow");

    private final List<Item> items = new ArrayList<>();
    private final Map<String, Integer> shapeUses = new HashMap<>();
    private double scale = 1;
    private double ox;
    private double oy;
    private double cx;
    private double cy;

    /** Model coordinates (x, y) of later elements are drawn at (ox + s(x-cx), oy - s(y-cy)) in px. */
    public void place(double s, double modelCentreX, double modelCentreY, double pxCentreX, double pxCentreY) {
        this.scale = s;
        this.cx = modelCentreX;
        this.cy = modelCentreY;
        this.ox = pxCentreX;
        this.oy = pxCentreY;
    }

    /** Adds the elements of a tree, in CDK's drawing order (later ones on top). */
    public void add(IRenderingElement element) {
        add(element, null);
    }

    private void add(IRenderingElement e, String cls) {
        if (e instanceof Bounds b) {
            add(b.root(), cls);
        } else if (e instanceof ElementGroup g) {
            for (IRenderingElement child : g) {
                add(child, cls);
            }
        } else if (e instanceof MarkedElement m) {
            add(m.element(), classes(cls, m.getClasses()));
        } else if (e instanceof LineElement l) {
            items.add(new Line(tx(l.firstPointX), ty(l.firstPointY), tx(l.secondPointX), ty(l.secondPointY),
                    tenths(l.width * scale), l.color, cls));
        } else if (e instanceof GeneralPath p) {
            path(p, cls);
        } else if (e instanceof OvalElement o) {
            items.add(new Oval(tx(o.xCoord), ty(o.yCoord), tenths(o.radius * scale), o.fill,
                    tenths(o.stroke * scale), o.color, cls));
        } else if (e instanceof RectangleElement r) {
            items.add(new Rect(tx(r.xCoord), ty(r.yCoord + r.height), tenths(r.width * scale),
                    tenths(r.height * scale), r.filled, r.color));
        } else if (e != null) {
            throw new IllegalStateException("no SVG form for the CDK element " + e.getClass().getSimpleName());
        }
    }

    private static String classes(String outer, List<String> inner) {
        java.util.LinkedHashSet<String> all = new java.util.LinkedHashSet<>();
        if (outer != null) {
            all.addAll(List.of(outer.split(" ")));
        }
        for (String c : inner) {
            if (!CDK_CLASSES.contains(c) && c.matches("[A-Za-z][A-Za-z0-9_-]*")) {
                all.add(c);
            }
        }
        return all.isEmpty() ? null : String.join(" ", all);
    }

    /** Text at a point given in model coordinates (through the current {@link #place}), in px size. */
    public void modelText(double x, double y, double size, Color color, String text, String cls) {
        items.add(new Text(tx(x), ty(y) + tenths(size * 0.35), tenths(size), color, text, cls));
    }

    /** A line in px (tenths), for arrows and frames drawn by the caller. */
    public void line(double x1, double y1, double x2, double y2, double width, Color color) {
        items.add(new Line(tenths(x1), tenths(y1), tenths(x2), tenths(y2), tenths(width), color, null));
    }

    /** A closed filled polygon in px, for arrow heads. */
    public void polygon(double[] xy, Color color) {
        StringBuilder d = new StringBuilder("M0 0");
        int x0 = tenths(xy[0]);
        int y0 = tenths(xy[1]);
        int px = 0;
        int py = 0;
        for (int i = 2; i < xy.length; i += 2) {
            int x = tenths(xy[i]) - x0;
            int y = tenths(xy[i + 1]) - y0;
            d.append('l');
            num(d, x - px);
            d.append(' ');
            num(d, y - py);
            px = x;
            py = y;
        }
        d.append('z');
        items.add(new Shape(x0, y0, d.toString(), true, 0, color, null));
        shapeUses.merge(d.toString(), 1, Integer::sum);
    }

    /** A line of text in px, anchored at its middle (x) and baseline (y). */
    public void text(double x, double y, double size, Color color, String text, String cls) {
        items.add(new Text(tenths(x), tenths(y), tenths(size), color, text, cls));
    }

    private int tx(double x) {
        return tenths(ox + scale * (x - cx));
    }

    private int ty(double y) {
        return tenths(oy - scale * (y - cy));
    }

    static int tenths(double px) {
        return (int) Math.round(px * 10);
    }

    /**
     * A path as its first point plus the rest relative to it. Each point is rounded to a tenth
     * relative to the first point (never to the previous one, so rounding does not accumulate
     * along a glyph outline), which makes the same glyph drawn anywhere give the same text and
     * lets it be shared; a point is off by at most 0.1 px.
     */
    private void path(GeneralPath p, String cls) {
        double[] pts = new double[6];
        StringBuilder d = new StringBuilder();
        double ax = 0;
        double ay = 0;
        int[] cur = new int[2];
        int[] start = new int[2];
        boolean first = true;
        for (PathElement pe : p.elements) {
            pe.points(pts);
            switch (pe.type()) {
                case MoveTo -> {
                    if (first) {
                        ax = ox + scale * (pts[0] - cx);
                        ay = oy - scale * (pts[1] - cy);
                        first = false;
                        d.append("M0 0");
                        cur[0] = 0;
                        cur[1] = 0;
                    } else {
                        int x = rx(pts[0], ax);
                        int y = ry(pts[1], ay);
                        d.append('m');
                        pair(d, x - cur[0], y - cur[1]);
                        cur[0] = x;
                        cur[1] = y;
                    }
                    start[0] = cur[0];
                    start[1] = cur[1];
                }
                case LineTo -> {
                    int x = rx(pts[0], ax);
                    int y = ry(pts[1], ay);
                    if (x == cur[0]) {
                        d.append('v');
                        num(d, y - cur[1]);
                    } else if (y == cur[1]) {
                        d.append('h');
                        num(d, x - cur[0]);
                    } else {
                        d.append('l');
                        pair(d, x - cur[0], y - cur[1]);
                    }
                    cur[0] = x;
                    cur[1] = y;
                }
                case QuadTo -> {
                    d.append('q');
                    relative(d, pts, 2, ax, ay, cur);
                }
                case CubicTo -> {
                    d.append('c');
                    relative(d, pts, 3, ax, ay, cur);
                }
                case Close -> {
                    d.append('z');
                    cur[0] = start[0];
                    cur[1] = start[1];
                }
            }
        }
        if (first) {
            return;
        }
        String shape = d.toString();
        items.add(new Shape(tenths(ax), tenths(ay), shape, p.fill, tenths(p.stroke * scale), p.color, cls));
        shapeUses.merge(shape, 1, Integer::sum);
    }

    /** The n points of a curve segment relative to the current point; the last becomes current. */
    private void relative(StringBuilder d, double[] pts, int n, double ax, double ay, int[] cur) {
        int x = 0;
        int y = 0;
        for (int k = 0; k < n; k++) {
            x = rx(pts[2 * k], ax);
            y = ry(pts[2 * k + 1], ay);
            if (k > 0) {
                d.append(' ');
            }
            pair(d, x - cur[0], y - cur[1]);
        }
        cur[0] = x;
        cur[1] = y;
    }

    private int rx(double x, double anchor) {
        return tenths(ox + scale * (x - cx) - anchor);
    }

    private int ry(double y, double anchor) {
        return tenths(oy - scale * (y - cy) - anchor);
    }

    private static void pair(StringBuilder sb, int x, int y) {
        num(sb, x);
        sb.append(' ');
        num(sb, y);
    }

    /** A number given in tenths, written as a decimal with at most one fraction digit. */
    static void num(StringBuilder sb, int tenths) {
        if (tenths < 0) {
            sb.append('-');
            tenths = -tenths;
        }
        sb.append(tenths / 10);
        if (tenths % 10 != 0) {
            sb.append('.').append(tenths % 10);
        }
    }

    /**
     * The SVG document: {@code width} by {@code height} px (rounded up to whole pixels), a white
     * background, shared shapes in {@code <defs>}, then every element in the order added.
     *
     * @param indicesOnRequest when true, elements of class {@value #INDEX} are hidden unless the
     *                         document is opened at its fragment {@code #indices} (for example
     *                         {@code x.svg#indices})
     */
    public String toSvg(double width, double height, boolean indicesOnRequest) {
        int w = (int) Math.ceil(width);
        int h = (int) Math.ceil(height);
        Color stroke = mostFrequent(items, true);
        Color fill = mostFrequent(items, false);
        Integer strokeWidth = mostFrequentWidth();
        StringBuilder sb = new StringBuilder(64 * items.size() + 1024);
        sb.append("<?xml version='1.0' encoding='UTF-8'?>\n");
        sb.append("<svg xmlns='http://www.w3.org/2000/svg' version='1.1' id='indices' width='").append(w)
                .append("px' height='").append(h).append("px' viewBox='0 0 ").append(w).append(' ').append(h)
                .append("'>\n");
        sb.append("<style>text{stroke:none;text-anchor:middle;font-family:DejaVu Sans,Verdana,Arial,sans-serif}");
        if (indicesOnRequest) {
            sb.append('.').append(INDEX).append("{display:none}#indices:target .").append(INDEX).append("{display:inline}");
        }
        sb.append("</style>\n");
        Map<String, String> defs = new LinkedHashMap<>();
        for (Item i : items) {
            if (i instanceof Shape s && shapeUses.get(s.d()) > 1 && !defs.containsKey(s.d())) {
                defs.put(s.d(), "s" + defs.size());
            }
        }
        if (!defs.isEmpty()) {
            sb.append("<defs>\n");
            defs.forEach((d, id) -> sb.append("<path id='").append(id).append("' d='").append(d).append("'/>\n"));
            sb.append("</defs>\n");
        }
        sb.append("<rect width='").append(w).append("' height='").append(h).append("' fill='#FFFFFF'/>\n");
        sb.append("<g stroke-linecap='round' stroke-linejoin='round'");
        if (stroke != null) {
            sb.append(" stroke='").append(colour(stroke)).append('\'');
        }
        if (strokeWidth != null) {
            sb.append(" stroke-width='");
            num(sb, strokeWidth);
            sb.append('\'');
        }
        if (fill != null) {
            sb.append(" fill='").append(colour(fill)).append('\'');
        }
        sb.append(">\n");
        for (Item i : items) {
            i.write(sb, new Defaults(stroke, fill, strokeWidth), defs);
        }
        sb.append("</g>\n</svg>\n");
        return sb.toString();
    }

    private static Color mostFrequent(List<Item> items, boolean stroke) {
        Map<Color, Integer> n = new LinkedHashMap<>();
        for (Item i : items) {
            if (stroke && i instanceof Line l) {
                n.merge(l.color(), 1, Integer::sum);
            } else if (!stroke && i instanceof Shape s && s.fill()) {
                n.merge(s.color(), 1, Integer::sum);
            }
        }
        return n.entrySet().stream().max(Map.Entry.comparingByValue()).map(Map.Entry::getKey).orElse(null);
    }

    private Integer mostFrequentWidth() {
        Map<Integer, Integer> n = new LinkedHashMap<>();
        for (Item i : items) {
            if (i instanceof Line l) {
                n.merge(l.width(), 1, Integer::sum);
            }
        }
        return n.entrySet().stream().max(Map.Entry.comparingByValue()).map(Map.Entry::getKey).orElse(null);
    }

    static String colour(Color c) {
        if (c.getAlpha() == 255) {
            return String.format("#%06X", 0xFFFFFF & c.getRGB());
        }
        return String.format(java.util.Locale.ROOT, "rgba(%d,%d,%d,%.2f)", c.getRed(), c.getGreen(), c.getBlue(),
                c.getAlpha() / 255d);
    }

    private record Defaults(Color stroke, Color fill, Integer strokeWidth) {
    }

    private sealed interface Item permits Line, Shape, Oval, Rect, Text {
        String cls();

        void write(StringBuilder sb, Defaults defaults, Map<String, String> defs);

        static void cls(StringBuilder sb, String cls) {
            if (cls != null) {
                sb.append(" class='").append(cls).append('\'');
            }
        }
    }

    private record Line(int x1, int y1, int x2, int y2, int width, Color color, String cls) implements Item {
        @Override
        public void write(StringBuilder sb, Defaults defaults, Map<String, String> defs) {
            sb.append("<line");
            Item.cls(sb, cls);
            sb.append(" x1='");
            num(sb, x1);
            sb.append("' y1='");
            num(sb, y1);
            sb.append("' x2='");
            num(sb, x2);
            sb.append("' y2='");
            num(sb, y2);
            sb.append('\'');
            if (!color.equals(defaults.stroke())) {
                sb.append(" stroke='").append(colour(color)).append('\'');
            }
            if (defaults.strokeWidth() == null || width != defaults.strokeWidth()) {
                sb.append(" stroke-width='");
                num(sb, width);
                sb.append('\'');
            }
            sb.append("/>\n");
        }
    }

    private record Shape(int x, int y, String d, boolean fill, int stroke, Color color, String cls) implements Item {
        @Override
        public void write(StringBuilder sb, Defaults defaults, Map<String, String> defs) {
            String id = defs.get(d);
            if (id != null) {
                sb.append("<use href='#").append(id).append("' x='");
                num(sb, x);
                sb.append("' y='");
                num(sb, y);
                sb.append('\'');
            } else {
                sb.append("<path d='M");
                pair(sb, x, y);
                sb.append(d, 4, d.length()).append('\'');
            }
            Item.cls(sb, cls);
            if (fill) {
                sb.append(" stroke='none'");
                if (!color.equals(defaults.fill())) {
                    sb.append(" fill='").append(colour(color)).append('\'');
                }
            } else {
                sb.append(" fill='none' stroke='").append(colour(color)).append("' stroke-width='");
                num(sb, stroke);
                sb.append('\'');
            }
            sb.append("/>\n");
        }
    }

    private record Oval(int x, int y, int r, boolean fill, int stroke, Color color, String cls) implements Item {
        @Override
        public void write(StringBuilder sb, Defaults defaults, Map<String, String> defs) {
            sb.append("<circle");
            Item.cls(sb, cls);
            sb.append(" cx='");
            num(sb, x);
            sb.append("' cy='");
            num(sb, y);
            sb.append("' r='");
            num(sb, r);
            sb.append('\'');
            if (fill) {
                sb.append(" fill='").append(colour(color)).append("' stroke='none'");
            } else {
                sb.append(" fill='none' stroke='").append(colour(color)).append("' stroke-width='");
                num(sb, stroke);
                sb.append('\'');
            }
            sb.append("/>\n");
        }
    }

    private record Rect(int x, int y, int w, int h, boolean fill, Color color) implements Item {
        @Override
        public String cls() {
            return null;
        }

        @Override
        public void write(StringBuilder sb, Defaults defaults, Map<String, String> defs) {
            sb.append("<rect x='");
            num(sb, x);
            sb.append("' y='");
            num(sb, y);
            sb.append("' width='");
            num(sb, w);
            sb.append("' height='");
            num(sb, h);
            sb.append('\'');
            sb.append(fill ? " fill='" + colour(color) + "' stroke='none'" : " fill='none' stroke='" + colour(color) + "'");
            sb.append("/>\n");
        }
    }

    private record Text(int x, int y, int size, Color color, String text, String cls) implements Item {
        @Override
        public void write(StringBuilder sb, Defaults defaults, Map<String, String> defs) {
            sb.append("<text");
            Item.cls(sb, cls);
            sb.append(" x='");
            num(sb, x);
            sb.append("' y='");
            num(sb, y);
            sb.append("' font-size='");
            num(sb, size);
            sb.append("' fill='").append(colour(color)).append("'>");
            escape(sb, text);
            sb.append("</text>\n");
        }
    }

    /** XML text escaping; control characters XML 1.0 cannot carry become U+FFFD. */
    static void escape(StringBuilder sb, String text) {
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            switch (ch) {
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '&' -> sb.append("&amp;");
                case '\'' -> sb.append("&apos;");
                default -> {
                    boolean bad = (ch < 0x20 && ch != '\t' && ch != '\n' && ch != '\r') || ch == 0xFFFE || ch == 0xFFFF;
                    sb.append(bad ? '\uFFFD' : ch);
                }
            }
        }
    }
}
