package io.github.atomledger.atommapper.formula;

import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.SortedSet;

/**
 * A molecular formula as exact element counts: a fixed part, plus, for the fbc version 3 polymer
 * form {@code (...)n}, the counts of the repeating unit per {@code n}.
 *
 * <p>Symbols are element symbols or pseudo-elements (R, X, user-defined compounds). Zero counts
 * are never stored. Two formulas are equal when their counts are equal, whatever text they came
 * from ({@code "HO"} equals {@code "OH"}). Instances are immutable and thread-safe.
 *
 * <p>Example: {@code FormulaParser.parse("C21H32N7O16P3S").count("C") == 21}.
 */
public final class Formula {

    /** The formula with no atoms (an electron or photon pseudo-species, for instance). */
    public static final Formula EMPTY = new Formula(new TreeMap<>(), new TreeMap<>());

    private final SortedMap<String, Long> counts;
    private final SortedMap<String, Long> repeatUnit;

    private Formula(SortedMap<String, Long> counts, SortedMap<String, Long> repeatUnit) {
        this.counts = Collections.unmodifiableSortedMap(counts);
        this.repeatUnit = Collections.unmodifiableSortedMap(repeatUnit);
    }

    /** A formula from element counts; zero entries are dropped, negative ones rejected. */
    public static Formula of(Map<String, Long> counts) {
        return of(counts, Map.of());
    }

    /** A formula with a fixed part and a repeating unit (counts per {@code n}). */
    public static Formula of(Map<String, Long> counts, Map<String, Long> repeatUnit) {
        return new Formula(clean(counts), clean(repeatUnit));
    }

    private static SortedMap<String, Long> clean(Map<String, Long> in) {
        SortedMap<String, Long> out = new TreeMap<>();
        in.forEach((symbol, count) -> {
            Objects.requireNonNull(symbol, "symbol");
            if (count < 0) {
                throw new IllegalArgumentException("negative count for " + symbol + ": " + count);
            }
            if (count > 0) {
                out.put(symbol, count);
            }
        });
        return out;
    }

    /** Counts of the fixed part by symbol, sorted by symbol; unmodifiable. */
    public SortedMap<String, Long> counts() {
        return counts;
    }

    /** Counts of the {@code (...)n} repeating unit per n; empty unless {@link #isPolymer()}. */
    public SortedMap<String, Long> repeatUnit() {
        return repeatUnit;
    }

    /** The count of one symbol in the fixed part (0 when absent). */
    public long count(String symbol) {
        return counts.getOrDefault(symbol, 0L);
    }

    /** True for the fbc version 3 form with a {@code (...)n} group: its size is not fixed. */
    public boolean isPolymer() {
        return !repeatUnit.isEmpty();
    }

    /** Symbols that are not chemical elements (R, X, ...), sorted. */
    public SortedSet<String> pseudoElements() {
        SortedSet<String> out = new TreeSet<>();
        for (String s : counts.keySet()) {
            if (!Elements.isElement(s)) {
                out.add(s);
            }
        }
        for (String s : repeatUnit.keySet()) {
            if (!Elements.isElement(s)) {
                out.add(s);
            }
        }
        return out;
    }

    /** Heavy-atom (non-hydrogen) count of the fixed part, pseudo-elements included. */
    public long heavyAtomCount() {
        long n = 0;
        for (Map.Entry<String, Long> e : counts.entrySet()) {
            if (!e.getKey().equals("H")) {
                n += e.getValue();
            }
        }
        return n;
    }

    /** This formula with {@code delta} more (or fewer) atoms of one symbol; never below zero. */
    public Formula plus(String symbol, long delta) {
        SortedMap<String, Long> c = new TreeMap<>(counts);
        long n = c.getOrDefault(symbol, 0L) + delta;
        if (n < 0) {
            throw new IllegalArgumentException("count of " + symbol + " would be negative");
        }
        c.put(symbol, n);
        return new Formula(clean(c), new TreeMap<>(repeatUnit));
    }

    /**
     * Hill notation: with carbon, C first, then H, then the rest alphabetically; without carbon,
     * everything alphabetically. A repeating unit is written as {@code (...)n} at the end.
     */
    public String toHillString() {
        StringBuilder sb = new StringBuilder();
        appendHill(sb, counts);
        if (isPolymer()) {
            sb.append('(');
            appendHill(sb, repeatUnit);
            sb.append(")n");
        }
        return sb.toString();
    }

    private static void appendHill(StringBuilder sb, SortedMap<String, Long> map) {
        boolean carbon = map.containsKey("C");
        if (carbon) {
            appendOne(sb, "C", map.get("C"));
            if (map.containsKey("H")) {
                appendOne(sb, "H", map.get("H"));
            }
        }
        for (Map.Entry<String, Long> e : map.entrySet()) {
            if (carbon && (e.getKey().equals("C") || e.getKey().equals("H"))) {
                continue;
            }
            appendOne(sb, e.getKey(), e.getValue());
        }
    }

    private static void appendOne(StringBuilder sb, String symbol, long count) {
        sb.append(symbol);
        if (count != 1) {
            sb.append(count);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Formula f && counts.equals(f.counts) && repeatUnit.equals(f.repeatUnit);
    }

    @Override
    public int hashCode() {
        return counts.hashCode() * 31 + repeatUnit.hashCode();
    }

    @Override
    public String toString() {
        return toHillString();
    }
}
