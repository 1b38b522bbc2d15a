package io.github.atomledger.atommapper.formula;

import java.util.Map;
import java.util.TreeMap;

/**
 * Parses chemical formulas in the grammar of the SBML fbc package, versions 2 and 3.
 *
 * <p>Accepted: symbols of the form one capital letter followed by lowercase letters (an element
 * or a user-defined compound such as R, X or Protein), each with an optional non-negative integer
 * count ({@code C6H12O6}, {@code C10H17O10PR2}); and, as fbc version 3 allows, parenthesised
 * groups followed by {@code n} for an arbitrary repetition ({@code C2H4O2(CH2)n}). Symbols may
 * repeat ({@code CH3COOH}) and are summed. Leading and trailing white space is ignored.
 *
 * <p>Rejected with a {@link FormulaSyntaxException} naming the position: empty text, lowercase
 * starts ({@code c6h6}), charges ({@code [C2H3O2]-}), dots and hydrates ({@code C6H12O6.H2O}),
 * integer multipliers after a group ({@code (CH2)2}, which fbc version 3 calls invalid), nested
 * repeating groups, and counts beyond 10^12.
 *
 * <p>Does not handle: isotopes, charges, or hydrate notation. Thread-safe; stateless.
 */
public final class FormulaParser {

    private static final long MAX_COUNT = 1_000_000_000_000L;

    private FormulaParser() {
    }

    /** Parses {@code text}; see the class description for the grammar. */
    public static Formula parse(String text) throws FormulaSyntaxException {
        if (text == null) {
            throw new FormulaSyntaxException("", 0, "no formula text");
        }
        String s = text.strip();
        int offset = text.indexOf(s.isEmpty() ? "" : s.substring(0, 1));
        if (s.isEmpty()) {
            throw new FormulaSyntaxException(text, 0, "the formula is empty");
        }
        Map<String, Long> fixed = new TreeMap<>();
        Map<String, Long> unit = new TreeMap<>();
        int i = 0;
        while (i < s.length()) {
            char c = s.charAt(i);
            if (c == '(') {
                int close = s.indexOf(')', i + 1);
                if (close < 0) {
                    throw new FormulaSyntaxException(text, offset + i, "unclosed '('");
                }
                String inner = s.substring(i + 1, close);
                if (inner.indexOf('(') >= 0) {
                    throw new FormulaSyntaxException(text, offset + i + 1 + inner.indexOf('('),
                            "nested groups are not allowed");
                }
                if (inner.isEmpty()) {
                    throw new FormulaSyntaxException(text, offset + i, "empty group '()'");
                }
                int after = close + 1;
                if (after >= s.length() || s.charAt(after) != 'n') {
                    throw new FormulaSyntaxException(text, offset + after,
                            "a parenthesised group must be followed by 'n' (fbc version 3 allows no other multiplier)");
                }
                if (after + 1 < s.length() && Character.isLowerCase(s.charAt(after + 1))) {
                    throw new FormulaSyntaxException(text, offset + after + 1, "unexpected character '"
                            + s.charAt(after + 1) + "' after ')n'");
                }
                parseFlat(text, inner, offset + i + 1, unit);
                i = after + 1;
            } else if (c == ')') {
                throw new FormulaSyntaxException(text, offset + i, "')' without '('");
            } else {
                int end = i;
                while (end < s.length() && s.charAt(end) != '(' && s.charAt(end) != ')') {
                    end++;
                }
                parseFlat(text, s.substring(i, end), offset + i, fixed);
                i = end;
            }
        }
        return Formula.of(fixed, unit);
    }

    private static void parseFlat(String text, String part, int base, Map<String, Long> into)
            throws FormulaSyntaxException {
        int i = 0;
        while (i < part.length()) {
            char c = part.charAt(i);
            if (!(c >= 'A' && c <= 'Z')) {
                String what = Character.isWhitespace(c) ? "white space" : "'" + c + "'";
                String hint = (c >= 'a' && c <= 'z') ? " (a symbol starts with a capital letter)" : "";
                throw new FormulaSyntaxException(text, base + i, "unexpected " + what + hint);
            }
            int start = i++;
            while (i < part.length() && part.charAt(i) >= 'a' && part.charAt(i) <= 'z') {
                i++;
            }
            String symbol = part.substring(start, i);
            int digits = i;
            while (i < part.length() && part.charAt(i) >= '0' && part.charAt(i) <= '9') {
                i++;
            }
            long count = 1;
            if (i > digits) {
                String num = part.substring(digits, i);
                if (num.length() > 13 || Long.parseLong(num) > MAX_COUNT) {
                    throw new FormulaSyntaxException(text, base + digits, "count " + num + " is too large");
                }
                count = Long.parseLong(num);
            }
            into.merge(symbol, count, Long::sum);
        }
    }
}
