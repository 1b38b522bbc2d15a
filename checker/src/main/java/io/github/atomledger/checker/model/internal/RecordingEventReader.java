package io.github.atomledger.checker.model.internal;

import io.github.atomledger.checker.AtomLedgerException;

import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.namespace.QName;
import javax.xml.stream.XMLEventFactory;
import javax.xml.stream.XMLEventReader;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.events.Attribute;
import javax.xml.stream.events.EndElement;
import javax.xml.stream.events.Namespace;
import javax.xml.stream.events.StartElement;
import javax.xml.stream.events.XMLEvent;
import javax.xml.stream.util.EventReaderDelegate;

/**
 * Sits between the XML parser and JSBML. In the same single pass it
 * <ul>
 *   <li>refuses DOCTYPE declarations (no DTD, no entities: the file is untrusted input),</li>
 *   <li>checks that the root element is {@code <sbml>},</li>
 *   <li>records the texts JSBML would turn into numbers (formula, charge, stoichiometry) and
 *       the line of every species, reaction and speciesReference tag,</li>
 *   <li>records every SId so that duplicates can be reported,</li>
 *   <li>rewrites the fbc version 3 namespace to version 2 so that JSBML 1.6.1 reads the rest of
 *       the package, and removes {@code fbc:charge} from what JSBML sees (we read the text
 *       ourselves: version 3 allows decimals, which JSBML would drop with an error),</li>
 *   <li>keeps {@code <notes>} and {@code <annotation>} away from JSBML: it reads the species'
 *       {@code KEY: value} note lines and InChI resource URIs itself, and JSBML never builds the
 *       XHTML and RDF trees no check reads (on yeast-GEM these were most of JSBML's time; see
 *       BENCHMARKS.md).</li>
 * </ul>
 * Not thread-safe; one instance per read.
 */
public final class RecordingEventReader extends EventReaderDelegate {

    private static final String SBML_PREFIX = "http://www.sbml.org/sbml/level";
    private static final String RDF = "http://www.w3.org/1999/02/22-rdf-syntax-ns#";
    private static final Pattern FIELD = Pattern.compile("^\\s*([A-Za-z][A-Za-z0-9 _-]*?)\\s*:\\s*(.*?)\\s*$");
    public static final String FBC_PREFIX = "http://www.sbml.org/sbml/level3/version1/fbc/version";
    private static final String FBC_V2 = FBC_PREFIX + "2";
    private static final String FBC_V3 = FBC_PREFIX + "3";

    private final String file;
    private final XMLEventFactory events = XMLEventFactory.newInstance();
    private final Map<String, RawSpecies.Builder> species = new LinkedHashMap<>();
    private final Map<String, RawReaction> reactions = new LinkedHashMap<>();
    private final Map<String, Integer> idCounts = new HashMap<>();
    private boolean rootSeen;
    private int fbcVersion;
    private int level;
    private RawReaction currentReaction;
    private List<RawReaction.Ref> currentList;
    private boolean inModifiers;
    private int opaqueDepth;
    private String opaqueKind;
    private RawSpecies.Builder currentSpecies;
    private int blockDepth;
    private final StringBuilder blockText = new StringBuilder();

    public RecordingEventReader(XMLEventReader parent, String file) {
        super(parent);
        this.file = file;
    }

    @Override
    public XMLEvent nextEvent() throws XMLStreamException {
        skipOpaque();
        XMLEvent e = super.nextEvent();
        observe(e);
        return rewrite(e);
    }

    @Override
    public boolean hasNext() {
        try {
            skipOpaque();
        } catch (XMLStreamException e) {
            throw new IllegalStateException(e);
        }
        return super.hasNext();
    }

    /**
     * Consumes a whole {@code <notes>} or {@code <annotation>} element (observing its events) when
     * it is next, so JSBML never sees it.
     */
    private void skipOpaque() throws XMLStreamException {
        while (rootSeen && super.hasNext()) {
            XMLEvent next = super.peek();
            if (next == null || !next.isStartElement() || opaqueDepth > 0 || !isOpaque(next.asStartElement())) {
                return;
            }
            do {
                observe(super.nextEvent());
            } while (opaqueDepth > 0 && super.hasNext());
        }
    }

    private static boolean isOpaque(StartElement s) {
        String local = s.getName().getLocalPart();
        return (local.equals("notes") || local.equals("annotation")) && s.getName().getNamespaceURI().startsWith(SBML_PREFIX);
    }

    @Override
    public Object next() {
        try {
            return nextEvent();
        } catch (XMLStreamException ex) {
            throw new IllegalStateException(ex);
        }
    }

    @Override
    public XMLEvent peek() throws XMLStreamException {
        skipOpaque();
        XMLEvent e = super.peek();
        return e == null ? null : rewrite(e);
    }

    @Override
    public XMLEvent nextTag() throws XMLStreamException {
        XMLEvent e = nextEvent();
        while (e.isCharacters() && e.asCharacters().isWhiteSpace() || e.isProcessingInstruction()
                || e.getEventType() == XMLEvent.COMMENT) {
            e = nextEvent();
        }
        return e;
    }

    private void observe(XMLEvent e) {
        int line = e.getLocation() == null ? 0 : Math.max(0, e.getLocation().getLineNumber());
        if (e.getEventType() == XMLEvent.DTD) {
            throw new AtomLedgerException(file + ":" + line
                    + ": DOCTYPE declarations are refused (SBML needs none, and a DTD can pull in other files)");
        }
        if (e.getEventType() == XMLEvent.ENTITY_REFERENCE) {
            throw new AtomLedgerException(file + ":" + line + ": entity references are refused");
        }
        if (e.isStartElement()) {
            startElement(e.asStartElement(), line);
        } else if (e.isEndElement()) {
            endElement(e.asEndElement());
        } else if (blockDepth > 0 && e.isCharacters()) {
            blockText.append(e.asCharacters().getData());
        }
    }

    private void startElement(StartElement s, int line) {
        String local = s.getName().getLocalPart();
        if (!rootSeen) {
            rootSeen = true;
            String ns = s.getName().getNamespaceURI();
            if (!local.equals("sbml") || !ns.startsWith("http://www.sbml.org/sbml/level")) {
                throw new AtomLedgerException(file + ":" + line + ": not an SBML file: the root element is <"
                        + local + "> in namespace '" + ns + "', expected <sbml> in an SBML namespace");
            }
            level = parseIntOr(attr(s, "level"), 0);
            if (level != 2 && level != 3) {
                throw new AtomLedgerException(file + ":" + line + ": SBML Level " + attr(s, "level")
                        + " is not supported; AtomLedger reads Level 2 and Level 3");
            }
            for (Iterator<?> it = s.getNamespaces(); it.hasNext(); ) {
                String uri = ((Namespace) it.next()).getNamespaceURI();
                if (uri.startsWith(FBC_PREFIX)) {
                    fbcVersion = parseIntOr(uri.substring(FBC_PREFIX.length()), 0);
                }
            }
            return;
        }
        if (opaqueDepth > 0) {
            opaqueDepth++;
            insideOpaque(s, local);
            return;
        }
        if (local.equals("annotation") || local.equals("notes")) {
            opaqueDepth = 1;
            opaqueKind = local;
            return;
        }
        String id = attr(s, "id");
        if (id == null) {
            id = fbcAttr(s, "id");
        }
        // Unit definitions have their own id space (UnitSId) in SBML.
        if (id != null && !local.equals("unitDefinition")) {
            idCounts.merge(id, 1, Integer::sum);
        }
        switch (local) {
            case "species" -> {
                currentSpecies = new RawSpecies.Builder(id, fbcAttr(s, "chemicalFormula"), fbcAttr(s, "charge"),
                        attr(s, "charge"), line);
                species.putIfAbsent(id == null ? "" : id, currentSpecies);
            }
            case "reaction" -> {
                currentReaction = new RawReaction(id == null ? "" : id, line);
                reactions.putIfAbsent(currentReaction.id(), currentReaction);
            }
            case "listOfReactants" -> currentList = currentReaction == null ? null : currentReaction.reactants();
            case "listOfProducts" -> currentList = currentReaction == null ? null : currentReaction.products();
            case "listOfModifiers" -> inModifiers = true;
            case "speciesReference" -> {
                if (currentList != null) {
                    currentList.add(new RawReaction.Ref(nullToEmpty(attr(s, "species")), attr(s, "stoichiometry"), line));
                }
            }
            case "modifierSpeciesReference" -> {
                if (inModifiers && currentReaction != null) {
                    currentReaction.modifiers().add(nullToEmpty(attr(s, "species")));
                }
            }
            default -> {
            }
        }
    }

    /** Inside a species' notes: collect block texts; inside its annotation: InChI resources. */
    private void insideOpaque(StartElement s, String local) {
        if (currentSpecies == null) {
            return;
        }
        if (opaqueKind.equals("notes")) {
            if (blockDepth > 0 || isBlock(local)) {
                blockDepth++;
            }
            return;
        }
        Attribute resource = s.getAttributeByName(new QName(RDF, "resource"));
        if (resource != null) {
            String uri = resource.getValue();
            int at = uri.indexOf("InChI=");
            if (at >= 0 && uri.toLowerCase(Locale.ROOT).contains("inchi")) {
                String value = uri.substring(at);
                if (value.contains("%")) {
                    value = URLDecoder.decode(value, StandardCharsets.UTF_8);
                }
                if (!currentSpecies.inchis.contains(value)) {
                    currentSpecies.inchis.add(value);
                }
            }
        }
    }

    private static boolean isBlock(String name) {
        return name.equals("p") || name.equals("li") || name.equals("div") || name.equals("td");
    }

    private void endBlock() {
        for (String textLine : blockText.toString().split("\\R")) {
            Matcher m = FIELD.matcher(textLine);
            if (m.matches()) {
                currentSpecies.notes.putIfAbsent(m.group(1).strip().toUpperCase(Locale.ROOT), m.group(2));
            }
        }
        blockText.setLength(0);
    }

    private void endElement(EndElement e) {
        if (opaqueDepth > 0) {
            opaqueDepth--;
            if (blockDepth > 0 && --blockDepth == 0) {
                endBlock();
            }
            return;
        }
        switch (e.getName().getLocalPart()) {
            case "species" -> currentSpecies = null;
            case "reaction" -> currentReaction = null;
            case "listOfReactants", "listOfProducts" -> currentList = null;
            case "listOfModifiers" -> inModifiers = false;
            default -> {
            }
        }
    }

    private XMLEvent rewrite(XMLEvent e) {
        if (e.isStartElement()) {
            StartElement s = e.asStartElement();
            boolean change = fbcVersion == 3 || (s.getName().getLocalPart().equals("species") && fbcAttr(s, "charge") != null);
            if (!change) {
                return e;
            }
            List<Attribute> attrs = new ArrayList<>();
            for (Iterator<?> it = s.getAttributes(); it.hasNext(); ) {
                Attribute a = (Attribute) it.next();
                if (a.getName().getNamespaceURI().startsWith(FBC_PREFIX) && a.getName().getLocalPart().equals("charge")
                        && s.getName().getLocalPart().equals("species")) {
                    continue;
                }
                attrs.add(events.createAttribute(fix(a.getName()), a.getValue()));
            }
            List<Namespace> nss = new ArrayList<>();
            for (Iterator<?> it = s.getNamespaces(); it.hasNext(); ) {
                Namespace n = (Namespace) it.next();
                nss.add(FBC_V3.equals(n.getNamespaceURI()) ? events.createNamespace(n.getPrefix(), FBC_V2) : n);
            }
            events.setLocation(s.getLocation());
            QName n = fix(s.getName());
            return events.createStartElement(n.getPrefix(), n.getNamespaceURI(), n.getLocalPart(), attrs.iterator(),
                    nss.iterator(), s.getNamespaceContext());
        }
        if (e.isEndElement() && fbcVersion == 3) {
            EndElement end = e.asEndElement();
            if (FBC_V3.equals(end.getName().getNamespaceURI())) {
                events.setLocation(end.getLocation());
                return events.createEndElement(fix(end.getName()), end.getNamespaces());
            }
        }
        return e;
    }

    private static QName fix(QName q) {
        return FBC_V3.equals(q.getNamespaceURI()) ? new QName(FBC_V2, q.getLocalPart(), q.getPrefix()) : q;
    }

    private static String attr(StartElement s, String name) {
        Attribute a = s.getAttributeByName(new QName(name));
        return a == null ? null : a.getValue();
    }

    private static String fbcAttr(StartElement s, String name) {
        for (Iterator<?> it = s.getAttributes(); it.hasNext(); ) {
            Attribute a = (Attribute) it.next();
            if (a.getName().getLocalPart().equals(name) && a.getName().getNamespaceURI().startsWith(FBC_PREFIX)) {
                return a.getValue();
            }
        }
        return null;
    }

    private static int parseIntOr(String s, int fallback) {
        try {
            return s == null ? fallback : Integer.parseInt(s.strip());
        } catch (NumberFormatException e) {
            return fallback;
        }
    }

    private static String nullToEmpty(String s) {
        return s == null ? "" : s;
    }

    /** Species as written, by id, in document order (the first element when an id repeats). */
    public Map<String, RawSpecies> species() {
        Map<String, RawSpecies> out = new LinkedHashMap<>();
        species.forEach((id, b) -> out.put(id, b.build()));
        return out;
    }

    public Map<String, RawReaction> reactions() {
        return reactions;
    }

    /** The fbc version declared on the root element, 0 when none. */
    public int fbcVersion() {
        return fbcVersion;
    }

    public boolean rootSeen() {
        return rootSeen;
    }

    /** Ids that occur on more than one element, sorted. */
    public List<String> duplicateIds() {
        TreeSet<String> out = new TreeSet<>();
        idCounts.forEach((id, n) -> {
            if (n > 1) {
                out.add(id);
            }
        });
        return List.copyOf(out);
    }
}
