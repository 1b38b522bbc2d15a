package io.github.atomledger.checker.transitions;

import java.util.Objects;

/**
 * A structure recorded in an annotation: the species, the structure's fingerprint when the map
 * was written, and its SMILES (so that the model itself can serve as a structure source).
 */
public record StoredStructure(String species, String fingerprint, String smiles) {

    public StoredStructure {
        Objects.requireNonNull(species, "species");
        fingerprint = fingerprint == null ? "" : fingerprint;
        smiles = smiles == null ? "" : smiles;
    }
}
