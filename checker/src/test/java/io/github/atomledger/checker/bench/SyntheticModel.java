package io.github.atomledger.checker.bench;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;

/**
 * Writes an invented SBML L3 fbc v2 model of n reactions for the memory benchmark: n + 200 species, each
 * reaction joins two pool species into one product (element-balanced), every 50th one loses a proton
 * (imbalanced), with notes and annotations on every element as real models have. Deterministic.
 */
final class SyntheticModel {

    private static final String CORE = "http://www.sbml.org/sbml/level3/version1/core";
    private static final String FBC = "http://www.sbml.org/sbml/level3/version1/fbc/version2";

    private SyntheticModel() {
    }

    static void write(Path file, int reactions) throws IOException {
        try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            XMLStreamWriter w = XMLOutputFactory.newFactory().createXMLStreamWriter(out);
            w.writeStartDocument("UTF-8", "1.0");
            w.writeStartElement("sbml");
            w.writeDefaultNamespace(CORE);
            w.writeNamespace("fbc", FBC);
            w.writeAttribute("level", "3");
            w.writeAttribute("version", "1");
            w.writeAttribute(FBC, "required", "false");
            w.writeStartElement("model");
            w.writeAttribute("id", "synthetic");
            w.writeAttribute(FBC, "strict", "false");
            w.writeStartElement("listOfCompartments");
            w.writeEmptyElement("compartment");
            w.writeAttribute("id", "c");
            w.writeAttribute("constant", "true");
            w.writeEndElement();
            w.writeStartElement("listOfSpecies");
            species(w, "h", "H", 1);
            for (int i = 0; i < 200; i++) {
                species(w, "pool" + i, "C" + (i % 7 + 1) + "H" + (i % 11 + 2) + "O" + (i % 5 + 1), -(i % 3));
            }
            for (int j = 0; j < reactions; j++) {
                int a = j % 200;
                int b = (j * 7 + 3) % 200;
                species(w, "prod" + j, "C" + (a % 7 + 1 + b % 7 + 1) + "H" + (a % 11 + 2 + b % 11 + 2) + "O" + (a % 5 + 1 + b % 5 + 1),
                        -(a % 3) - (b % 3));
            }
            w.writeEndElement();
            w.writeStartElement("listOfReactions");
            for (int j = 0; j < reactions; j++) {
                w.writeStartElement("reaction");
                w.writeAttribute("id", "r" + j);
                w.writeAttribute("reversible", "false");
                w.writeAttribute("fast", "false");
                w.writeAttribute("sboTerm", "SBO:0000176");
                notes(w, "subsystem: synthetic " + (j % 40));
                w.writeStartElement("listOfReactants");
                ref(w, "pool" + (j % 200), "1");
                ref(w, "pool" + ((j * 7 + 3) % 200), "1");
                w.writeEndElement();
                w.writeStartElement("listOfProducts");
                ref(w, "prod" + j, "1");
                if (j % 50 == 0) {
                    ref(w, "h", "1");
                }
                w.writeEndElement();
                w.writeEndElement();
            }
            w.writeEndElement();
            w.writeEndElement();
            w.writeEndElement();
            w.writeEndDocument();
            w.close();
        } catch (XMLStreamException e) {
            throw new IOException(e);
        }
    }

    private static void species(XMLStreamWriter w, String id, String formula, int charge) throws XMLStreamException {
        w.writeStartElement("species");
        w.writeAttribute("id", id);
        w.writeAttribute("metaid", "meta_" + id);
        w.writeAttribute("compartment", "c");
        w.writeAttribute("hasOnlySubstanceUnits", "false");
        w.writeAttribute("boundaryCondition", "false");
        w.writeAttribute("constant", "false");
        w.writeAttribute(FBC, "charge", Integer.toString(charge));
        w.writeAttribute(FBC, "chemicalFormula", formula);
        notes(w, "deltaG: 10000000");
        w.writeStartElement("annotation");
        w.writeStartElement("rdf", "RDF", "http://www.w3.org/1999/02/22-rdf-syntax-ns#");
        w.writeNamespace("rdf", "http://www.w3.org/1999/02/22-rdf-syntax-ns#");
        w.writeNamespace("bqbiol", "http://biomodels.net/biology-qualifiers/");
        w.writeStartElement("rdf", "Description", "http://www.w3.org/1999/02/22-rdf-syntax-ns#");
        w.writeAttribute("rdf", "http://www.w3.org/1999/02/22-rdf-syntax-ns#", "about", "#meta_" + id);
        w.writeStartElement("bqbiol", "is", "http://biomodels.net/biology-qualifiers/");
        w.writeStartElement("rdf", "Bag", "http://www.w3.org/1999/02/22-rdf-syntax-ns#");
        w.writeEmptyElement("rdf", "li", "http://www.w3.org/1999/02/22-rdf-syntax-ns#");
        w.writeAttribute("rdf", "http://www.w3.org/1999/02/22-rdf-syntax-ns#", "resource", "https://identifiers.org/metanetx.chemical/MNXM" + id.hashCode());
        w.writeEndElement();
        w.writeEndElement();
        w.writeEndElement();
        w.writeEndElement();
        w.writeEndElement();
        w.writeEndElement();
    }

    private static void notes(XMLStreamWriter w, String text) throws XMLStreamException {
        w.writeStartElement("notes");
        w.writeStartElement("body");
        w.writeDefaultNamespace("http://www.w3.org/1999/xhtml");
        w.writeStartElement("p");
        w.writeCharacters(text);
        w.writeEndElement();
        w.writeEndElement();
        w.writeEndElement();
    }

    private static void ref(XMLStreamWriter w, String species, String stoichiometry) throws XMLStreamException {
        w.writeEmptyElement("speciesReference");
        w.writeAttribute("species", species);
        w.writeAttribute("stoichiometry", stoichiometry);
        w.writeAttribute("constant", "true");
    }
}
