package io.github.atomledger.checker.check.balance;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.Map;
import java.util.SortedMap;
import java.util.StringJoiner;

/** Text forms of net element vectors, shared by messages and the console. */
public final class Deltas {

    private Deltas() {
    }

    /** {@code "C -20, H +1"}; "none" for an empty vector. Signs always shown. */
    public static String format(SortedMap<String, Rational> elements) {
        if (elements.isEmpty()) {
            return "none";
        }
        StringJoiner j = new StringJoiner(", ");
        for (Map.Entry<String, Rational> e : elements.entrySet()) {
            j.add(e.getKey() + " " + signed(e.getValue()));
        }
        return j.toString();
    }

    /** {@code "+1"}, {@code "-3/2"}, {@code "0"}. */
    public static String signed(Rational r) {
        return r.signum() > 0 ? "+" + r : r.toString();
    }
}
