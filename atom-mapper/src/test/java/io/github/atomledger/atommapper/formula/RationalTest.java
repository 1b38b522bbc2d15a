package io.github.atomledger.atommapper.formula;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/** Exact decimal parsing of stoichiometry and charge texts as written in SBML files. */
class RationalTest {

    @ParameterizedTest
    @CsvSource({"1e-06,1/1000000", "-1e-06,-1/1000000", "0.633,633/1000", "-4.5,-9/2", "1.266,633/500",
            "2,2", "+3,3", ".5,1/2", "5.,5", "1E3,1000", "0.000,0", "-0,0", "3/6,1/2", "  7 ,7",
            "123456789012345678,123456789012345678", "1234567890123456789,1234567890123456789",
            "9.99999999999999999e18,9999999999999999990", "92233720368547758.07e2,9223372036854775807",
            "92233720368547758.08e2,9223372036854775808", "1e-18,1/1000000000000000000",
            "1e-19,1/10000000000000000000", "-2.50e+2,-250", "1e+006,1000000"})
    void parsesDecimalTextExactly(String text, String canonical) {
        assertThat(Rational.parse(text).toString()).isEqualTo(canonical);
    }

    @ParameterizedTest
    @ValueSource(strings = {"NaN", "INF", "-INF", "inf", "Infinity", "", "1,5", "0x10", "e5", "1e", "one", ".", "+", "-.",
            "1e1000", "1e+", "1.2.3", "1e5.5", "--1", "1-", "\u0661", "1 2"})
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

    /** The reference: BigDecimal's exact value, reduced with BigInteger's gcd (the arithmetic before the fast paths). */
    private static String reference(BigInteger n, BigInteger d) {
        if (d.signum() < 0) {
            n = n.negate();
            d = d.negate();
        }
        BigInteger g = n.gcd(d);
        if (g.signum() != 0 && !g.equals(BigInteger.ONE)) {
            n = n.divide(g);
            d = d.divide(g);
        }
        return d.equals(BigInteger.ONE) || n.signum() == 0 ? n.toString() : n + "/" + d;
    }

    private static String reference(BigDecimal v) {
        return v.scale() <= 0 ? reference(v.unscaledValue().multiply(BigInteger.TEN.pow(-v.scale())), BigInteger.ONE)
                : reference(v.unscaledValue(), BigInteger.TEN.pow(v.scale()));
    }

    @Test
    void parsingAndArithmeticAgreeWithBigIntegerOnRandomValues() {
        // Issue 8: long fast paths must give exactly what BigInteger arithmetic gives, on both sides of 2^63.
        Random random = new Random(8);
        for (int i = 0; i < 20_000; i++) {
            StringBuilder digits = new StringBuilder();
            for (int k = random.nextInt(22); k >= 0; k--) {
                digits.append((char) ('0' + random.nextInt(10)));
            }
            int point = random.nextInt(digits.length() + 1);
            String text = (random.nextBoolean() ? "-" : "") + digits.substring(0, point) + "." + digits.substring(point)
                    + (random.nextInt(3) == 0 ? "e" + (random.nextInt(61) - 30) : "");
            Rational r = Rational.parse(text);
            assertThat(r.toString()).as(text).isEqualTo(reference(new BigDecimal(text)));
            long a = random.nextLong() >> random.nextInt(64);
            long b = random.nextLong() >> random.nextInt(64);
            long c = (random.nextLong() >> random.nextInt(64)) | 1;
            Rational x = Rational.of(a, c);
            Rational y = Rational.of(BigInteger.valueOf(b), BigInteger.ONE);
            BigInteger bc = BigInteger.valueOf(c);
            assertThat(x.toString()).isEqualTo(reference(BigInteger.valueOf(a), bc));
            assertThat(x.add(y).toString()).isEqualTo(reference(BigInteger.valueOf(a).add(BigInteger.valueOf(b).multiply(bc)), bc));
            assertThat(x.multiply(y).toString()).isEqualTo(reference(BigInteger.valueOf(a).multiply(BigInteger.valueOf(b)), bc));
            assertThat(y.multiply(b).toString()).isEqualTo(BigInteger.valueOf(b).multiply(BigInteger.valueOf(b)).toString());
            assertThat(r.add(x).subtract(x)).isEqualTo(r);
        }
    }

    @Test
    void tinyExponentsStayExact() {
        assertThat(Rational.parse("0.1e-999").toString()).isEqualTo("1/1" + "0".repeat(1000));
    }

    @Test
    void extremeLongsStayExact() {
        assertThat(Rational.of(Long.MIN_VALUE, -1).toString()).isEqualTo("9223372036854775808");
        assertThat(Rational.of(Long.MIN_VALUE, Long.MIN_VALUE)).isEqualTo(Rational.ONE);
        assertThat(Rational.of(Long.MAX_VALUE, -2).toString()).isEqualTo("-9223372036854775807/2");
        assertThat(Rational.of(Long.MAX_VALUE).add(Rational.ONE).toString()).isEqualTo("9223372036854775808");
    }

    @Test
    void decimalTextAgreesWithBigDecimalDivision() {
        // Issue 8: the division-free rendering must print what BigDecimal's exact division prints.
        Random random = new Random(5);
        for (int i = 0; i < 5_000; i++) {
            BigInteger n = BigInteger.valueOf(random.nextLong() >> random.nextInt(64));
            BigInteger d = BigInteger.TWO.pow(random.nextInt(70)).multiply(BigInteger.valueOf(5).pow(random.nextInt(40)))
                    .multiply(random.nextInt(4) == 0 ? BigInteger.valueOf(3 + 2 * random.nextInt(100)) : BigInteger.ONE);
            Rational r = Rational.of(n, d);
            BigDecimal exact;
            try {
                exact = new BigDecimal(r.numerator()).divide(new BigDecimal(r.denominator()));
            } catch (ArithmeticException nonTerminating) {
                assertThat(r.isTerminatingDecimal()).as(r.toString()).isFalse();
                continue;
            }
            assertThat(r.isTerminatingDecimal()).as(r.toString()).isTrue();
            assertThat(r.toDecimalString()).as(r.toString()).isEqualTo(exact.stripTrailingZeros().toPlainString());
        }
        assertThat(Rational.parse("-1/3").isTerminatingDecimal()).isFalse();
        assertThat(Rational.parse("-1/3").toDecimalString()).isEqualTo("-0.333333");
    }
}
