package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The rows of a reaction's balance table for people: per element the reactant total, the product
 * total and the difference (products minus reactants), each species weighted by its coefficient,
 * in exact arithmetic, plus the charge. The engine's {@code ReactionBalance} stays the verdict;
 * this only shows where the numbers come from. Elements in Hill order (C, H, then alphabetical).
 *
 * @param rows      element rows, Hill order; empty when not computable
 * @param charge    the charge row, or null when a charge is unknown
 * @param complete  false when a participant lacks a usable formula or coefficient
 */
record BalanceTable(List<Row> rows, Row charge, boolean complete) {

    record Row(String label, Rational reactants, Rational products) {
        Rational delta() {
            return products.subtract(reactants);
        }
    }

    static final Comparator<String> HILL = Comparator.comparingInt((String s) -> s.equals("C") ? 0 : s.equals("H") ? 1 : 2)
            .thenComparing(Comparator.naturalOrder());

    static Map<String, SpeciesChemistry> chemistry(ModelView model) {
        Map<String, SpeciesChemistry> out = new LinkedHashMap<>();
        for (SpeciesInfo s : model.species()) {
            out.putIfAbsent(s.id(), SpeciesChemistry.of(s, model.fbcVersion()));
        }
        return out;
    }

    static BalanceTable of(ReactionInfo reaction, Map<String, SpeciesChemistry> chemistry) {
        Map<String, Rational[]> sums = new TreeMap<>(HILL);
        Rational[] charge = {Rational.ZERO, Rational.ZERO};
        boolean complete = true;
        boolean chargeKnown = true;
        for (int side = 0; side < 2; side++) {
            for (Participant p : side == 0 ? reaction.reactants() : reaction.products()) {
                Rational coefficient = coefficient(p);
                SpeciesChemistry c = chemistry.get(p.species());
                Formula f = c == null ? null : c.formula();
                if (coefficient == null || f == null || f.isPolymer()) {
                    complete = false;
                } else {
                    for (Map.Entry<String, Long> e : f.counts().entrySet()) {
                        Rational[] pair = sums.computeIfAbsent(e.getKey(), k -> new Rational[] {Rational.ZERO, Rational.ZERO});
                        pair[side] = pair[side].add(coefficient.multiply(e.getValue()));
                    }
                }
                if (coefficient == null || c == null || c.charge() == null) {
                    chargeKnown = false;
                } else {
                    charge[side] = charge[side].add(coefficient.multiply(c.charge()));
                }
            }
        }
        List<Row> rows = new ArrayList<>();
        if (complete) {
            sums.forEach((symbol, pair) -> rows.add(new Row(symbol, pair[0], pair[1])));
        }
        return new BalanceTable(rows, chargeKnown ? new Row("charge", charge[0], charge[1]) : null, complete);
    }

    /** The coefficient as written, or null when unset, not a number or negative. */
    static Rational coefficient(Participant p) {
        if (p.stoichiometryText() == null) {
            return null;
        }
        try {
            Rational r = Rational.parse(p.stoichiometryText());
            return r.signum() < 0 ? null : r;
        } catch (NumberFormatException | ArithmeticException e) {
            return null;
        }
    }
}
