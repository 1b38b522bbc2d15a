package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.FormulaParser;
import io.github.atomledger.atommapper.formula.FormulaSyntaxException;
import io.github.atomledger.atommapper.formula.Rational;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Internal networks written as text for tests: {@code "A=C2H4 B=C2H2 H=H X"} declares species (a
 * formula after '=', none otherwise) and {@code "R1: A -> B + 2 H"} a reaction (coefficients as
 * exact decimal text; a species on both sides nets out).
 */
final class TinyNetworks {

    private TinyNetworks() {
    }

    static InternalNetwork of(String species, String... reactions) {
        Map<String, Integer> index = new LinkedHashMap<>();
        List<Formula> formulas = new ArrayList<>();
        for (String s : species.trim().split("\\s+")) {
            String[] parts = s.split("=", 2);
            index.put(parts[0], index.size());
            try {
                formulas.add(parts.length == 2 ? FormulaParser.parse(parts[1]) : null);
            } catch (FormulaSyntaxException e) {
                throw new IllegalArgumentException(s, e);
            }
        }
        List<InternalNetwork.Column> columns = new ArrayList<>();
        for (String r : reactions) {
            String[] head = r.split(":", 2);
            String[] sides = head[1].split("->");
            Map<Integer, Rational> net = new TreeMap<>();
            side(sides[0], Rational.ONE.negate(), index, net);
            side(sides[1], Rational.ONE, index, net);
            net.values().removeIf(Rational::isZero);
            columns.add(new InternalNetwork.Column(head[0].trim(), net));
        }
        return new InternalNetwork(new ArrayList<>(index.keySet()), formulas, columns);
    }

    private static void side(String text, Rational sign, Map<String, Integer> index, Map<Integer, Rational> net) {
        for (String term : text.trim().split("\\s*\\+\\s+")) {
            if (term.isBlank()) {
                continue;
            }
            String[] t = term.trim().split("\\s+");
            Rational c = t.length == 2 ? Rational.parse(t[0]) : Rational.ONE;
            Integer i = index.get(t[t.length - 1]);
            if (i == null) {
                throw new IllegalArgumentException("unknown species in '" + term + "'");
            }
            net.merge(i, c.multiply(sign), Rational::add);
        }
    }
}
