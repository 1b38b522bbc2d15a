package io.github.atomledger.atommapper.mapping;

import io.github.atomledger.atommapper.structure.Structure;
import java.util.Objects;

/**
 * One side entry of a reaction: a species id, its structure and its integer coefficient. A
 * coefficient of n stands for n copies of the molecule, numbered 1..n in {@link AtomRef#copy()}.
 *
 * @param species the species id (non-null, as used in the model)
 * @param structure its parsed structure (non-null)
 * @param coefficient the number of copies, at least 1 (a fractional coefficient cannot be
 *     mapped; use {@link MappingResult#unmappable(String, String)} for it)
 */
public record Participant(String species, Structure structure, int coefficient) {

    /** Validates the fields: non-null species and structure, coefficient at least 1. */
    public Participant {
        Objects.requireNonNull(species, "species");
        Objects.requireNonNull(structure, "structure");
        if (coefficient < 1) {
            throw new IllegalArgumentException("coefficient of " + species + " must be at least 1, got "
                    + coefficient);
        }
    }
}
