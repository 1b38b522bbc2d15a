package io.github.atomledger.checker.model;

import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * What the checks need to know about one species, read-only.
 *
 * @param id            the SBML id
 * @param name          the name, or the id when the species has none
 * @param compartment   the compartment id ("" when unset)
 * @param boundary      the {@code boundaryCondition} flag
 * @param sboTerm       the SBO term as {@code "SBO:0000247"}, or "" when unset
 * @param formulaText   the formula text exactly as written, or null when none is given
 * @param formulaSource where {@code formulaText} came from
 * @param chargeText    the charge text exactly as written, or null when none is given
 * @param chargeSource  where {@code chargeText} came from
 * @param inchis        InChI strings from the species' MIRIAM annotation, in document order
 * @param line          1-based line of the species start tag, 0 when unknown
 * @param notes         the {@code KEY: value} lines of the species' notes (keys upper-cased, first
 *                      occurrence wins), for example {@code SMILES}, {@code INCHI}, {@code FORMULA}
 * @param references    the URIs of the species' MIRIAM annotation under {@code bqbiol:is} or
 *                      {@code bqmodel:is}, exactly as written, in document order without repeats
 *                      (identifiers.org cross-references such as
 *                      {@code https://identifiers.org/chebi/CHEBI:15361})
 */
public record SpeciesInfo(String id, String name, String compartment, boolean boundary, String sboTerm,
                          String formulaText, FormulaSource formulaSource,
                          String chargeText, FormulaSource chargeSource,
                          List<String> inchis, int line, Map<String, String> notes, List<String> references) {

    /** A species without notes or cross-references. */
    public SpeciesInfo(String id, String name, String compartment, boolean boundary, String sboTerm,
                       String formulaText, FormulaSource formulaSource, String chargeText, FormulaSource chargeSource,
                       List<String> inchis, int line) {
        this(id, name, compartment, boundary, sboTerm, formulaText, formulaSource, chargeText, chargeSource, inchis,
                line, Map.of(), List.of());
    }

    public SpeciesInfo {
        Objects.requireNonNull(id, "id");
        name = name == null || name.isBlank() ? id : name;
        compartment = compartment == null ? "" : compartment;
        sboTerm = sboTerm == null ? "" : sboTerm;
        Objects.requireNonNull(formulaSource, "formulaSource");
        Objects.requireNonNull(chargeSource, "chargeSource");
        inchis = List.copyOf(inchis);
        notes = Map.copyOf(notes);
        references = List.copyOf(references);
    }
}
