package io.github.atomledger.checker.transitions;

import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.model.internal.SafeXml;


import java.io.StringReader;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/**
 * Where each reaction sits in a model's text, and the AtomLedger annotation it carries, found by
 * one hardened StAX pass (no DTD, no entities) over the document text. The offsets let
 * {@code annotate.ModelAnnotator} patch the text in place, so that a diff shows only what was added.
 *
 * <p>Offsets are character positions in the text given to {@link #scan}. Immutable once built.
 */
public final class AnnotationIndex {

    /**
     * One reaction's position.
     *
     * @param id                 the reaction id
     * @param tagStart           offset of {@code <reaction}
     * @param tagEnd             offset just after the start tag's {@code >}
     * @param selfClosing        true for {@code <reaction .../>}
     * @param notesEnd           offset just after {@code </notes>}, or -1
     * @param annotationStart    offset of {@code <annotation}, or -1
     * @param annotationTagEnd   offset just after the annotation start tag, or -1
     * @param annotationClose    offset of {@code </annotation>}, or -1 (also -1 when self-closing)
     * @param oursStart          offset of our element, or -1
     * @param oursEnd            offset just after our element, or -1
     * @param stored             our annotation, parsed; null when absent
     * @param storedError        why our annotation could not be read; null when fine or absent
     */
    public record ReactionSpot(String id, int tagStart, int tagEnd, boolean selfClosing, int notesEnd,
                               int annotationStart, int annotationTagEnd, int annotationClose,
                               int oursStart, int oursEnd, TransitionAnnotation stored, String storedError, int line) {
    }

    private final Map<String, ReactionSpot> reactions;

    private AnnotationIndex(Map<String, ReactionSpot> reactions) {
        this.reactions = Collections.unmodifiableMap(reactions);
    }

    public Map<String, ReactionSpot> reactions() {
        return reactions;
    }

    public Optional<TransitionAnnotation> stored(String reactionId) {
        ReactionSpot s = reactions.get(reactionId);
        return s == null ? Optional.empty() : Optional.ofNullable(s.stored());
    }

    /** Reads a model file (plain or gzip, any declared encoding) and scans it. */
    public static AnnotationIndex read(java.nio.file.Path file, String display, long maxBytes) {
        return scan(ModelText.read(file, display, maxBytes).text(), display);
    }

    /** Scans a model's text; {@code file} names it in error messages. */
    public static AnnotationIndex scan(String text, String file) {
        XMLInputFactory f = SafeXml.factory();
        Map<String, ReactionSpot> out = new LinkedHashMap<>();
        try {
            XMLStreamReader r = f.createXMLStreamReader(new StringReader(text));
            Builder current = null;
            int depth = 0;
            int reactionDepth = -1;
            while (r.hasNext()) {
                int event = r.next();
                int offset = r.getLocation().getCharacterOffset();
                if (event == XMLStreamConstants.DTD) {
                    throw new AtomLedgerException(file + ":" + r.getLocation().getLineNumber()
                            + ": DOCTYPE declarations are refused");
                }
                if (event == XMLStreamConstants.ENTITY_REFERENCE) {
                    throw new AtomLedgerException(file + ":" + r.getLocation().getLineNumber()
                            + ": entity references are refused");
                }
                if (event == XMLStreamConstants.START_ELEMENT) {
                    depth++;
                    String local = r.getLocalName();
                    if (depth == 1) {
                        checkRoot(r, file);
                    }
                    if (current == null && local.equals("reaction") && isSbml(r.getNamespaceURI())) {
                        current = new Builder(r.getAttributeValue(null, "id"), offset, tagEnd(text, offset),
                                r.getLocation().getLineNumber());
                        current.selfClosing = text.charAt(current.tagEnd - 2) == '/';
                        reactionDepth = depth;
                    } else if (current != null && depth == reactionDepth + 1 && local.equals("annotation")) {
                        current.annotationStart = offset;
                        current.annotationTagEnd = tagEnd(text, offset);
                    } else if (current != null && depth == reactionDepth + 2 && current.annotationStart >= 0
                            && current.annotationClose < 0 && local.equals(TransitionAnnotation.ELEMENT)
                            && TransitionAnnotation.NAMESPACE.equals(r.getNamespaceURI())) {
                        current.oursStart = offset;
                        current.reader = new AnnotationReader(r);
                    } else if (current != null && current.reader != null) {
                        current.reader.start(r);
                    }
                } else if (event == XMLStreamConstants.CHARACTERS || event == XMLStreamConstants.CDATA) {
                    if (current != null && current.reader != null) {
                        current.reader.text(r.getText());
                    }
                } else if (event == XMLStreamConstants.END_ELEMENT) {
                    String local = r.getLocalName();
                    if (current != null) {
                        if (depth == reactionDepth + 2 && current.reader != null
                                && local.equals(TransitionAnnotation.ELEMENT)) {
                            current.oursEnd = endTagEnd(text, offset);
                            current.finish();
                        } else if (current.reader != null) {
                            current.reader.end(local);
                        } else if (depth == reactionDepth + 1 && local.equals("notes")) {
                            current.notesEnd = endTagEnd(text, offset);
                        } else if (depth == reactionDepth + 1 && local.equals("annotation")) {
                            boolean selfClosed = offset == current.annotationStart;
                            current.annotationClose = selfClosed ? -1 : offset;
                        } else if (depth == reactionDepth && local.equals("reaction")) {
                            out.putIfAbsent(current.id == null ? "" : current.id, current.build());
                            current = null;
                        }
                    }
                    depth--;
                }
            }
        } catch (XMLStreamException e) {
            throw new AtomLedgerException(where(file, e) + "malformed XML: " + clean(e), e);
        }
        return new AnnotationIndex(out);
    }

    /** The same refusals as ModelLoader: the root must be {@code <sbml>} of Level 2 or 3. */
    private static void checkRoot(XMLStreamReader r, String file) {
        int line = r.getLocation().getLineNumber();
        String local = r.getLocalName();
        String ns = r.getNamespaceURI() == null ? "" : r.getNamespaceURI();
        if (!local.equals("sbml") || !isSbml(ns)) {
            throw new AtomLedgerException(file + ":" + line + ": not an SBML file: the root element is <"
                    + local + "> in namespace '" + ns + "', expected <sbml> in an SBML namespace");
        }
        String level = r.getAttributeValue(null, "level");
        if (!"2".equals(level) && !"3".equals(level)) {
            throw new AtomLedgerException(file + ":" + line + ": SBML Level " + level
                    + " is not supported; AtomLedger reads Level 2 and Level 3");
        }
    }

    private static String where(String file, XMLStreamException e) {
        return SafeXml.where(file, e.getLocation());
    }

    private static String clean(XMLStreamException e) {
        return SafeXml.clean(e);
    }

    private static boolean isSbml(String ns) {
        return ns != null && ns.startsWith("http://www.sbml.org/sbml/level");
    }

    /** The offset just after the '>' that ends the tag starting at {@code start}, quotes respected. */
    public static int tagEnd(String text, int start) {
        char quote = 0;
        for (int i = start; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quote != 0) {
                if (c == quote) {
                    quote = 0;
                }
            } else if (c == '"' || c == '\'') {
                quote = c;
            } else if (c == '>') {
                return i + 1;
            }
        }
        return text.length();
    }

    /** For an END_ELEMENT at {@code offset}: just after its '>'; for an empty element, after "/>". */
    private static int endTagEnd(String text, int offset) {
        return tagEnd(text, offset);
    }

    private static final class Builder {
        final String id;
        final int tagStart;
        final int tagEnd;
        final int line;
        boolean selfClosing;
        int notesEnd = -1;
        int annotationStart = -1;
        int annotationTagEnd = -1;
        int annotationClose = -1;
        int oursStart = -1;
        int oursEnd = -1;
        AnnotationReader reader;
        TransitionAnnotation stored;
        String storedError;

        Builder(String id, int tagStart, int tagEnd, int line) {
            this.id = id;
            this.tagStart = tagStart;
            this.tagEnd = tagEnd;
            this.line = line;
        }

        void finish() {
            try {
                stored = reader.result();
            } catch (IllegalArgumentException e) {
                storedError = e.getMessage();
            }
            reader = null;
        }

        ReactionSpot build() {
            return new ReactionSpot(id == null ? "" : id, tagStart, tagEnd, selfClosing, notesEnd, annotationStart,
                    annotationTagEnd, annotationClose, oursStart, oursEnd, stored, storedError, line);
        }
    }

    /** Collects our element's attributes and children while the scan passes through it. */
    private static final class AnnotationReader {
        private final String origin;
        private final String status;
        private final String cost;
        private final String mapper;
        private final StringBuilder carbons = new StringBuilder();
        private final StringBuilder smiles = new StringBuilder();
        private final List<StoredStructure> structures = new ArrayList<>();
        private String inChild = "";

        AnnotationReader(XMLStreamReader r) {
            origin = attr(r, "origin");
            status = attr(r, "status");
            cost = attr(r, "cost");
            mapper = attr(r, "mapper");
        }

        void start(XMLStreamReader r) {
            inChild = r.getLocalName();
            if (inChild.equals("structure")) {
                structures.add(new StoredStructure(attr(r, "species"), attr(r, "fingerprint"), attr(r, "smiles")));
            }
        }

        void text(String t) {
            if (inChild.equals("carbons")) {
                carbons.append(t);
            } else if (inChild.equals("reactionSmiles")) {
                smiles.append(t);
            }
        }

        void end(String local) {
            inChild = "";
        }

        TransitionAnnotation result() {
            if (origin.isEmpty()) {
                throw new IllegalArgumentException("the atomTransitions element has no 'origin' attribute");
            }
            if (!origin.equals(TransitionAnnotation.INFERRED) && !origin.equals(TransitionAnnotation.CURATED)) {
                throw new IllegalArgumentException("origin must be 'inferred' or 'curated', was '" + origin + "'");
            }
            int c = -1;
            if (!cost.isEmpty()) {
                try {
                    c = Integer.parseInt(cost);
                } catch (NumberFormatException e) {
                    throw new IllegalArgumentException("cost is not a number: '" + cost + "'");
                }
            }
            List<AtomTransition> map = CarbonMapText.parse(carbons.toString());
            return new TransitionAnnotation(origin, status, c, mapper, map, smiles.toString().strip(), structures);
        }

        private static String attr(XMLStreamReader r, String name) {
            String v = r.getAttributeValue(null, name);
            return v == null ? "" : v.strip();
        }
    }
}
