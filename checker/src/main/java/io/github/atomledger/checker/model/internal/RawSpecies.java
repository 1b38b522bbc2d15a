package io.github.atomledger.checker.model.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Attribute texts of one species start tag, exactly as written (null when absent), plus what its
 * notes and annotation carry for the checks.
 *
 * @param sboTerm the SBO term as {@code "SBO:0000247"}, or "" when unset or not of that form
 * @param notes   {@code KEY: value} lines of the notes (keys upper-cased, first occurrence wins)
 * @param inchis  InChI strings from {@code rdf:resource} URIs of the annotation, in document order
 * @param references URIs under the annotation's {@code bqbiol:is} / {@code bqmodel:is}, as written,
 *                in document order, without repeats
 */
public record RawSpecies(String id, String formula, String fbcCharge, String sbmlCharge, String sboTerm, int line,
                         Map<String, String> notes, List<String> inchis, List<String> references) {

    public RawSpecies {
        notes = Map.copyOf(notes);
        inchis = List.copyOf(inchis);
        references = List.copyOf(references);
    }

    /** Filled while the species element streams past; confined to one reader. */
    static final class Builder {
        private final String id;
        private final String formula;
        private final String fbcCharge;
        private final String sbmlCharge;
        private final String sboTerm;
        private final int line;
        final Map<String, String> notes = new TreeMap<>();
        final List<String> inchis = new ArrayList<>();
        final List<String> references = new ArrayList<>();

        Builder(String id, String formula, String fbcCharge, String sbmlCharge, String sboTerm, int line) {
            this.id = id;
            this.formula = formula;
            this.fbcCharge = fbcCharge;
            this.sbmlCharge = sbmlCharge;
            this.sboTerm = sboTerm;
            this.line = line;
        }

        RawSpecies build() {
            return new RawSpecies(id, formula, fbcCharge, sbmlCharge, sboTerm, line, notes, inchis, references);
        }
    }
}
