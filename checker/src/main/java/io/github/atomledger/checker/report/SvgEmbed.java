package io.github.atomledger.checker.report;

import java.io.StringReader;
import java.util.Iterator;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.stream.XMLEventReader;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;
import javax.xml.stream.events.Attribute;
import javax.xml.stream.events.StartElement;
import javax.xml.stream.events.XMLEvent;

/**
 * Copies an SVG document into the HTML being written, event by event through StAX (so the drawing
 * is parsed, never pasted as text): the XML declaration, DOCTYPE, comments and processing
 * instructions are dropped, scripts and event-handler attributes are refused, and every
 * {@code id} (and {@code url(#..)}/{@code href="#.."} reference) gets a prefix so several
 * drawings can share one page. Coordinates are rounded to 0.1 px (CDK writes three decimals; a
 * tenth of a pixel is invisible, and it saves about a fifth of the size of glyph outlines).
 */
final class SvgEmbed {

    private static final Pattern URL_REF = Pattern.compile("url\\(#([^)]+)\\)");
    private static final Pattern LONG_DECIMAL = Pattern.compile("(-?)(\\d*)\\.(\\d)(\\d+)");

    private SvgEmbed() {
    }

    static void copy(String svg, String idPrefix, XMLStreamWriter w) throws XMLStreamException {
        XMLInputFactory f = XMLInputFactory.newDefaultFactory();
        f.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        f.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        f.setProperty(XMLInputFactory.IS_NAMESPACE_AWARE, true);
        XMLEventReader r = f.createXMLEventReader(new StringReader(svg));
        boolean root = true;
        try {
            while (r.hasNext()) {
                XMLEvent e = r.nextEvent();
                if (e.isStartElement()) {
                    StartElement s = e.asStartElement();
                    String name = s.getName().getLocalPart();
                    if (name.equals("script") || name.equals("foreignObject")) {
                        throw new XMLStreamException("a drawing must not contain <" + name + ">");
                    }
                    w.writeStartElement(name);
                    if (root) {
                        w.writeAttribute("xmlns", "http://www.w3.org/2000/svg");
                        root = false;
                    }
                    for (Iterator<Attribute> it = s.getAttributes(); it.hasNext(); ) {
                        Attribute a = it.next();
                        String an = a.getName().getLocalPart();
                        if (an.startsWith("on")) {
                            throw new XMLStreamException("a drawing must not carry event handlers (" + an + ")");
                        }
                        if (!a.getName().getPrefix().isEmpty() && !an.equals("href")) {
                            continue;
                        }
                        w.writeAttribute(an, rewrite(an, a.getValue(), idPrefix));
                    }
                } else if (e.isEndElement()) {
                    w.writeEndElement();
                } else if (e.isCharacters()) {
                    String text = e.asCharacters().getData();
                    if (!text.isBlank()) {
                        w.writeCharacters(text);
                    }
                }
            }
        } finally {
            r.close();
        }
    }

    private static String rewrite(String attribute, String value, String prefix) {
        if (attribute.equals("id")) {
            return prefix + value;
        }
        if (attribute.equals("href") && value.startsWith("#")) {
            return "#" + prefix + value.substring(1);
        }
        if (!attribute.equals("class")) {
            value = shorten(value);
        }
        if (value.contains("url(#")) {
            Matcher m = URL_REF.matcher(value);
            return m.replaceAll(mr -> Matcher.quoteReplacement("url(#" + prefix + mr.group(1) + ")"));
        }
        return value;
    }

    /** Rounds every decimal with more than one fraction digit to one digit (half up). */
    static String shorten(String value) {
        if (value.indexOf('.') < 0) {
            return value;
        }
        return LONG_DECIMAL.matcher(value).replaceAll(mr -> {
            java.math.BigDecimal d = new java.math.BigDecimal((mr.group(2).isEmpty() ? "0" : mr.group(2)) + "."
                    + mr.group(3) + mr.group(4)).setScale(1, java.math.RoundingMode.HALF_UP);
            String t = d.stripTrailingZeros().toPlainString();
            return Matcher.quoteReplacement(t.equals("0") ? "0" : mr.group(1) + t);
        });
    }
}
