package io.github.atomledger.checker.model;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.model.internal.CappedInputStream;
import io.github.atomledger.checker.model.internal.RawReaction;
import io.github.atomledger.checker.model.internal.RawSpecies;
import io.github.atomledger.checker.model.internal.RecordingEventReader;
import io.github.atomledger.checker.model.internal.SafeXml;


import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.zip.GZIPInputStream;
import javax.xml.stream.Location;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamException;
import org.sbml.jsbml.Compartment;
import org.sbml.jsbml.Model;
import org.sbml.jsbml.Reaction;
import org.sbml.jsbml.SBMLDocument;
import org.sbml.jsbml.Species;
import org.sbml.jsbml.SpeciesReference;
import org.sbml.jsbml.ModifierSpeciesReference;
import org.sbml.jsbml.xml.stax.SBMLReader;

/**
 * Reads an SBML Level 2 or 3 file ({@code .xml}, or gzip-compressed {@code .xml.gz}) into a
 * {@link ModelView}.
 *
 * <p>JSBML builds the document the view's compartments, species, reactions and species references
 * come from; one streaming pass in front of it (the same parse, no second read) shows JSBML only
 * those elements and the attributes read from them, and keeps what JSBML would lose or round:
 * formula and charge texts exactly as written (fbc versions 1 to 3, decimal charges included),
 * stoichiometry texts, SBO terms, the line of every species, reaction and speciesReference, and
 * duplicate ids (see {@code RecordingEventReader} for what JSBML never sees). The reader is
 * hardened: DOCTYPE declarations and entity references are refused, external entities are never
 * resolved, and gzip input is capped at {@link LoadOptions#maxDecompressedBytes()}.
 *
 * <p>Formula and charge precedence per species: the fbc attributes, then {@code FORMULA:} /
 * {@code CHARGE:} lines in the notes, then (charge only) the Level 2 {@code charge} attribute.
 *
 * <p>Example: {@code ModelView m = new ModelLoader(LoadOptions.defaults()).load(path, "models/a.xml");}
 *
 * <p>Thread-safe: each call builds its own parser. Never writes to the file.
 *
 * @throws AtomLedgerException from {@link #load} when the file is missing, unreadable, not
 *         well-formed XML, not SBML, or an unsupported level; the message names the file and line
 */
public final class ModelLoader {

    private final LoadOptions options;

    public ModelLoader(LoadOptions options) {
        this.options = options;
    }

    /**
     * Loads one model.
     *
     * @param file        the file to read
     * @param displayPath how reports name the file (relative to the project base directory)
     */
    public ModelView load(Path file, String displayPath) {
        if (!Files.isRegularFile(file)) {
            throw new AtomLedgerException(displayPath + ": model file not found");
        }
        try (InputStream in = open(file)) {
            XMLInputFactory factory = hardenedFactory();
            SBMLDocument doc;
            RecordingEventReader recorder;
            try {
                recorder = new RecordingEventReader(factory.createXMLStreamReader(in), displayPath);
                doc = new SBMLReader().readSBML(recorder);
            } catch (XMLStreamException e) {
                throw new AtomLedgerException(where(displayPath, e.getLocation()) + "malformed XML: " + clean(e), e);
            } catch (AtomLedgerException e) {
                throw e;
            } catch (RuntimeException e) {
                Throwable c = e.getCause();
                if (c instanceof XMLStreamException x) {
                    throw new AtomLedgerException(where(displayPath, x.getLocation()) + "malformed XML: " + clean(x), e);
                }
                if (c instanceof AtomLedgerException a) {
                    throw a;
                }
                throw new AtomLedgerException(displayPath + ": the SBML reader failed: " + e, e);
            }
            if (!recorder.rootSeen()) {
                throw new AtomLedgerException(displayPath + ": the file contains no XML element");
            }
            if (doc == null || !doc.isSetModel()) {
                throw new AtomLedgerException(displayPath + ": the SBML document contains no <model>");
            }
            return toView(doc, recorder, displayPath);
        } catch (CappedInputStream.SizeCapException e) {
            throw new AtomLedgerException(displayPath + ": " + e.getMessage()
                    + " (set atomledger.maxModelBytes to raise it)", e);
        } catch (NoSuchFileException e) {
            throw new AtomLedgerException(displayPath + ": model file not found", e);
        } catch (IOException e) {
            throw new AtomLedgerException(displayPath + ": cannot read the model file: " + e.getMessage(), e);
        }
    }

    private InputStream open(Path file) throws IOException {
        InputStream raw = new BufferedInputStream(Files.newInputStream(file), 1 << 16);
        raw.mark(2);
        int b1 = raw.read();
        int b2 = raw.read();
        raw.reset();
        if (b1 == 0x1f && b2 == 0x8b) {
            return new CappedInputStream(new BufferedInputStream(new GZIPInputStream(raw, 1 << 16), 1 << 16),
                    options.maxDecompressedBytes());
        }
        return new CappedInputStream(raw, options.maxDecompressedBytes());
    }

    static XMLInputFactory hardenedFactory() {
        return SafeXml.factory();
    }

    private static String where(String file, Location loc) {
        return SafeXml.where(file, loc);
    }

    private static String clean(XMLStreamException e) {
        return SafeXml.clean(e);
    }

    private ModelView toView(SBMLDocument doc, RecordingEventReader rec, String displayPath) {
        Model model = doc.getModel();
        List<CompartmentInfo> compartments = new ArrayList<>();
        for (Compartment c : model.getListOfCompartments()) {
            compartments.add(new CompartmentInfo(c.getId(), c.getName()));
        }
        Map<String, RawSpecies> rawSpecies = rec.species();
        List<SpeciesInfo> species = new ArrayList<>();
        for (Species s : model.getListOfSpecies()) {
            species.add(species(s, rawSpecies.get(s.getId())));
        }
        Map<String, RawReaction> rawReactions = rec.reactions();
        List<ReactionInfo> reactions = new ArrayList<>();
        for (Reaction r : model.getListOfReactions()) {
            reactions.add(reaction(r, rawReactions.get(r.getId()), doc.getLevel()));
        }
        return new ModelView(displayPath, model.getId(), doc.getLevel(), doc.getVersion(), rec.fbcVersion(),
                compartments, species, reactions, rec.duplicateIds());
    }

    private static SpeciesInfo species(Species s, RawSpecies raw) {
        Map<String, String> notes = raw == null ? Map.of() : raw.notes();
        String formula = raw == null ? null : raw.formula();
        FormulaSource formulaSource = FormulaSource.FBC;
        if (formula == null) {
            formula = notes.get("FORMULA");
            formulaSource = formula == null ? FormulaSource.NONE : FormulaSource.NOTES;
        }
        String charge = raw == null ? null : raw.fbcCharge();
        FormulaSource chargeSource = FormulaSource.FBC;
        if (charge == null) {
            charge = notes.get("CHARGE");
            chargeSource = FormulaSource.NOTES;
            if (charge == null) {
                charge = raw == null ? null : raw.sbmlCharge();
                chargeSource = charge == null ? FormulaSource.NONE : FormulaSource.SBML_CHARGE_ATTRIBUTE;
            }
        }
        // Empty notes values ("FORMULA: ") mean "not given", as exporters write them.
        if (formula != null && formula.isBlank() && formulaSource == FormulaSource.NOTES) {
            formula = null;
            formulaSource = FormulaSource.NONE;
        }
        if (charge != null && charge.isBlank() && chargeSource == FormulaSource.NOTES) {
            charge = null;
            chargeSource = FormulaSource.NONE;
        }
        return new SpeciesInfo(s.getId(), s.getName(), s.getCompartment(), s.getBoundaryCondition(),
                raw == null ? "" : raw.sboTerm(), formula, formulaSource, charge, chargeSource,
                raw == null ? List.of() : raw.inchis(), raw == null ? 0 : raw.line(), notes,
                raw == null ? List.of() : raw.references());
    }

    private static ReactionInfo reaction(Reaction r, RawReaction raw, int level) {
        // JSBML's getListOf...() creates and registers an empty list when there is none: ask first.
        List<Participant> reactants = r.isSetListOfReactants()
                ? participants(r.getListOfReactants(), raw == null ? null : raw.reactants(), level) : List.of();
        List<Participant> products = r.isSetListOfProducts()
                ? participants(r.getListOfProducts(), raw == null ? null : raw.products(), level) : List.of();
        List<String> modifiers = new ArrayList<>();
        if (r.isSetListOfModifiers()) {
            for (ModifierSpeciesReference m : r.getListOfModifiers()) {
                modifiers.add(m.getSpecies());
            }
        }
        return new ReactionInfo(r.getId(), r.getName(), r.getReversible(), raw == null ? "" : raw.sboTerm(),
                reactants, products, modifiers, raw == null ? 0 : raw.line());
    }

    private static List<Participant> participants(List<SpeciesReference> refs, List<RawReaction.Ref> raw, int level) {
        List<Participant> out = new ArrayList<>();
        for (int i = 0; i < refs.size(); i++) {
            SpeciesReference ref = refs.get(i);
            RawReaction.Ref r = raw != null && i < raw.size() && raw.get(i).species().equals(ref.getSpecies()) ? raw.get(i) : null;
            String text = r == null ? null : r.stoichiometry();
            if (text == null && level == 2) {
                // Level 2: an absent stoichiometry means 1 (unless stoichiometryMath is used).
                text = r != null && r.stoichiometryMath() ? null : "1";
            }
            out.add(new Participant(ref.getSpecies(), text, r == null ? 0 : r.line()));
        }
        return out;
    }
}
