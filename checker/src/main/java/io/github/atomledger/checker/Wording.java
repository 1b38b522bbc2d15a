package io.github.atomledger.checker;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The English every message and report shares: counted nouns ("1 warning", "3 reactions"),
 * articles ("an exchange reaction"), element names, lists cut short, and imbalances said in
 * words ({@code O +1: the products have one oxygen more}). Pure functions; thread-safe.
 */
public final class Wording {

    /** Names of the elements models use most; other symbols are written as "atoms of Xy". */
    private static final Map<String, String> ELEMENT_NAMES = Map.ofEntries(
            Map.entry("H", "hydrogen"), Map.entry("C", "carbon"), Map.entry("N", "nitrogen"),
            Map.entry("O", "oxygen"), Map.entry("P", "phosphorus"), Map.entry("S", "sulfur"),
            Map.entry("Na", "sodium"), Map.entry("K", "potassium"), Map.entry("Cl", "chlorine"),
            Map.entry("Mg", "magnesium"), Map.entry("Ca", "calcium"), Map.entry("Fe", "iron"),
            Map.entry("Zn", "zinc"), Map.entry("Cu", "copper"), Map.entry("Mn", "manganese"),
            Map.entry("Co", "cobalt"), Map.entry("Mo", "molybdenum"), Map.entry("Ni", "nickel"),
            Map.entry("Se", "selenium"), Map.entry("F", "fluorine"), Map.entry("Br", "bromine"),
            Map.entry("I", "iodine"), Map.entry("B", "boron"), Map.entry("Cd", "cadmium"),
            Map.entry("Hg", "mercury"), Map.entry("As", "arsenic"), Map.entry("W", "tungsten"));

    private static final List<String> SMALL = List.of("zero", "one", "two", "three", "four", "five", "six",
            "seven", "eight", "nine");

    /** Nouns whose plural is the same word. */
    private static final List<String> INVARIANT = List.of("species", "info", "series");

    private Wording() {
    }

    /** "1 reaction", "0 reactions", "3 species". */
    public static String count(long n, String singular) {
        return n + " " + (n == 1 ? singular : plural(singular));
    }

    /** The plural of a simple English noun (the last word of a phrase is inflected). */
    public static String plural(String singular) {
        int space = singular.lastIndexOf(' ');
        String head = singular.substring(0, space + 1);
        String w = singular.substring(space + 1);
        if (INVARIANT.contains(w) || w.isEmpty()) {
            return singular;
        }
        if (w.endsWith("y") && w.length() > 1 && "aeiou".indexOf(w.charAt(w.length() - 2)) < 0) {
            return head + w.substring(0, w.length() - 1) + "ies";
        }
        if (w.endsWith("s") || w.endsWith("x") || w.endsWith("sh") || w.endsWith("ch")) {
            return head + w + "es";
        }
        return head + w + "s";
    }

    /** "an exchange", "a biomass": the indefinite article by the first letter (vowel sound rule of thumb). */
    public static String withArticle(String phrase) {
        if (phrase.isEmpty()) {
            return phrase;
        }
        char c = Character.toLowerCase(phrase.charAt(0));
        boolean vowel = "aeio".indexOf(c) >= 0 || (c == 'u' && !phrase.toLowerCase(Locale.ROOT).startsWith("uni")
                && !phrase.toLowerCase(Locale.ROOT).startsWith("use"));
        return (vowel ? "an " : "a ") + phrase;
    }

    /** Small whole numbers as words ("one"), everything else as written ("20", "0.633"). */
    public static String number(Rational q) {
        if (q.isInteger() && q.signum() >= 0 && q.numerator().bitLength() < 8 && q.numerator().intValue() < SMALL.size()) {
            return SMALL.get(q.numerator().intValue());
        }
        return q.isTerminatingDecimal() ? q.toDecimalString() : q.toString();
    }

    /** The element's English name ("oxygen"), or "atom of Xy" for other symbols. */
    public static String elementName(String symbol) {
        String name = ELEMENT_NAMES.get(symbol);
        if (name != null) {
            return name;
        }
        if (symbol.equals("R") || symbol.equals("X")) {
            return "generic group " + symbol;
        }
        return "atom of " + symbol;
    }

    /** "oxygens", "atoms of Xy", "generic groups R". */
    private static String elementNamePlural(String symbol) {
        String name = elementName(symbol);
        if (name.startsWith("atom of ")) {
            return "atoms of " + symbol;
        }
        if (name.startsWith("generic group ")) {
            return "generic groups " + symbol;
        }
        return name + "s";
    }

    /**
     * One element's imbalance in words: {@code "O +1: the products have one oxygen more"},
     * {@code "C -20: the products have 20 carbons fewer"}.
     *
     * @param delta products minus reactants, not zero
     */
    public static String elementDelta(String symbol, Rational delta) {
        Rational abs = delta.abs();
        String noun = abs.equals(Rational.ONE) ? elementName(symbol) : elementNamePlural(symbol);
        return symbol + " " + signed(delta) + ": the products have " + number(abs) + " " + noun
                + (delta.signum() > 0 ? " more" : " fewer");
    }

    /** The charge imbalance in words: {@code "charge +1: the products' total charge is one higher"}. */
    public static String chargeDelta(Rational delta) {
        Rational abs = delta.abs();
        return "charge " + signed(delta) + ": the products' total charge is " + number(abs)
                + (delta.signum() > 0 ? " higher" : " lower");
    }

    /** "+1", "-20", "+0.5", "0"; the exact fraction ("+1/3") when the decimal does not terminate. */
    public static String signed(Rational q) {
        String s = q.isTerminatingDecimal() ? q.toDecimalString() : q.toString();
        return q.signum() > 0 ? "+" + s : s;
    }

    /**
     * The first {@code max} items joined with ", ", then "and N more" when some are left out:
     * {@code "R_A, R_B and 3 more"}.
     */
    public static String shortList(Collection<String> items, int max) {
        List<String> all = List.copyOf(items);
        if (all.size() <= max) {
            return and(all);
        }
        return String.join(", ", all.subList(0, max)) + " and " + (all.size() - max) + " more";
    }

    /** "a", "a and b", "a, b and c". */
    public static String and(List<String> items) {
        if (items.isEmpty()) {
            return "";
        }
        if (items.size() == 1) {
            return items.get(0);
        }
        return String.join(", ", items.subList(0, items.size() - 1)) + " and " + items.get(items.size() - 1);
    }

    /** The text cut to {@code max} characters with an ellipsis ("…") when longer. */
    public static String cut(String text, int max) {
        return text.length() <= max ? text : text.substring(0, Math.max(0, max - 1)) + "\u2026";
    }
}
