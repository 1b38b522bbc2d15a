package io.github.atomledger.checker.model;

import java.util.List;
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
 */
public record SpeciesInfo(String id, String name, String compartment, boolean boundary, String sboTerm,
                          String formulaText, FormulaSource formulaSource,
                          String chargeText, FormulaSource chargeSource,
                          List<String> inchis, int line) {

    public SpeciesInfo {
        Objects.requireNonNull(id, "id");
        name = name == null || name.isBlank() ? id : name;
        compartment = compartment == null ? "" : compartment;
        sboTerm = sboTerm == null ? "" : sboTerm;
        Objects.requireNonNull(formulaSource, "formulaSource");
        Objects.requireNonNull(chargeSource, "chargeSource");
        inchis = List.copyOf(inchis);
    }
}
