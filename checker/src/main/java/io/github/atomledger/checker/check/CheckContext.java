package io.github.atomledger.checker.check;

import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.model.ModelView;

import java.util.Map;
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
    private final MappingData mapping;
    private final boolean mapsPending;
    private final java.util.concurrent.ConcurrentHashMap<Class<?>, Object> shared = new java.util.concurrent.ConcurrentHashMap<>();

    public CheckContext(ModelView model, Map<String, SpeciesChemistry> chemistry,
                        Map<String, ReactionBalance> balances) {
        this(model, chemistry, balances, MappingData.NONE);
    }

    public CheckContext(ModelView model, Map<String, SpeciesChemistry> chemistry,
                        Map<String, ReactionBalance> balances, MappingData mapping) {
        this(model, chemistry, balances, mapping, false);
    }

    private CheckContext(ModelView model, Map<String, SpeciesChemistry> chemistry,
                         Map<String, ReactionBalance> balances, MappingData mapping, boolean mapsPending) {
        this.model = Objects.requireNonNull(model, "model");
        this.chemistry = Map.copyOf(chemistry);
        this.balances = Map.copyOf(balances);
        this.mapping = Objects.requireNonNull(mapping, "mapping");
        this.mapsPending = mapsPending;
    }

    /**
     * A context for the checks that run while the atom maps are still being computed (the engine
     * runs every check outside the {@code mapping} and {@code structure} areas then): reading
     * {@link #mapping()} from it is a bug and throws.
     */
    public static CheckContext whileMapping(ModelView model, Map<String, SpeciesChemistry> chemistry,
                                            Map<String, ReactionBalance> balances) {
        return new CheckContext(model, chemistry, balances, MappingData.NONE, true);
    }

    /**
     * Atom maps and structures; {@link MappingData#NONE} when mapping is off.
     *
     * @throws IllegalStateException in a context made by {@link #whileMapping}
     */
    public MappingData mapping() {
        if (mapsPending) {
            throw new IllegalStateException("atom maps were read by a check outside the mapping and structure areas, "
                    + "which runs while they are computed");
        }
        return mapping;
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

    /**
     * A value computed once per context and shared by the checks that report on it (for example
     * one expensive analysis behind two rules); {@code compute} runs on first use only. The value
     * must be immutable. Thread-safe.
     */
    public <T> T shared(Class<T> type, java.util.function.Supplier<T> compute) {
        Object value = shared.get(type);
        if (value == null) {
            value = compute.get();
            Object earlier = shared.putIfAbsent(type, value);
            value = earlier != null ? earlier : value;
        }
        return type.cast(value);
    }

    /** A finding about this model with the check's rule id and default severity. */
    public Finding finding(ModelCheck check, String elementId, int line, String message, Map<String, String> data) {
        return new Finding(check.ruleId(), check.defaultSeverity(), model.file(), elementId, line, message,
                new java.util.TreeMap<>(data));
    }
}
