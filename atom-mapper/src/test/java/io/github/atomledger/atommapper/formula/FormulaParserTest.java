package io.github.atomledger.atommapper.formula;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;
import org.openscience.cdk.interfaces.IIsotope;
import org.openscience.cdk.interfaces.IMolecularFormula;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.tools.manipulator.MolecularFormulaManipulator;

/**
 * The fbc formula grammar (SBML fbc version 2 and 3 specifications: symbols of one capital and
 * lowercase letters with integer counts; version 3 adds {@code (...)n}). Element counts of
 * ordinary formulas are compared with CDK's MolecularFormulaManipulator, a general-purpose
 * reference library; forms CDK cannot parse (R, X, {@code (...)n}) are pinned by hand.
 */
class FormulaParserTest {

    /** Formulas from ChEBI and textbooks (from memory), all plain element formulas CDK reads. */
    @ParameterizedTest
    @ValueSource(strings = {"C6H12O6", "H2O", "C10H12N5O13P3", "C21H32N7O16P3S", "C21H26N7O14P2", "H2O4S",
            "C2H5Br", "BrH", "CH3I", "C3H3O3", "Fe", "C55H72MgN4O5", "C63H88CoN14O14P", "NaCl", "CH3COOH", "HO"})
    void agreesWithCdkOnElementCounts(String text) throws Exception {
        IMolecularFormula cdk = MolecularFormulaManipulator.getMolecularFormula(text, SilentChemObjectBuilder.getInstance());
        Map<String, Long> expected = new TreeMap<>();
        for (IIsotope isotope : cdk.isotopes()) {
            expected.merge(isotope.getSymbol(), (long) cdk.getIsotopeCount(isotope), Long::sum);
        }
        assertThat(FormulaParser.parse(text).counts()).isEqualTo(expected);
    }

    @Test
    void sumsRepeatedSymbolsLikeCh3Cooh() throws Exception {
        assertThat(FormulaParser.parse("CH3COOH")).isEqualTo(FormulaParser.parse("C2H4O2"));
    }

    @Test
    void keepsGenericSymbolsApartAsPseudoElements() throws Exception {
        // CDK turns X into R (LIBRARIES.md section 6); we keep them distinct.
        Formula f = FormulaParser.parse("C10H17O10PR2X");
        assertThat(f.count("R")).isEqualTo(2);
        assertThat(f.count("X")).isEqualTo(1);
        assertThat(f.pseudoElements()).containsExactly("R", "X");
        assertThat(FormulaParser.parse("C6H11O6X")).isNotEqualTo(FormulaParser.parse("C6H11O6R"));
    }

    @Test
    void acceptsUserDefinedCompoundsOfFbcVersion2() throws Exception {
        assertThat(FormulaParser.parse("Protein").pseudoElements()).containsExactly("Protein");
    }

    @Test
    void parsesTheFbcVersion3PolymerForm() throws Exception {
        // fbc version 3 example "C2H4O2(CH2)n".
        Formula f = FormulaParser.parse("C2H4O2(CH2)n");
        assertThat(f.isPolymer()).isTrue();
        assertThat(f.counts()).containsExactlyEntriesOf(new TreeMap<>(Map.of("C", 2L, "H", 4L, "O", 2L)));
        assertThat(f.repeatUnit()).containsExactlyEntriesOf(new TreeMap<>(Map.of("C", 1L, "H", 2L)));
        assertThat(f.toHillString()).isEqualTo("C2H4O2(CH2)n");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
            "''|1|the formula is empty",
            "c6h6|1|unexpected 'c' (a symbol starts with a capital letter)",
            "[C2H3O2]-|1|unexpected '['",
            "C6H12O6.H2O|8|unexpected '.'",
            "(CH2)2|6|a parenthesised group must be followed by 'n' (fbc version 3 allows no other multiplier)",
            "C2((CH2)n)n|4|nested groups are not allowed",
            "C2(CH2|3|unclosed '('",
            "C2)|3|')' without '('",
            "C99999999999999|2|count 99999999999999 is too large",
            "C2 H4|3|unexpected white space"})
    void rejectsTextOutsideTheGrammarNamingThePosition(String text, int position, String reason) {
        assertThatThrownBy(() -> FormulaParser.parse(text))
                .isInstanceOfSatisfying(FormulaSyntaxException.class, e -> {
                    assertThat(e.position() + 1).isEqualTo(position);
                    assertThat(e.reason()).isEqualTo(reason);
                    assertThat(e.text()).isEqualTo(text);
                });
    }

    @Test
    void ignoresSurroundingWhiteSpace() throws Exception {
        assertThat(FormulaParser.parse("  H2O ")).isEqualTo(FormulaParser.parse("H2O"));
    }

    @Test
    void writesHillOrderWithAndWithoutCarbon() throws Exception {
        // Hill order: C, H, then alphabetical; without C all alphabetical (fbc v2 specification).
        assertThat(FormulaParser.parse("O4SH2").toHillString()).isEqualTo("H2O4S");
        assertThat(FormulaParser.parse("NOPC3H").toHillString()).isEqualTo("C3HNOP");
    }
}
