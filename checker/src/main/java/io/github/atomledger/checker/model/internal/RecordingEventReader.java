package io.github.atomledger.checker.model.internal;

import io.github.atomledger.checker.AtomLedgerException;

import com.ctc.wstx.stax.WstxEventFactory;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;
import java.util.TreeSet;
import javax.xml.stream.Location;
import javax.xml.stream.XMLEventFactory;
import javax.xml.stream.XMLEventReader;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;
import javax.xml.stream.events.Attribute;
import javax.xml.stream.events.Namespace;
import javax.xml.stream.events.XMLEvent;

/**
 * Sits between the XML parser and JSBML: it walks the document once with a StAX cursor and hands
 * JSBML, as events, only the part of the document the {@code ModelView} is built from. In the same
 * pass it
 * <ul>
 *   <li>refuses DOCTYPE declarations and entity references (the file is untrusted input),</li>
 *   <li>checks that the root element is {@code <sbml>} of Level 2 or 3,</li>
 *   <li>records the texts JSBML would turn into numbers or drop (formula, charge, stoichiometry,
 *       fbc versions 1 to 3, decimal charges included), the SBO terms, the line of every species,
 *       reaction and speciesReference tag, whether a reference has {@code <stoichiometryMath>},
 *       and every SId, so that duplicates can be reported,</li>
 *   <li>reads the species' {@code <notes>} ({@code KEY: value} lines) and the InChI resource
 *       URIs of their {@code <annotation>} itself.</li>
 * </ul>
 *
 * <p>What JSBML sees ({@link #KEPT}): {@code sbml} (level, version and the core namespace),
 * {@code model}, compartments, species, reactions and their species references, each with only the
 * attributes the view reads from JSBML (ids, names, compartment, boundaryCondition, reversible,
 * species). Everything else is withheld: notes, annotations, units, parameters and flux bounds,
 * kinetic laws, rules, events, every package element and attribute (fbc objectives, gene
 * products and associations, groups, layout, ...), {@code metaid} and {@code sboTerm}. JSBML 1.6.1
 * parses an SBO term by loading the whole SBO ontology (about 0.1 s on first use), and no check
 * reads any of the rest through JSBML; the texts it needs are recorded here. Events are made only
 * for what JSBML sees: the withheld parts, most of a genome-scale file, are walked with the cursor.
 * The events carry no location (JSBML 1.6.1 reads none; lines are recorded here).
 *
 * <p>Errors: a Woodstox {@link XMLStreamException} is rethrown by {@link #nextEvent()} and wrapped in
 * an {@link IllegalStateException} by {@link #hasNext()}; refusals are {@link AtomLedgerException}s
 * naming file and line. Not thread-safe; one instance per read.
 */
public final class RecordingEventReader implements XMLEventReader {

    public static final String FBC_PREFIX = "http://www.sbml.org/sbml/level3/version1/fbc/version";
    private static final String SBML_PREFIX = "http://www.sbml.org/sbml/level";

    /** The SBML core elements JSBML is shown, with the attributes it is shown on each. */
    static final Map<String, Set<String>> KEPT = Map.ofEntries(
            Map.entry("sbml", Set.of("level", "version")),
            Map.entry("model", Set.of("id", "name")),
            Map.entry("listOfCompartments", Set.of()),
            Map.entry("compartment", Set.of("id", "name")),
            Map.entry("listOfSpecies", Set.of()),
            Map.entry("species", Set.of("id", "name", "compartment", "boundaryCondition")),
            Map.entry("listOfReactions", Set.of()),
            Map.entry("reaction", Set.of("id", "name", "reversible")),
            Map.entry("listOfReactants", Set.of()),
            Map.entry("listOfProducts", Set.of()),
            Map.entry("listOfModifiers", Set.of()),
            Map.entry("speciesReference", Set.of("species")),
            Map.entry("modifierSpeciesReference", Set.of("species")));

    private final XMLStreamReader in;
    private final String file;
    private final XMLEventFactory events = new WstxEventFactory();
    private final ArrayDeque<XMLEvent> pending = new ArrayDeque<>();
    private boolean ended;

    private final Map<String, RawSpecies.Builder> species = new LinkedHashMap<>();
    private final Map<String, RawReaction> reactions = new LinkedHashMap<>();
    private final Map<String, Integer> idCounts = new HashMap<>();
    private boolean rootSeen;
    private String coreNamespace;
    private int fbcVersion;
    private RawReaction currentReaction;
    private List<RawReaction.Ref> currentList;
    private boolean inModifiers;
    private RawSpecies.Builder currentSpecies;
    /** Depth inside a withheld element (0: JSBML sees the current element). */
    private int withheldDepth;
    private final OpaqueContent opaque = new OpaqueContent();

    public RecordingEventReader(XMLStreamReader in, String file) {
        this.in = in;
        this.file = file;
    }

    @Override
    public boolean hasNext() {
        try {
            fill();
        } catch (XMLStreamException e) {
            throw new IllegalStateException(e);
        }
        return !pending.isEmpty();
    }

    @Override
    public XMLEvent nextEvent() throws XMLStreamException {
        fill();
        if (pending.isEmpty()) {
            throw new NoSuchElementException("end of the document");
        }
        return pending.poll();
    }

    @Override
    public Object next() {
        try {
            return nextEvent();
        } catch (XMLStreamException e) {
            throw new IllegalStateException(e);
        }
    }

    @Override
    public XMLEvent peek() throws XMLStreamException {
        fill();
        return pending.peek();
    }

    @Override
    public XMLEvent nextTag() throws XMLStreamException {
        XMLEvent e = nextEvent();
        while (!e.isStartElement() && !e.isEndElement()) {
            e = nextEvent();
        }
        return e;
    }

    /** Unsupported: JSBML reads no element text, and the reader withholds every text-bearing element. */
    @Override
    public String getElementText() {
        throw new UnsupportedOperationException("getElementText");
    }

    @Override
    public Object getProperty(String name) {
        return in.getProperty(name);
    }

    @Override
    public void close() throws XMLStreamException {
        in.close();
    }

    private void fill() throws XMLStreamException {
        while (pending.isEmpty() && !ended) {
            step();
        }
    }

    /** Handles the cursor's current token, then advances it. */
    private void step() throws XMLStreamException {
        int type = in.getEventType();
        switch (type) {
            case XMLStreamConstants.START_DOCUMENT -> pending.add(in.getCharacterEncodingScheme() == null
                    ? events.createStartDocument() : events.createStartDocument(in.getCharacterEncodingScheme()));
            case XMLStreamConstants.DTD -> throw new AtomLedgerException(file + ":" + line()
                    + ": DOCTYPE declarations are refused (SBML needs none, and a DTD can pull in other files)");
            case XMLStreamConstants.ENTITY_REFERENCE ->
                    throw new AtomLedgerException(file + ":" + line() + ": entity references are refused");
            case XMLStreamConstants.START_ELEMENT -> startElement();
            case XMLStreamConstants.END_ELEMENT -> endElement();
            case XMLStreamConstants.CHARACTERS, XMLStreamConstants.CDATA, XMLStreamConstants.SPACE -> {
                if (opaque.inside()) {
                    opaque.text(in);
                }
            }
            case XMLStreamConstants.END_DOCUMENT -> {
                pending.add(events.createEndDocument());
                ended = true;
                return;
            }
            default -> {
                // comments and processing instructions: nothing JSBML needs
            }
        }
        in.next();
    }

    /** The line of the current token (Woodstox makes a new location object per call: only where a line is kept). */
    private int line() {
        Location location = in.getLocation();
        return location == null ? 0 : Math.max(0, location.getLineNumber());
    }

    private void startElement() {
        String local = in.getLocalName();
        if (!rootSeen) {
            root(local, line());
            return;
        }
        if (opaque.inside()) {
            withheldDepth++;
            opaque.start(in);
            return;
        }
        if (OpaqueContent.isOpaque(local)) {
            withheldDepth++;
            opaque.open(local, currentSpecies);
            return;
        }
        record(local);
        if (withheldDepth > 0 || !coreNamespace.equals(in.getNamespaceURI()) || !KEPT.containsKey(local)) {
            withheldDepth++;
            return;
        }
        emitStart(local, List.of());
    }

    private void root(String local, int line) {
        rootSeen = true;
        String ns = in.getNamespaceURI() == null ? "" : in.getNamespaceURI();
        if (!local.equals("sbml") || !ns.startsWith(SBML_PREFIX)) {
            throw new AtomLedgerException(file + ":" + line + ": not an SBML file: the root element is <"
                    + local + "> in namespace '" + ns + "', expected <sbml> in an SBML namespace");
        }
        int level = parseIntOr(in.getAttributeValue(null, "level"), 0);
        if (level != 2 && level != 3) {
            throw new AtomLedgerException(file + ":" + line + ": SBML Level " + in.getAttributeValue(null, "level")
                    + " is not supported; AtomLedger reads Level 2 and Level 3");
        }
        coreNamespace = ns;
        List<Namespace> declared = new ArrayList<>();
        for (int i = 0; i < in.getNamespaceCount(); i++) {
            String uri = in.getNamespaceURI(i);
            if (uri != null && uri.startsWith(FBC_PREFIX)) {
                fbcVersion = parseIntOr(uri.substring(FBC_PREFIX.length()), 0);
            }
            if (ns.equals(uri)) {
                String prefix = in.getNamespacePrefix(i);
                declared.add(prefix == null || prefix.isEmpty() ? events.createNamespace(uri)
                        : events.createNamespace(prefix, uri));
            }
        }
        emitStart(local, declared);
    }

    private void emitStart(String local, List<Namespace> namespaces) {
        Set<String> kept = KEPT.get(local);
        List<Attribute> attributes = new ArrayList<>(kept.size());
        for (int i = 0; i < in.getAttributeCount(); i++) {
            String ns = in.getAttributeNamespace(i);
            String name = in.getAttributeLocalName(i);
            if ((ns == null || ns.isEmpty()) && kept.contains(name)) {
                attributes.add(events.createAttribute(name, in.getAttributeValue(i)));
            }
        }
        String prefix = in.getPrefix();
        pending.add(events.createStartElement(prefix == null ? "" : prefix, coreNamespace, local,
                attributes.iterator(), namespaces.iterator()));
    }

    private void endElement() {
        if (withheldDepth > 0) {
            withheldDepth--;
            if (opaque.inside()) {
                opaque.end();
                return;
            }
        } else {
            String prefix = in.getPrefix();
            pending.add(events.createEndElement(prefix == null ? "" : prefix, coreNamespace, in.getLocalName()));
        }
        switch (in.getLocalName()) {
            case "species" -> currentSpecies = null;
            case "reaction" -> currentReaction = null;
            case "listOfReactants", "listOfProducts" -> currentList = null;
            case "listOfModifiers" -> inModifiers = false;
            default -> {
            }
        }
    }

    /** Records ids, texts and lines of an element outside notes and annotations. */
    private void record(String local) {
        String id = in.getAttributeValue(null, "id");
        if (id == null) {
            id = fbcAttr("id");
        }
        // Unit definitions have their own id space (UnitSId) in SBML.
        if (id != null && !local.equals("unitDefinition")) {
            idCounts.merge(id, 1, Integer::sum);
        }
        switch (local) {
            case "species" -> {
                currentSpecies = new RawSpecies.Builder(id, fbcAttr("chemicalFormula"), fbcAttr("charge"),
                        in.getAttributeValue(null, "charge"), sboTerm(), line());
                species.putIfAbsent(id == null ? "" : id, currentSpecies);
            }
            case "reaction" -> {
                currentReaction = new RawReaction(id == null ? "" : id, line(), sboTerm());
                reactions.putIfAbsent(currentReaction.id(), currentReaction);
            }
            case "listOfReactants" -> currentList = currentReaction == null ? null : currentReaction.reactants();
            case "listOfProducts" -> currentList = currentReaction == null ? null : currentReaction.products();
            case "listOfModifiers" -> inModifiers = true;
            case "speciesReference" -> {
                if (currentList != null) {
                    currentList.add(new RawReaction.Ref(nullToEmpty(in.getAttributeValue(null, "species")),
                            in.getAttributeValue(null, "stoichiometry"), line(), false));
                }
            }
            case "stoichiometryMath" -> {
                if (currentList != null && !currentList.isEmpty()) {
                    int last = currentList.size() - 1;
                    currentList.set(last, currentList.get(last).withStoichiometryMath());
                }
            }
            case "modifierSpeciesReference" -> {
                if (inModifiers && currentReaction != null) {
                    currentReaction.modifiers().add(nullToEmpty(in.getAttributeValue(null, "species")));
                }
            }
            default -> {
            }
        }
    }

    /** The sboTerm attribute when it has the form JSBML accepts ({@code SBO:} and seven digits), else "". */
    private String sboTerm() {
        String text = in.getAttributeValue(null, "sboTerm");
        if (text == null || text.length() != 11 || !text.startsWith("SBO:")) {
            return "";
        }
        for (int i = 4; i < 11; i++) {
            if (text.charAt(i) < '0' || text.charAt(i) > '9') {
                return "";
            }
        }
        return text;
    }

    private String fbcAttr(String name) {
        for (int i = 0; i < in.getAttributeCount(); i++) {
            String ns = in.getAttributeNamespace(i);
            if (ns != null && ns.startsWith(FBC_PREFIX) && in.getAttributeLocalName(i).equals(name)) {
                return in.getAttributeValue(i);
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
