package io.github.atomledger.checker.check.structure;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Chooses each species' structure from its sources, in this order of precedence:
 * <ol>
 *   <li>the side table ({@code atomledger.structures}),</li>
 *   <li>an InChI in the species' MIRIAM annotation (identifiers.org {@code inchi} URIs),</li>
 *   <li>the SMILES that AtomLedger itself wrote into the model's reaction annotations.</li>
 * </ol>
 * When two sources give different structures (different fingerprints), the first wins and a
 * "conflict" problem is recorded. Stateless and thread-safe.
 */
public final class StructureResolver {

    /**
     * @param model  the model
     * @param table  the side table (may be empty)
     * @param stored species to SMILES found in AtomLedger annotations of the model
     */
    public SpeciesStructures resolve(ModelView model, StructureTable table, Map<String, String> stored) {
        Map<String, SpeciesStructures.Resolved> chosen = new LinkedHashMap<>();
        List<SpeciesStructures.Problem> problems = new ArrayList<>();
        Map<String, Structure> parsed = new HashMap<>();
        for (StructureTable.Entry e : table.entries().values()) {
            if (model.species(e.species()).isEmpty()) {
                problems.add(new SpeciesStructures.Problem(e.species(), "unknown-species", SpeciesStructures.Source.TABLE,
                        e.text(), "the structure table names species " + e.species() + ", which " + model.file()
                        + " does not define", e.line()));
            }
        }
        for (SpeciesInfo s : model.species()) {
            List<SpeciesStructures.Resolved> candidates = new ArrayList<>();
            StructureTable.Entry row = table.entries().get(s.id());
            if (row != null) {
                add(candidates, problems, s.id(), SpeciesStructures.Source.TABLE, row.kind(), row.text(), row.line(), parsed);
            }
            for (String inchi : s.inchis()) {
                add(candidates, problems, s.id(), SpeciesStructures.Source.MIRIAM_INCHI, "inchi", inchi, 0, parsed);
                break;
            }
            String smiles = stored.get(s.id());
            if (smiles != null && !smiles.isBlank()) {
                add(candidates, problems, s.id(), SpeciesStructures.Source.MODEL_ANNOTATION, "smiles", smiles, 0, parsed);
            }
            if (candidates.isEmpty()) {
                continue;
            }
            SpeciesStructures.Resolved first = candidates.get(0);
            chosen.put(s.id(), first);
            for (SpeciesStructures.Resolved other : candidates.subList(1, candidates.size())) {
                if (!other.structure().fingerprint().equals(first.structure().fingerprint())) {
                    problems.add(new SpeciesStructures.Problem(s.id(), "conflict", other.source(), other.text(),
                            "the " + other.source().label() + " structure of " + s.id() + " differs from the "
                                    + first.source().label() + " structure, which is used", row == null ? 0 : row.line()));
                }
            }
        }
        return new SpeciesStructures(chosen, problems, table.file());
    }

    private static void add(List<SpeciesStructures.Resolved> out, List<SpeciesStructures.Problem> problems, String species,
                            SpeciesStructures.Source source, String kind, String text, int line, Map<String, Structure> cache) {
        String key = kind + ":" + text;
        try {
            Structure s = cache.get(key);
            if (s == null) {
                s = kind.equals("inchi") ? Structure.fromInchi(text) : Structure.fromSmiles(text);
                cache.put(key, s);
            }
            out.add(new SpeciesStructures.Resolved(species, s, source, text));
        } catch (StructureException e) {
            problems.add(new SpeciesStructures.Problem(species, "invalid", source, text, e.getMessage(), line));
        } catch (RuntimeException e) {
            problems.add(new SpeciesStructures.Problem(species, "invalid", source, text,
                    "the structure could not be read: " + e.getMessage(), line));
        }
    }
}
