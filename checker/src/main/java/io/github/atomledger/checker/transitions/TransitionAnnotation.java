package io.github.atomledger.checker.transitions;

import io.github.atomledger.atommapper.mapping.AtomTransition;

import java.io.StringWriter;
import java.util.List;
import java.util.Objects;
import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;

/**
 * AtomLedger's reaction annotation, element {@code atomTransitions} in the namespace
 * {@link #NAMESPACE} (version 1), placed inside the reaction's SBML {@code <annotation>}:
 * <pre>{@code
 * <atl:atomTransitions xmlns:atl="http://atomledger.github.io/ns/atom-transitions/1"
 *     origin="inferred" status="mapped" cost="3" mapper="1">
 *   <atl:carbons>
 *     glc_c: 1 2 3 4 5 6 = g6p_c: 1 2 3 4 5 6
 *   </atl:carbons>
 *   <atl:reactionSmiles>[CH2:1]...>>...</atl:reactionSmiles>
 *   <atl:structure species="glc_c" fingerprint="sha256:..." smiles="OC[C@H]1..."/>
 * </atl:atomTransitions>
 * }</pre>
 * {@code origin} is {@code inferred} (written by the tool) or {@code curated} (written or pinned
 * by a person; never overwritten unless asked). The carbon lines use {@link CarbonMapText}. A
 * curated annotation needs only {@code origin} and {@code carbons}.
 *
 * @param origin         "inferred" or "curated"
 * @param status         the mapping status label when written ("" for curated maps written by hand)
 * @param cost           the weighted bond-edit cost, or -1 when not recorded
 * @param mapperVersion  the atom-mapper version that wrote it ("" when unknown)
 * @param carbons        the carbon transitions, sorted
 * @param reactionSmiles the mapped reaction SMILES ("" when none)
 * @param structures     the structures used, by species, sorted
 */
public record TransitionAnnotation(String origin, String status, int cost, String mapperVersion,
                                   List<AtomTransition> carbons, String reactionSmiles,
                                   List<StoredStructure> structures) {

    /** The versioned namespace of AtomLedger's annotations. */
    public static final String NAMESPACE = "http://atomledger.github.io/ns/atom-transitions/1";
    public static final String PREFIX = "atl";
    public static final String ELEMENT = "atomTransitions";
    public static final String INFERRED = "inferred";
    public static final String CURATED = "curated";

    public TransitionAnnotation {
        Objects.requireNonNull(origin, "origin");
        status = status == null ? "" : status;
        mapperVersion = mapperVersion == null ? "" : mapperVersion;
        carbons = carbons.stream().sorted().toList();
        reactionSmiles = reactionSmiles == null ? "" : reactionSmiles;
        structures = structures.stream()
                .sorted(java.util.Comparator.comparing(StoredStructure::species)).toList();
    }

    public boolean isCurated() {
        return CURATED.equals(origin);
    }

    /**
     * The element as XML text, its first line unindented and later lines indented by
     * {@code indent} plus {@code unit} per level, with {@code lineEnd} line ends.
     */
    public String toXml(String indent, String unit, String lineEnd) {
        // The writer escapes a carriage return in text as "&#xd;": write '\n' and convert after.
        String newline = "\n";
        StringWriter out = new StringWriter();
        try {
            XMLStreamWriter w = XMLOutputFactory.newFactory().createXMLStreamWriter(out);
            w.setPrefix(PREFIX, NAMESPACE);
            w.writeStartElement(PREFIX, ELEMENT, NAMESPACE);
            w.writeNamespace(PREFIX, NAMESPACE);
            w.writeAttribute("origin", origin);
            if (!status.isEmpty()) {
                w.writeAttribute("status", status);
            }
            if (cost >= 0) {
                w.writeAttribute("cost", Integer.toString(cost));
            }
            if (!mapperVersion.isEmpty()) {
                w.writeAttribute("mapper", mapperVersion);
            }
            String inner = indent + unit;
            w.writeCharacters(newline + inner);
            w.writeStartElement(PREFIX, "carbons", NAMESPACE);
            for (String line : CarbonMapText.format(carbons)) {
                w.writeCharacters(newline + inner + unit + line);
            }
            w.writeCharacters(newline + inner);
            w.writeEndElement();
            if (!reactionSmiles.isEmpty()) {
                w.writeCharacters(newline + inner);
                w.writeStartElement(PREFIX, "reactionSmiles", NAMESPACE);
                w.writeCharacters(reactionSmiles);
                w.writeEndElement();
            }
            for (StoredStructure s : structures) {
                w.writeCharacters(newline + inner);
                w.writeEmptyElement(PREFIX, "structure", NAMESPACE);
                w.writeAttribute("species", s.species());
                if (!s.fingerprint().isEmpty()) {
                    w.writeAttribute("fingerprint", s.fingerprint());
                }
                if (!s.smiles().isEmpty()) {
                    w.writeAttribute("smiles", s.smiles());
                }
            }
            w.writeCharacters(newline + indent);
            w.writeEndElement();
            w.flush();
            w.close();
        } catch (XMLStreamException e) {
            throw new IllegalStateException("cannot write the annotation: " + e.getMessage(), e);
        }
        return lineEnd.equals("\n") ? out.toString() : out.toString().replace("\n", lineEnd);
    }
}
