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

    /**
     * For people: {@code "+1"}, {@code "-1.5"}, {@code "0"}; a decimal when it terminates,
     * otherwise the exact fraction ({@code "+1/3"}). Data fields keep {@link Rational#toString()}.
     */
    public static String signed(Rational r) {
        String text = r.isTerminatingDecimal() ? r.toDecimalString() : r.toString();
        return r.signum() > 0 ? "+" + text : text;
    }
}
