package io.github.atomledger.checker.model;

/** Where a species' formula or charge was read from. */
public enum FormulaSource {
    /** The fbc package attributes {@code fbc:chemicalFormula} / {@code fbc:charge}. */
    FBC("fbc"),
    /** A {@code FORMULA:} or {@code CHARGE:} line in the species notes (common in Level 2 models). */
    NOTES("notes"),
    /** The Level 2 Version 1 {@code charge} attribute of the species. */
    SBML_CHARGE_ATTRIBUTE("sbml-charge"),
    /** Not given anywhere. */
    NONE("none");

    private final String label;

    FormulaSource(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
