package io.github.atomledger.checker.model;

import java.util.Objects;

/**
 * One species reference of a reaction, with its stoichiometry as written.
 *
 * @param species           the referenced species id (it may not exist in the model)
 * @param stoichiometryText the {@code stoichiometry} attribute text, or null when it is unset
 *                          (Level 3 leaves it undefined; Level 2 defaults to 1, which the loader
 *                          fills in as "1")
 * @param line              1-based line of the speciesReference tag, 0 when unknown
 */
public record Participant(String species, String stoichiometryText, int line) {

    public Participant {
        Objects.requireNonNull(species, "species");
    }
}
