package io.github.atomledger.checker.check.structure;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.FormulaParser;
import io.github.atomledger.atommapper.formula.FormulaSyntaxException;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Chooses each species' structure from its sources, in this order of precedence:
 * <ol>
 *   <li>structure files keyed by the species' id ({@code atomledger.structures}: table rows,
 *       molfiles named by the id, SD records whose id field holds it), in the configured order;</li>
 *   <li>{@code SMILES:} then {@code InChI:} lines in the species' notes;</li>
 *   <li>an InChI in the species' MIRIAM annotation (identifiers.org {@code inchi} URIs);</li>
 *   <li>structure files keyed by a cross-reference of the species' MIRIAM annotation
 *       ({@code bqbiol:is}: chebi, metanetx.chemical, kegg.compound, bigg.metabolite, inchikey),
 *       in the configured order; within one file, when the species carries several ids that the
 *       file holds (models often list a compound's acid and base forms), the structure whose
 *       formula and charge equal the declared ones wins, then one that differs only in hydrogens,
 *       then the first in annotation order;</li>
 *   <li>the SMILES that AtomLedger itself wrote into the model's reaction annotations.</li>
 * </ol>
 * The model's own statements (notes, annotation) come before cross-reference look-ups, which are
 * generic; files keyed by species id come first, being written for this model. When two sources
 * give different structures (different fingerprints), the first wins and a "conflict" problem is
 * recorded. Stateless and thread-safe.
 */
public final class StructureResolver {

    /** One source's offer for a species: alternatives to choose among (cross-references) or one. */
    private record Plan(SpeciesStructures.Source source, List<Offer> offers) {
    }

    /** A structure text, direct (notes, annotation) or in a file (read later). */
    private record Offer(StructureFile file, StructureFile.Entry entry, String kind, String text, String origin,
                         int line, String via) {
    }

    /**
     * @param model  the model
     * @param table  the species structure table (may be empty)
     * @param stored species to SMILES found in AtomLedger annotations of the model
     */
    public SpeciesStructures resolve(ModelView model, StructureTable table, Map<String, String> stored) {
        return resolve(model, StructureLibrary.of(table.file().isEmpty() ? List.of() : List.of(table)), stored);
    }

    /**
     * @param model   the model
     * @param library the configured structure files (may be {@link StructureLibrary#EMPTY})
     * @param stored  species to SMILES found in AtomLedger annotations of the model
     */
    public SpeciesStructures resolve(ModelView model, StructureLibrary library, Map<String, String> stored) {
        List<SpeciesStructures.Problem> problems = new ArrayList<>(library.problems());
        for (StructureFile f : library.files()) {
            if (f instanceof StructureTable t) {
                for (StructureTable.Entry e : t.entries().values()) {
                    if (model.species(e.species()).isEmpty()) {
                        problems.add(new SpeciesStructures.Problem(e.species(), "unknown-species", SpeciesStructures.Source.TABLE,
                                e.text(), "the structure table (line " + e.line() + ") names species " + e.species()
                                + ", which the model does not define", e.line(), t.file() + ":" + e.line()));
                    }
                }
            }
        }
        Map<String, List<Plan>> plans = new LinkedHashMap<>();
        Map<StructureFile, List<StructureFile.Entry>> wanted = new LinkedHashMap<>();
        for (SpeciesInfo s : model.species()) {
            List<Plan> list = plans(s, library, stored.get(s.id()));
            plans.put(s.id(), list);
            list.forEach(p -> p.offers().stream().filter(o -> o.file() != null)
                    .forEach(o -> wanted.computeIfAbsent(o.file(), k -> new ArrayList<>()).add(o.entry())));
        }
        wanted.forEach(StructureFile::prefetch);

        Map<String, SpeciesStructures.Resolved> chosen = new LinkedHashMap<>();
        Map<String, Object> parsed = new HashMap<>();
        for (SpeciesInfo s : model.species()) {
            Formula declared = declaredFormula(s);
            Rational declaredCharge = declaredCharge(s);
            List<SpeciesStructures.Resolved> candidates = new ArrayList<>();
            for (Plan plan : plans.get(s.id())) {
                choose(s.id(), plan, declared, declaredCharge, parsed, problems).ifPresent(candidates::add);
            }
            if (candidates.isEmpty()) {
                continue;
            }
            SpeciesStructures.Resolved first = candidates.get(0);
            chosen.put(s.id(), first);
            for (SpeciesStructures.Resolved other : candidates.subList(1, candidates.size())) {
                if (!other.structure().fingerprint().equals(first.structure().fingerprint())) {
                    problems.add(new SpeciesStructures.Problem(s.id(), "conflict", other.source(), other.text(),
                            "the " + other.source().label() + " structure of " + s.id()
                                    + (other.origin().isEmpty() ? "" : " (" + other.origin() + ")") + " differs from the "
                                    + first.source().label() + " structure"
                                    + (first.origin().isEmpty() ? "" : " (" + first.origin() + ")") + ", which is used",
                            lineOf(first), first.origin()));
                }
            }
        }
        return new SpeciesStructures(chosen, problems);
    }

    private static int lineOf(SpeciesStructures.Resolved r) {
        int colon = r.origin().lastIndexOf(':');
        if (r.source() == SpeciesStructures.Source.TABLE && colon > 0) {
            try {
                return Integer.parseInt(r.origin().substring(colon + 1));
            } catch (NumberFormatException e) {
                return 0;
            }
        }
        return 0;
    }

    private static List<Plan> plans(SpeciesInfo s, StructureLibrary library, String stored) {
        List<Plan> out = new ArrayList<>();
        for (StructureFile f : library.files()) {
            f.species(s.id()).ifPresent(e -> out.add(new Plan(f.speciesSource(), List.of(offer(f, e)))));
        }
        String smiles = s.notes().get("SMILES");
        if (smiles != null && !smiles.isBlank()) {
            out.add(new Plan(SpeciesStructures.Source.NOTES, List.of(direct("smiles", smiles.strip(), "notes"))));
        }
        String inchi = s.notes().get("INCHI");
        if (inchi != null && !inchi.isBlank()) {
            String text = inchi.strip().startsWith("InChI=") ? inchi.strip() : "InChI=" + inchi.strip();
            out.add(new Plan(SpeciesStructures.Source.NOTES, List.of(direct("inchi", text, "notes"))));
        }
        if (!s.inchis().isEmpty()) {
            out.add(new Plan(SpeciesStructures.Source.MIRIAM_INCHI, List.of(direct("inchi", s.inchis().get(0), "annotation"))));
        }
        LinkedHashSet<CrossReference> refs = new LinkedHashSet<>();
        for (String uri : s.references()) {
            CrossReference.fromUri(uri).ifPresent(refs::add);
        }
        if (!refs.isEmpty()) {
            for (StructureFile f : library.files()) {
                List<Offer> offers = new ArrayList<>();
                LinkedHashSet<String> seen = new LinkedHashSet<>();
                for (CrossReference x : refs) {
                    f.reference(x).filter(e -> seen.add(e.origin())).ifPresent(e -> offers.add(
                            new Offer(f, e, e.kind(), null, e.origin(), (int) Math.min(Integer.MAX_VALUE, e.line()), x.toString())));
                }
                if (!offers.isEmpty()) {
                    out.add(new Plan(SpeciesStructures.Source.CROSS_REFERENCE, offers));
                }
            }
        }
        if (stored != null && !stored.isBlank()) {
            out.add(new Plan(SpeciesStructures.Source.MODEL_ANNOTATION, List.of(direct("smiles", stored, "model annotation"))));
        }
        return out;
    }

    private static Offer offer(StructureFile f, StructureFile.Entry e) {
        return new Offer(f, e, e.kind(), null, e.origin(), (int) Math.min(Integer.MAX_VALUE, e.line()), "");
    }

    private static Offer direct(String kind, String text, String origin) {
        return new Offer(null, null, kind, text, origin, 0, "");
    }

    /** Parses a plan's offers and picks one; invalid texts become problems (for a choice: only when none is valid). */
    private static Optional<SpeciesStructures.Resolved> choose(String species, Plan plan, Formula declared, Rational charge,
                                                            Map<String, Object> parsed,
                                                            List<SpeciesStructures.Problem> problems) {
        SpeciesStructures.Resolved best = null;
        int bestRank = -1;
        SpeciesStructures.Problem firstProblem = null;
        for (Offer o : plan.offers()) {
            String text = o.file() == null ? o.text() : o.file().text(o.entry());
            Object result = parsed.computeIfAbsent(o.kind() + ":" + text, k -> parse(o.kind(), text));
            if (result instanceof StructureException e) {
                if (firstProblem == null) {
                    int line = o.kind().equals("molfile") && e.line() > 0 ? (int) (o.line() + e.line() - 1) : o.line();
                    String shown = o.kind().equals("molfile") ? o.origin() : text;
                    String where = o.kind().equals("molfile") ? o.origin() + (e.line() > 0 ? ", line " + line : "") + ": " : "";
                    firstProblem = new SpeciesStructures.Problem(species, "invalid", plan.source(), shown, where + e.getMessage(),
                            line, o.origin());
                }
                continue;
            }
            Structure structure = (Structure) result;
            int rank = plan.offers().size() == 1 ? 0 : rank(structure, declared, charge);
            if (rank > bestRank) {
                bestRank = rank;
                String origin = o.via().isEmpty() ? o.origin() : o.origin() + ", " + o.via();
                best = new SpeciesStructures.Resolved(species, structure, plan.source(),
                        o.kind().equals("molfile") ? origin : text, origin);
            }
        }
        if (best == null && firstProblem != null) {
            problems.add(firstProblem);
        }
        return Optional.ofNullable(best);
    }

    /** 2: formula and charge as declared; 1: only hydrogens (and charge) differ; 0: otherwise or unknown. */
    private static int rank(Structure s, Formula declared, Rational charge) {
        if (declared == null || declared.isPolymer()) {
            return 0;
        }
        if (s.formula().equals(declared) && (charge == null || charge.equals(Rational.of(s.charge())))) {
            return 2;
        }
        java.util.TreeSet<String> symbols = new java.util.TreeSet<>(declared.counts().keySet());
        symbols.addAll(s.formula().counts().keySet());
        symbols.remove("H");
        for (String e : symbols) {
            if (declared.count(e) != s.formula().count(e)) {
                return 0;
            }
        }
        return 1;
    }

    private static Object parse(String kind, String text) {
        try {
            return switch (kind) {
                case "inchi" -> Structure.fromInchi(text);
                case "molfile" -> Structure.fromMolfile(text);
                default -> Structure.fromSmiles(text);
            };
        } catch (StructureException e) {
            return e;
        } catch (RuntimeException e) {
            return new StructureException("the structure could not be read: " + e.getMessage(), e);
        }
    }

    private static Formula declaredFormula(SpeciesInfo s) {
        if (s.formulaText() == null || s.formulaText().isBlank()) {
            return null;
        }
        try {
            return FormulaParser.parse(s.formulaText());
        } catch (FormulaSyntaxException | RuntimeException e) {
            return null;
        }
    }

    private static Rational declaredCharge(SpeciesInfo s) {
        if (s.chargeText() == null || s.chargeText().isBlank()) {
            return null;
        }
        try {
            return Rational.parse(s.chargeText().strip());
        } catch (RuntimeException e) {
            return null;
        }
    }
}
