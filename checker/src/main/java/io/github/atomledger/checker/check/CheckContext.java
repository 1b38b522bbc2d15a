package io.github.atomledger.checker.check;

import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.model.ModelView;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import io.github.atomledger.checker.model.StructureTable;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything a check may read about one model: the model view and the results computed once
 * for all checks (parsed formulas and charges, reaction balances). Immutable.
 */
public final class CheckContext {

    private final ModelView model;
    private final Map<String, SpeciesChemistry> chemistry;
    private final Map<String, ReactionBalance> balances;
    private final Map<String, StructureTable.Entry> structures;
    /** Parsed structures, filled on first use (a memo: parsing is pure, so the context stays immutable in effect). */
    private final Map<String, Object> parsed = new ConcurrentHashMap<>();

    public CheckContext(ModelView model, Map<String, SpeciesChemistry> chemistry,
                        Map<String, ReactionBalance> balances) {
        this(model, chemistry, balances, Map.of());
    }

    /**
     * @param structures the structure side table, species id to entry (empty when none is given)
     */
    public CheckContext(ModelView model, Map<String, SpeciesChemistry> chemistry,
                        Map<String, ReactionBalance> balances, Map<String, StructureTable.Entry> structures) {
        this.model = Objects.requireNonNull(model, "model");
        this.chemistry = Map.copyOf(chemistry);
        this.balances = Map.copyOf(balances);
        this.structures = Map.copyOf(structures);
    }

    /** The structure table entries by species id; empty when no table was given. */
    public Map<String, StructureTable.Entry> structures() {
        return structures;
    }

    /**
     * The parsed structure of a species with a table entry, parsed once per model and shared by
     * the checks.
     *
     * @throws StructureException when the entry's text cannot be read (every call, the same error)
     * @throws IllegalArgumentException when the species has no entry
     */
    public Structure structure(String speciesId) throws StructureException {
        StructureTable.Entry entry = structures.get(speciesId);
        if (entry == null) {
            throw new IllegalArgumentException("species '" + speciesId + "' has no structure");
        }
        Object value = parsed.computeIfAbsent(speciesId, id -> {
            try {
                return entry.parse();
            } catch (StructureException e) {
                return e;
            }
        });
        if (value instanceof StructureException e) {
            throw e;
        }
        return (Structure) value;
    }

    public ModelView model() {
        return model;
    }

    /** Parsed chemistry of a species; empty when the id is not a species of the model. */
    public Optional<SpeciesChemistry> chemistry(String speciesId) {
        return Optional.ofNullable(chemistry.get(speciesId));
    }

    /** Parsed chemistry of every species, by id; unmodifiable. */
    public Map<String, SpeciesChemistry> chemistryById() {
        return chemistry;
    }

    /** The balance of a reaction; present for every reaction of the model. */
    public ReactionBalance balance(String reactionId) {
        ReactionBalance b = balances.get(reactionId);
        if (b == null) {
            throw new IllegalArgumentException("no reaction '" + reactionId + "' in " + model.file());
        }
        return b;
    }

    /** A finding about this model with the check's rule id and default severity. */
    public Finding finding(ModelCheck check, String elementId, int line, String message, Map<String, String> data) {
        return new Finding(check.ruleId(), check.defaultSeverity(), model.file(), elementId, line, message,
                new java.util.TreeMap<>(data));
    }
}
