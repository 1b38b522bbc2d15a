package io.github.atomledger.checker.check.balance;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.FormulaParser;
import io.github.atomledger.atommapper.formula.FormulaSyntaxException;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.model.FormulaSource;
import io.github.atomledger.checker.model.SpeciesInfo;

/**
 * A species' parsed formula and charge, or why they are unusable.
 *
 * @param species       the species
 * @param formula       the parsed formula, or null when absent or invalid
 * @param formulaError  the parse error when the text is not a valid formula, else null
 * @param charge        the exact charge, or null when absent or invalid
 * @param chargeError   why the charge text is unusable, else null
 */
public record SpeciesChemistry(SpeciesInfo species, Formula formula, FormulaSyntaxException formulaError,
                               Rational charge, String chargeError) {

    /**
     * Parses the species' formula and charge texts.
     *
     * @param fbcVersion the document's fbc version; below 3 a charge must be an integer (fbc
     *                   version 2 specification, "a signed integer"); version 3 allows decimals
     */
    public static SpeciesChemistry of(SpeciesInfo s, int fbcVersion) {
        Formula formula = null;
        FormulaSyntaxException formulaError = null;
        if (s.formulaText() != null) {
            try {
                formula = FormulaParser.parse(s.formulaText());
            } catch (FormulaSyntaxException e) {
                formulaError = e;
            }
        }
        Rational charge = null;
        String chargeError = null;
        if (s.chargeText() != null) {
            try {
                charge = Rational.parse(s.chargeText());
                boolean integerOnly = s.chargeSource() == FormulaSource.FBC ? fbcVersion < 3
                        : s.chargeSource() == FormulaSource.SBML_CHARGE_ATTRIBUTE;
                if (integerOnly && !charge.isInteger()) {
                    chargeError = "charge '" + s.chargeText() + "' is not an integer, which fbc version "
                            + Math.max(fbcVersion, 1) + " requires";
                    charge = null;
                }
            } catch (NumberFormatException | ArithmeticException e) {
                chargeError = "charge '" + s.chargeText() + "' is not a number";
            }
        }
        return new SpeciesChemistry(s, formula, formulaError, charge, chargeError);
    }
}
