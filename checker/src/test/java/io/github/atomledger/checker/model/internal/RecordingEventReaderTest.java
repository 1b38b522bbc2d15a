package io.github.atomledger.checker.model.internal;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.TestModels;

import java.io.InputStream;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import javax.xml.stream.XMLEventReader;
import javax.xml.stream.events.Attribute;
import javax.xml.stream.events.Namespace;
import javax.xml.stream.events.StartElement;
import javax.xml.stream.events.XMLEvent;
import org.junit.jupiter.api.Test;

/** What JSBML is shown: only the kept SBML core elements and attributes (issue 8, performance). */
class RecordingEventReaderTest {

    private static List<StartElement> startElements(String fixture) throws Exception {
        List<StartElement> out = new ArrayList<>();
        try (InputStream in = Files.newInputStream(TestModels.fixture(fixture))) {
            XMLEventReader reader = new RecordingEventReader(SafeXml.factory().createXMLStreamReader(in), fixture);
            while (reader.hasNext()) {
                XMLEvent e = reader.nextEvent();
                assertThat(e.isCharacters()).as("no text reaches JSBML").isFalse();
                if (e.isStartElement()) {
                    out.add(e.asStartElement());
                }
            }
        }
        return out;
    }

    @Test
    void showsJsbmlOnlyKeptCoreElementsWithKeptAttributes() throws Exception {
        List<StartElement> seen = startElements("model/withheld-content.xml");
        assertThat(seen).extracting(s -> s.getName().getLocalPart()).containsExactly("sbml", "model",
                "listOfCompartments", "compartment", "compartment", "listOfSpecies", "species", "species", "species",
                "species", "species", "species", "listOfReactions", "reaction", "listOfReactants", "speciesReference",
                "speciesReference", "listOfProducts", "speciesReference", "speciesReference", "speciesReference",
                "listOfModifiers", "modifierSpeciesReference", "reaction", "listOfReactants", "speciesReference",
                "reaction", "listOfReactants", "speciesReference", "listOfProducts", "speciesReference");
        for (StartElement s : seen) {
            assertThat(s.getName().getNamespaceURI()).isEqualTo("http://www.sbml.org/sbml/level3/version1/core");
            for (Iterator<?> it = s.getAttributes(); it.hasNext(); ) {
                Attribute a = (Attribute) it.next();
                assertThat(a.getName().getNamespaceURI()).isEmpty();
                assertThat(RecordingEventReader.KEPT.get(s.getName().getLocalPart())).contains(a.getName().getLocalPart());
            }
        }
        List<String> declared = new ArrayList<>();
        for (Iterator<?> it = seen.get(0).getNamespaces(); it.hasNext(); ) {
            declared.add(((Namespace) it.next()).getNamespaceURI());
        }
        assertThat(declared).as("no package is declared to JSBML").containsExactly("http://www.sbml.org/sbml/level3/version1/core");
    }

    @Test
    void recordsWhatItWithholds() throws Exception {
        try (InputStream in = Files.newInputStream(TestModels.fixture("model/withheld-content.xml"))) {
            RecordingEventReader reader = new RecordingEventReader(SafeXml.factory().createXMLStreamReader(in), "m.xml");
            while (reader.hasNext()) {
                reader.nextEvent();
            }
            assertThat(reader.fbcVersion()).isEqualTo(2);
            assertThat(reader.species().get("M_glc__D_c").sboTerm()).isEqualTo("SBO:0000247");
            assertThat(reader.species().get("M_g6p_c").formula()).isEqualTo("C6H11O9P");
            assertThat(reader.species().get("M_g6p_c").fbcCharge()).isEqualTo("-2");
            assertThat(reader.reactions().get("R_HEX").sboTerm()).isEqualTo("SBO:0000176");
            assertThat(reader.reactions().get("R_HEX").reactants()).extracting(RawReaction.Ref::stoichiometry)
                    .containsExactly("1", "1");
            assertThat(reader.duplicateIds()).containsExactly("G_g2");
        }
    }
}
