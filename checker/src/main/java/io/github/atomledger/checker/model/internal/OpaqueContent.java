package io.github.atomledger.checker.model.internal;

import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.stream.XMLStreamReader;

/**
 * Reads, from the cursor, what the checks need out of a {@code <notes>} or {@code <annotation>}
 * element that JSBML is never shown: the {@code KEY: value} lines of a species' notes (one per
 * XHTML block, {@code p}, {@code li}, {@code div} or {@code td}), the InChI strings of its
 * annotation's {@code rdf:resource} URIs, and the URIs under a MIRIAM {@code is} qualifier
 * ({@code bqbiol:is}, {@code bqmodel:is}: the cross-references that say what the species is, as
 * written). Everything else inside is only walked past. Confined to one {@link RecordingEventReader}.
 */
final class OpaqueContent {

    private static final String RDF = "http://www.w3.org/1999/02/22-rdf-syntax-ns#";
    private static final String BQBIOL = "http://biomodels.net/biology-qualifiers/";
    private static final String BQMODEL = "http://biomodels.net/model-qualifiers/";
    private static final Pattern FIELD = Pattern.compile("^\\s*([A-Za-z][A-Za-z0-9 _-]*?)\\s*:\\s*(.*?)\\s*$");

    /** Depth inside the notes or annotation element (0: outside). */
    private int depth;
    private boolean notes;
    private RawSpecies.Builder species;
    private int blockDepth;
    /** Depth of the open {@code bqbiol:is} or {@code bqmodel:is} element (0: none). */
    private int isDepth;
    private final StringBuilder blockText = new StringBuilder();

    static boolean isOpaque(String localName) {
        return localName.equals("notes") || localName.equals("annotation");
    }

    boolean inside() {
        return depth > 0;
    }

    /** The cursor is on a {@code notes} or {@code annotation} start tag; {@code owner} is null unless a species'. */
    void open(String localName, RawSpecies.Builder owner) {
        depth = 1;
        notes = localName.equals("notes");
        species = owner;
    }

    /** A start tag inside. */
    void start(XMLStreamReader in) {
        depth++;
        if (species == null) {
            return;
        }
        if (notes) {
            if (blockDepth > 0 || isBlock(in.getLocalName())) {
                blockDepth++;
            }
            return;
        }
        if (isDepth == 0 && in.getLocalName().equals("is")
                && (BQBIOL.equals(in.getNamespaceURI()) || BQMODEL.equals(in.getNamespaceURI()))) {
            isDepth = depth;
        }
        String uri = in.getAttributeValue(RDF, "resource");
        if (uri != null && isDepth > 0 && depth > isDepth && !species.references.contains(uri)) {
            species.references.add(uri);
        }
        if (uri != null) {
            int at = uri.indexOf("InChI=");
            if (at >= 0 && uri.toLowerCase(Locale.ROOT).contains("inchi")) {
                String value = uri.substring(at);
                if (value.contains("%")) {
                    // Percent-decoding only: '+' is part of InChI's syntax, not an encoded space.
                    value = URLDecoder.decode(value.replace("+", "%2B"), StandardCharsets.UTF_8);
                }
                if (!species.inchis.contains(value)) {
                    species.inchis.add(value);
                }
            }
        }
    }

    /** Text inside (characters, CDATA or white space). */
    void text(XMLStreamReader in) {
        if (blockDepth > 0) {
            blockText.append(in.getTextCharacters(), in.getTextStart(), in.getTextLength());
        }
    }

    /** An end tag inside, the notes or annotation end tag included. */
    void end() {
        depth--;
        if (depth < isDepth) {
            isDepth = 0;
        }
        if (blockDepth > 0 && --blockDepth == 0) {
            endBlock();
        }
        if (depth == 0) {
            species = null;
        }
    }

    private static boolean isBlock(String name) {
        return name.equals("p") || name.equals("li") || name.equals("div") || name.equals("td");
    }

    private void endBlock() {
        int start = 0;
        int n = blockText.length();
        while (start <= n) {
            int end = start;
            while (end < n && !isLineBreak(blockText.charAt(end))) {
                end++;
            }
            Matcher m = FIELD.matcher(blockText.subSequence(start, end));
            if (m.matches()) {
                species.notes.putIfAbsent(m.group(1).strip().toUpperCase(Locale.ROOT), m.group(2));
            }
            start = end + 1;
        }
        blockText.setLength(0);
    }

    /** The characters of the regex {@code \R} (a CR LF pair only yields an extra empty line). */
    private static boolean isLineBreak(char c) {
        return c == '\n' || c == '\r' || c == '\u000B' || c == '\u000C' || c == '\u0085' || c == '\u2028' || c == '\u2029';
    }
}
