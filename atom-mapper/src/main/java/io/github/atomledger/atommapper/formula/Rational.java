package io.github.atomledger.atommapper.formula;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Objects;

/**
 * An exact rational number, always in lowest terms with a positive denominator.
 *
 * <p>Stoichiometric coefficients and charges are parsed from their decimal text
 * ({@code "0.633"}, {@code "1e-06"}, {@code "-4.5"}) without passing through {@code double}, so
 * a balance verdict never depends on rounding. {@link #toString()} is canonical: {@code "-1"},
 * {@code "3/2"}, {@code "0"}; two equal values always print the same text.
 *
 * <p>Instances are immutable and thread-safe.
 */
public final class Rational implements Comparable<Rational> {

    public static final Rational ZERO = new Rational(BigInteger.ZERO, BigInteger.ONE);
    public static final Rational ONE = new Rational(BigInteger.ONE, BigInteger.ONE);

    private final BigInteger numerator;
    private final BigInteger denominator;

    private Rational(BigInteger numerator, BigInteger denominator) {
        this.numerator = numerator;
        this.denominator = denominator;
    }

    /** Returns {@code numerator / denominator} in lowest terms; the denominator must not be zero. */
    public static Rational of(BigInteger numerator, BigInteger denominator) {
        Objects.requireNonNull(numerator, "numerator");
        Objects.requireNonNull(denominator, "denominator");
        if (denominator.signum() == 0) {
            throw new ArithmeticException("denominator is zero");
        }
        if (denominator.signum() < 0) {
            numerator = numerator.negate();
            denominator = denominator.negate();
        }
        BigInteger gcd = numerator.gcd(denominator);
        if (!gcd.equals(BigInteger.ONE) && gcd.signum() != 0) {
            numerator = numerator.divide(gcd);
            denominator = denominator.divide(gcd);
        }
        if (numerator.signum() == 0) {
            return ZERO;
        }
        return new Rational(numerator, denominator);
    }

    public static Rational of(long numerator, long denominator) {
        return of(BigInteger.valueOf(numerator), BigInteger.valueOf(denominator));
    }

    public static Rational of(long value) {
        return of(BigInteger.valueOf(value), BigInteger.ONE);
    }

    /**
     * Parses decimal text exactly: an optional sign, digits with an optional fraction, an
     * optional exponent ({@code 1e-06}), or a fraction {@code p/q} as printed by {@link #toString()}.
     *
     * <p>Exponents have at most three digits, so that a hostile text such as {@code 1e999999}
     * cannot make the parser build a number with a million digits.
     *
     * @throws NumberFormatException for anything else, including {@code NaN} and {@code INF}
     */
    public static Rational parse(String text) {
        Objects.requireNonNull(text, "text");
        String s = text.strip();
        int slash = s.indexOf('/');
        if (slash > 0) {
            BigInteger d = new BigInteger(s.substring(slash + 1));
            if (d.signum() == 0) {
                throw new NumberFormatException("zero denominator: '" + text + "'");
            }
            return of(new BigInteger(s.substring(0, slash)), d);
        }
        if (s.isEmpty() || !s.matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d{1,3})?")) {
            throw new NumberFormatException("not a finite decimal number: '" + text + "'");
        }
        return of(new BigDecimal(s));
    }

    /** Converts a {@link BigDecimal} exactly (no rounding). */
    public static Rational of(BigDecimal value) {
        BigInteger unscaled = value.unscaledValue();
        int scale = value.scale();
        if (scale <= 0) {
            return of(unscaled.multiply(BigInteger.TEN.pow(-scale)), BigInteger.ONE);
        }
        return of(unscaled, BigInteger.TEN.pow(scale));
    }

    public BigInteger numerator() {
        return numerator;
    }

    public BigInteger denominator() {
        return denominator;
    }

    public boolean isZero() {
        return numerator.signum() == 0;
    }

    public boolean isInteger() {
        return denominator.equals(BigInteger.ONE);
    }

    public int signum() {
        return numerator.signum();
    }

    public Rational add(Rational other) {
        if (other.isZero()) {
            return this;
        }
        if (isZero()) {
            return other;
        }
        return of(numerator.multiply(other.denominator).add(other.numerator.multiply(denominator)),
                denominator.multiply(other.denominator));
    }

    public Rational subtract(Rational other) {
        return add(other.negate());
    }

    public Rational multiply(Rational other) {
        return of(numerator.multiply(other.numerator), denominator.multiply(other.denominator));
    }

    public Rational multiply(long factor) {
        return of(numerator.multiply(BigInteger.valueOf(factor)), denominator);
    }

    public Rational divide(Rational other) {
        return of(numerator.multiply(other.denominator), denominator.multiply(other.numerator));
    }

    public Rational negate() {
        return isZero() ? this : new Rational(numerator.negate(), denominator);
    }

    public Rational abs() {
        return signum() < 0 ? negate() : this;
    }

    /** A decimal rendering for people; exact when the denominator allows, otherwise 6 places. */
    public String toDecimalString() {
        if (isInteger()) {
            return numerator.toString();
        }
        BigDecimal n = new BigDecimal(numerator);
        try {
            return n.divide(new BigDecimal(denominator)).stripTrailingZeros().toPlainString();
        } catch (ArithmeticException nonTerminating) {
            return n.divide(new BigDecimal(denominator), 6, java.math.RoundingMode.HALF_EVEN)
                    .stripTrailingZeros().toPlainString();
        }
    }

    @Override
    public int compareTo(Rational other) {
        return numerator.multiply(other.denominator).compareTo(other.numerator.multiply(denominator));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Rational r && numerator.equals(r.numerator) && denominator.equals(r.denominator);
    }

    @Override
    public int hashCode() {
        return 31 * numerator.hashCode() + denominator.hashCode();
    }

    /** Canonical exact text: {@code "-1"}, {@code "3/2"}, {@code "0"}. */
    @Override
    public String toString() {
        return isInteger() ? numerator.toString() : numerator + "/" + denominator;
    }
}
