package io.github.atomledger.checker.model.internal;

/** Attribute texts of one species start tag, exactly as written; null when absent. */
public record RawSpecies(String id, String formula, String fbcCharge, String sbmlCharge, int line) {
}
