package io.github.atomledger.checker.check.balance;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Computes {@link ReactionBalance} for every reaction of a model. Coefficients are parsed from
 * their attribute text ({@code "0.633"}, {@code "1e-06"}) straight into exact rationals.
 * Stateless and thread-safe.
 */
public final class BalanceCalculator {

    private final ReactionClassifier classifier = new ReactionClassifier();

    /** Parses every species' formula and charge once, in document order. */
    public Map<String, SpeciesChemistry> chemistry(ModelView model) {
        Map<String, SpeciesChemistry> out = new LinkedHashMap<>();
        for (SpeciesInfo s : model.species()) {
            out.putIfAbsent(s.id(), SpeciesChemistry.of(s, model.fbcVersion()));
        }
        return out;
    }

    /** Balances of all reactions, keyed by reaction id, in document order. */
    public Map<String, ReactionBalance> balances(ModelView model, Map<String, SpeciesChemistry> chemistry) {
        Map<String, ReactionBalance> out = new LinkedHashMap<>();
        for (ReactionInfo r : model.reactions()) {
            out.putIfAbsent(r.id(), balance(model, r, chemistry));
        }
        return out;
    }

    ReactionBalance balance(ModelView model, ReactionInfo r, Map<String, SpeciesChemistry> chemistry) {
        Classification cls = classifier.classify(model, r);
        Sum sum = new Sum();
        sum.add(r.reactants(), Rational.ONE.negate(), chemistry);
        sum.add(r.products(), Rational.ONE, chemistry);
        sum.net.values().removeIf(Rational::isZero);
        boolean computable = sum.withoutFormula.isEmpty() && sum.invalidFormula.isEmpty() && sum.polymer.isEmpty()
                && sum.missing.isEmpty() && sum.badCoefficients.isEmpty();
        boolean chargeKnown = sum.withoutCharge.isEmpty() && sum.missing.isEmpty() && sum.badCoefficients.isEmpty();
        return new ReactionBalance(r.id(), cls, sum.net, computable, chargeKnown ? sum.charge : null,
                List.copyOf(sum.withoutFormula), List.copyOf(sum.invalidFormula), List.copyOf(sum.polymer),
                List.copyOf(sum.withoutCharge), List.copyOf(sum.missing), sum.badCoefficients);
    }

    /** Running totals for one reaction; confined to one call. */
    private static final class Sum {
        final SortedMap<String, Rational> net = new TreeMap<>();
        Rational charge = Rational.ZERO;
        final TreeSet<String> withoutFormula = new TreeSet<>();
        final TreeSet<String> invalidFormula = new TreeSet<>();
        final TreeSet<String> polymer = new TreeSet<>();
        final TreeSet<String> withoutCharge = new TreeSet<>();
        final TreeSet<String> missing = new TreeSet<>();
        final SortedMap<String, String> badCoefficients = new TreeMap<>();

        void add(List<Participant> side, Rational sign, Map<String, SpeciesChemistry> chemistry) {
            for (Participant p : side) {
                SpeciesChemistry chem = chemistry.get(p.species());
                if (chem == null) {
                    missing.add(p.species());
                    continue;
                }
                Rational coefficient = coefficient(p, badCoefficients);
                if (coefficient == null) {
                    continue;
                }
                Rational weighted = coefficient.multiply(sign);
                Formula f = chem.formula();
                if (f == null) {
                    (chem.formulaError() != null ? invalidFormula : withoutFormula).add(p.species());
                } else if (f.isPolymer()) {
                    polymer.add(p.species());
                } else {
                    for (Map.Entry<String, Long> e : f.counts().entrySet()) {
                        net.merge(e.getKey(), weighted.multiply(e.getValue()), Rational::add);
                    }
                }
                if (chem.charge() == null) {
                    withoutCharge.add(p.species());
                } else {
                    charge = charge.add(weighted.multiply(chem.charge()));
                }
            }
        }
    }

    private static Rational coefficient(Participant p, Map<String, String> bad) {
        String text = p.stoichiometryText();
        if (text == null) {
            bad.put(p.species(), "unset");
            return null;
        }
        try {
            Rational c = Rational.parse(text);
            if (c.signum() < 0) {
                bad.put(p.species(), text);
                return null;
            }
            return c;
        } catch (NumberFormatException e) {
            bad.put(p.species(), text);
            return null;
        }
    }
}
