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

    private static final long[] LONG_TEN_POWERS = tenPowers();
    private static final BigInteger FIVE = BigInteger.valueOf(5);

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
        if (numerator.bitLength() < 63 && denominator.bitLength() < 63) {
            return ofSmall(numerator.longValue(), denominator.longValue());
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
        if (denominator == 0) {
            throw new ArithmeticException("denominator is zero");
        }
        if (numerator == Long.MIN_VALUE || denominator == Long.MIN_VALUE) {
            return of(BigInteger.valueOf(numerator), BigInteger.valueOf(denominator));
        }
        return ofSmall(numerator, denominator);
    }

    /**
     * Lowest terms in {@code long} arithmetic (most coefficients, counts and charges are small, and
     * BigInteger's gcd is slow on them); both magnitudes below 2^63, the denominator not zero.
     */
    private static Rational ofSmall(long numerator, long denominator) {
        if (numerator == 0) {
            return ZERO;
        }
        if (denominator < 0) {
            numerator = -numerator;
            denominator = -denominator;
        }
        long a = Math.abs(numerator);
        long b = denominator;
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return new Rational(BigInteger.valueOf(numerator / a), BigInteger.valueOf(denominator / a));
    }

    public static Rational of(long value) {
        return value == 0 ? ZERO : new Rational(BigInteger.valueOf(value), BigInteger.ONE);
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
        return parseDecimal(s, text);
    }

    /**
     * The grammar {@code [+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d{1,3})?} scanned by hand (a regex
     * compiled per call was half of the balance checks' cold time), the digits taken as a {@code long}
     * when there are at most 18 of them.
     */
    private static Rational parseDecimal(String s, String text) {
        int n = s.length();
        int i = 0;
        boolean negative = false;
        if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            negative = s.charAt(i) == '-';
            i++;
        }
        int intStart = i;
        i = skipDigits(s, i);
        int intEnd = i;
        int fracStart = i;
        int fracEnd = i;
        if (i < n && s.charAt(i) == '.') {
            fracStart = i + 1;
            i = skipDigits(s, fracStart);
            fracEnd = i;
        }
        int exponent = 0;
        if (i < n && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            int expStart = ++i;
            if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                i++;
            }
            int digitsStart = i;
            i = skipDigits(s, i);
            if (i == digitsStart || i - digitsStart > 3) {
                throw notDecimal(text);
            }
            exponent = Integer.parseInt(s, expStart, i, 10);
        }
        int digits = (intEnd - intStart) + (fracEnd - fracStart);
        if (i != n || (intEnd == intStart && fracEnd == fracStart)) {
            throw notDecimal(text);
        }
        int scale = (fracEnd - fracStart) - exponent;
        if (digits <= 18 && scale >= -18 && scale <= 18) {
            long unscaled = 0;
            for (int k = intStart; k < fracEnd; k++) {
                if (k != intEnd || fracStart == intEnd) {
                    unscaled = unscaled * 10 + (s.charAt(k) - '0');
                }
            }
            unscaled = negative ? -unscaled : unscaled;
            if (scale <= 0) {
                long factor = LONG_TEN_POWERS[-scale];
                if (unscaled == 0 || Math.abs(unscaled) <= Long.MAX_VALUE / factor) {
                    return of(unscaled * factor);
                }
            } else {
                return ofSmall(unscaled, LONG_TEN_POWERS[scale]);
            }
        }
        return of(new BigDecimal(s));
    }

    private static long[] tenPowers() {
        long[] p = new long[19];
        p[0] = 1;
        for (int k = 1; k < p.length; k++) {
            p[k] = p[k - 1] * 10;
        }
        return p;
    }

    private static int skipDigits(String s, int i) {
        while (i < s.length() && s.charAt(i) >= '0' && s.charAt(i) <= '9') {
            i++;
        }
        return i;
    }

    private static NumberFormatException notDecimal(String text) {
        return new NumberFormatException("not a finite decimal number: '" + text + "'");
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
        if (denominator.equals(other.denominator)) {
            BigInteger sum = numerator.add(other.numerator);
            return isInteger() ? integer(sum) : of(sum, denominator);
        }
        return of(numerator.multiply(other.denominator).add(other.numerator.multiply(denominator)),
                denominator.multiply(other.denominator));
    }

    private static Rational integer(BigInteger value) {
        return value.signum() == 0 ? ZERO : new Rational(value, BigInteger.ONE);
    }

    public Rational subtract(Rational other) {
        return add(other.negate());
    }

    public Rational multiply(Rational other) {
        if (isInteger() && other.isInteger()) {
            return integer(numerator.multiply(other.numerator));
        }
        return of(numerator.multiply(other.numerator), denominator.multiply(other.denominator));
    }

    public Rational multiply(long factor) {
        if (isInteger()) {
            return integer(numerator.multiply(BigInteger.valueOf(factor)));
        }
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
        if (isTerminatingDecimal()) {
            // n / (2^a 5^b) = n 2^(k-a) 5^(k-b) / 10^k with k = max(a, b): no division needed.
            int twos = denominator.getLowestSetBit();
            int fives = 0;
            for (BigInteger rest = denominator.shiftRight(twos); !rest.equals(BigInteger.ONE); rest = rest.divide(FIVE)) {
                fives++;
            }
            int k = Math.max(twos, fives);
            BigInteger unscaled = numerator.shiftLeft(k - twos).multiply(FIVE.pow(k - fives));
            return new BigDecimal(unscaled, k).stripTrailingZeros().toPlainString();
        }
        return new BigDecimal(numerator).divide(new BigDecimal(denominator), 6, java.math.RoundingMode.HALF_EVEN)
                .stripTrailingZeros().toPlainString();
    }

    /** True when the value has a finite decimal expansion (the denominator has no prime factor but 2 and 5). */
    public boolean isTerminatingDecimal() {
        if (denominator.bitLength() < 63) {
            long d = denominator.longValue();
            d >>= Long.numberOfTrailingZeros(d);
            while (d % 5 == 0) {
                d /= 5;
            }
            return d == 1;
        }
        BigInteger d = denominator.shiftRight(denominator.getLowestSetBit());
        while (true) {
            BigInteger[] qr = d.divideAndRemainder(FIVE);
            if (qr[1].signum() != 0) {
                return d.equals(BigInteger.ONE);
            }
            d = qr[0];
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
