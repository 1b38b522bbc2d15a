package io.github.atomledger.maven;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.maven.plugin.MojoExecutionException;

/**
 * Reads the numeric parameters from their text, so that a wrong value gets our own message naming
 * the property, the value and what is allowed (Maven's own conversion error names a Java type).
 * Numeric parameters are therefore declared as {@code String}.
 */
final class ParameterValues {

    private static final Pattern DURATION = Pattern.compile("(\\d+(?:\\.\\d+)?)\\s*(ms|s|m|min)?");
    private static final Pattern SIZE = Pattern.compile("(\\d+)\\s*(b|k|kb|kib|m|mb|mib|g|gb|gib)?");

    private ParameterValues() {
    }

    /** Mapping threads: 0 (one per core) or a positive whole number. */
    static int threads(String value) throws MojoExecutionException {
        String v = strip(value, "0");
        if (!v.matches("\\d{1,6}")) {
            throw bad("threads", value, v.startsWith("-")
                    ? "a thread count cannot be negative; use 0 for one thread per core, or a positive number"
                    : "use 0 for one thread per core, or a positive whole number such as 4");
        }
        return Integer.parseInt(v);
    }

    /** A positive whole number (for example {@code maxHeavyAtoms}). */
    static int positive(String name, String value, int fallback) throws MojoExecutionException {
        String v = strip(value, Integer.toString(fallback));
        if (!v.matches("\\d{1,9}") || Integer.parseInt(v) == 0) {
            throw bad(name, value, "use a positive whole number such as " + fallback);
        }
        return Integer.parseInt(v);
    }

    /**
     * A duration in milliseconds: a whole number of milliseconds ({@code 2000}) or a number with
     * a unit, {@code ms}, {@code s} or {@code m}/{@code min} ({@code 2s}, {@code 1.5s}, {@code 500ms}).
     */
    static long durationMillis(String name, String value, long fallback) throws MojoExecutionException {
        return duration(name, value, fallback, false);
    }

    /** A duration as {@link #durationMillis}, where {@code 0} is allowed (it switches the budgeted work off). */
    static long durationOrZeroMillis(String name, String value, long fallback) throws MojoExecutionException {
        return duration(name, value, fallback, true);
    }

    /** A whole number, zero or more (for example {@code reviewMargin}). */
    static int nonNegative(String name, String value, int fallback) throws MojoExecutionException {
        String v = strip(value, Integer.toString(fallback));
        if (!v.matches("\\d{1,9}")) {
            throw bad(name, value, v.startsWith("-") ? "it cannot be negative; use 0 or a positive whole number"
                    : "use 0 or a positive whole number such as " + Math.max(1, fallback));
        }
        return Integer.parseInt(v);
    }

    private static long duration(String name, String value, long fallback, boolean zeroAllowed)
            throws MojoExecutionException {
        String v = strip(value, Long.toString(fallback)).toLowerCase(Locale.ROOT);
        Matcher m = DURATION.matcher(v);
        if (!m.matches()) {
            throw bad(name, value, "write milliseconds (2000) or a number with a unit: 500ms, 2s, 1.5s, 1m");
        }
        BigDecimal n = new BigDecimal(m.group(1));
        String unit = m.group(2) == null ? "ms" : m.group(2);
        BigDecimal ms = switch (unit) {
            case "s" -> n.movePointRight(3);
            case "m", "min" -> n.multiply(BigDecimal.valueOf(60_000));
            default -> n;
        };
        if (ms.signum() < (zeroAllowed ? 0 : 1) || ms.compareTo(BigDecimal.valueOf(Long.MAX_VALUE / 2)) > 0) {
            throw bad(name, value, zeroAllowed ? "the time must be 0 (off) or positive, and below a few million years"
                    : "the time must be positive and below a few million years");
        }
        return ms.setScale(0, java.math.RoundingMode.CEILING).longValueExact();
    }

    /** A size in bytes: a whole number, or with a binary unit {@code k}, {@code m}, {@code g} ({@code 512m}, {@code 1GiB}). */
    static long bytes(String name, String value, long fallback) throws MojoExecutionException {
        String v = strip(value, Long.toString(fallback)).toLowerCase(Locale.ROOT);
        Matcher m = SIZE.matcher(v);
        if (!m.matches() || m.group(1).length() > 18) {
            throw bad(name, value, "write a number of bytes (1073741824) or a number with a unit: 512m, 2g, 1GiB");
        }
        long n = Long.parseLong(m.group(1));
        String unit = m.group(2) == null ? "b" : m.group(2).substring(0, 1);
        int shift = switch (unit) {
            case "k" -> 10;
            case "m" -> 20;
            case "g" -> 30;
            default -> 0;
        };
        if (n == 0 || Long.numberOfLeadingZeros(n) <= shift) {
            throw bad(name, value, "the size must be positive and below 8 EiB");
        }
        return n << shift;
    }

    private static String strip(String value, String fallback) {
        return value == null || value.isBlank() ? fallback : value.strip();
    }

    private static MojoExecutionException bad(String name, String value, String what) {
        return new MojoExecutionException("AtomLedger configuration: atomledger." + name + "='" + value
                + "' is not valid: " + what + ".");
    }
}
