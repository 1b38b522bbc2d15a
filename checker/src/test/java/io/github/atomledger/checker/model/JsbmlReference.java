package io.github.atomledger.checker.model;

import io.github.atomledger.checker.model.internal.SafeXml;

import java.io.BufferedInputStream;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.GZIPInputStream;
import javax.xml.stream.XMLInputFactory;
import org.sbml.jsbml.Compartment;
import org.sbml.jsbml.Model;
import org.sbml.jsbml.ModifierSpeciesReference;
import org.sbml.jsbml.Reaction;
import org.sbml.jsbml.SBMLDocument;
import org.sbml.jsbml.Species;
import org.sbml.jsbml.SpeciesReference;

/**
 * The reference for what the loader withholds from JSBML: JSBML's own reader, shown the whole document (notes,
 * annotations, metaids, SBO terms, units, parameters, math and all) but for the elements of SBML packages, which
 * jsbml-core, the only JSBML on the class path, cannot read (a gene product association ends in a
 * ClassCastException); and the same facts taken from a {@link ModelView}, one line per element, so that a
 * difference shows as a readable diff.
 */
final class JsbmlReference {

    private JsbmlReference() {
    }

    /** What JSBML reads from the whole file. */
    static List<String> describe(Path file) throws Exception {
        SBMLDocument doc;
        try (InputStream raw = new BufferedInputStream(Files.newInputStream(file));
             InputStream in = file.toString().endsWith(".gz") ? new GZIPInputStream(raw) : raw) {
            XMLInputFactory factory = SafeXml.factory();
            doc = new org.sbml.jsbml.xml.stax.SBMLReader().readSBML(
                    factory.createFilteredReader(factory.createXMLEventReader(in), new WithoutPackageElements()));
        }
        Model model = doc.getModel();
        List<String> out = new ArrayList<>();
        out.add("model " + model.getId() + " level " + doc.getLevel() + " version " + doc.getVersion());
        for (Compartment c : model.getListOfCompartments()) {
            out.add("compartment " + c.getId() + " '" + orId(c.getName(), c.getId()) + "'");
        }
        for (Species s : model.getListOfSpecies()) {
            out.add("species " + s.getId() + " '" + orId(s.getName(), s.getId()) + "' in " + s.getCompartment()
                    + " boundary " + s.getBoundaryCondition() + " sbo '" + (s.isSetSBOTerm() ? s.getSBOTermID() : "") + "'"
                    + " is " + isReferences(s));
        }
        for (Reaction r : model.getListOfReactions()) {
            List<String> modifiers = new ArrayList<>();
            for (ModifierSpeciesReference m : r.getListOfModifiers()) {
                modifiers.add(m.getSpecies());
            }
            out.add("reaction " + r.getId() + " '" + orId(r.getName(), r.getId()) + "' reversible " + r.getReversible()
                    + " sbo '" + (r.isSetSBOTerm() ? r.getSBOTermID() : "") + "' reactants " + refs(r.getListOfReactants())
                    + " products " + refs(r.getListOfProducts()) + " modifiers " + modifiers);
        }
        return out;
    }

    /** The same facts from the view; a reference with {@code <stoichiometryMath>} has no stoichiometry text. */
    static List<String> describe(ModelView view) {
        List<String> out = new ArrayList<>();
        out.add("model " + view.modelId() + " level " + view.level() + " version " + view.version());
        for (CompartmentInfo c : view.compartments()) {
            out.add("compartment " + c.id() + " '" + c.name() + "'");
        }
        for (SpeciesInfo s : view.species()) {
            out.add("species " + s.id() + " '" + s.name() + "' in " + s.compartment() + " boundary " + s.boundary()
                    + " sbo '" + s.sboTerm() + "'" + " is " + new java.util.TreeSet<>(s.references()));
        }
        for (ReactionInfo r : view.reactions()) {
            out.add("reaction " + r.id() + " '" + r.name() + "' reversible " + r.reversible() + " sbo '" + r.sboTerm()
                    + "' reactants " + participants(r.reactants(), view.level()) + " products "
                    + participants(r.products(), view.level()) + " modifiers " + r.modifiers());
        }
        return out;
    }

    /** The resources of the species' MIRIAM "is" terms (biology or model qualifier), as JSBML reads them (issue 15). */
    private static java.util.TreeSet<String> isReferences(Species s) {
        java.util.TreeSet<String> out = new java.util.TreeSet<>();
        for (org.sbml.jsbml.CVTerm t : s.getCVTerms()) {
            if (t.getQualifier() == org.sbml.jsbml.CVTerm.Qualifier.BQB_IS || t.getQualifier() == org.sbml.jsbml.CVTerm.Qualifier.BQM_IS) {
                out.addAll(t.getResources());
            }
        }
        return out;
    }

    private static String orId(String name, String id) {
        return name == null || name.isBlank() ? id : name;
    }

    private static List<String> refs(List<SpeciesReference> refs) {
        List<String> out = new ArrayList<>();
        for (SpeciesReference ref : refs) {
            out.add(ref.getSpecies() + (ref.isSetStoichiometryMath() ? " (math)" : ""));
        }
        return out;
    }

    private static List<String> participants(List<Participant> list, int level) {
        List<String> out = new ArrayList<>();
        for (Participant p : list) {
            out.add(p.species() + (level == 2 && p.stoichiometryText() == null ? " (math)" : ""));
        }
        return out;
    }
}
