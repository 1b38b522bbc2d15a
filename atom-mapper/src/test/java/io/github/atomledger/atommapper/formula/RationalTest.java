package io.github.atomledger.atommapper.formula;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/** Exact decimal parsing of stoichiometry and charge texts as written in SBML files. */
class RationalTest {

    @ParameterizedTest
    @CsvSource({"1e-06,1/1000000", "-1e-06,-1/1000000", "0.633,633/1000", "-4.5,-9/2", "1.266,633/500",
            "2,2", "+3,3", ".5,1/2", "5.,5", "1E3,1000", "0.000,0", "-0,0", "3/6,1/2", "  7 ,7"})
    void parsesDecimalTextExactly(String text, String canonical) {
        assertThat(Rational.parse(text).toString()).isEqualTo(canonical);
    }

    @ParameterizedTest
    @ValueSource(strings = {"NaN", "INF", "-INF", "inf", "Infinity", "", "1,5", "0x10", "e5", "1e", "one"})
    void rejectsNonFiniteOrNonDecimalText(String text) {
        assertThatThrownBy(() -> Rational.parse(text)).isInstanceOf(NumberFormatException.class);
    }

    @Test
    void rejectsHugeExponentsInsteadOfComputingThem() {
        assertThatThrownBy(() -> Rational.parse("1e999999")).isInstanceOf(NumberFormatException.class);
    }

    @Test
    void sumOfFractionalProtonChargesIsExact() {
        // 0.633 * 2 = 1.266 exactly, as in yeast-GEM r_0439 (a double sum would not be exact).
        assertThat(Rational.parse("0.633").multiply(2)).isEqualTo(Rational.parse("1.266"));
        assertThat(Rational.parse("0.1").add(Rational.parse("0.2"))).isEqualTo(Rational.parse("0.3"));
    }

    @Test
    void printsTerminatingDecimalsForPeople() {
        assertThat(Rational.parse("-0.633").toDecimalString()).isEqualTo("-0.633");
        assertThat(Rational.of(1, 3).toDecimalString()).isEqualTo("0.333333");
    }

    @Test
    void ordersByValue() {
        assertThat(Rational.parse("0.5")).isLessThan(Rational.parse("2/3"));
        assertThat(Rational.parse("-1").compareTo(Rational.ZERO)).isNegative();
    }
}
