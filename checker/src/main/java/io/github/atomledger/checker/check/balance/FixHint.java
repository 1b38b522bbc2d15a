package io.github.atomledger.checker.check.balance;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.math.BigInteger;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * A repair that balances a reaction by adding protons and/or water, the usual curation fix
 * (Thiele & Palsson 2010, Nat Protoc 5:93, "adding H+ and H2O on the correct side").
 *
 * <p>With Δ = products − reactants, adding {@code w} H2O and {@code p} H+ to the reactants
 * balances the reaction exactly when Δ has no other element, Δ(O) = w, Δ(charge) = p and
 * Δ(H) = 2w + p. Negative amounts go to the products instead.
 *
 * @param protons         protons to add (always ≥ 0), 0 when none
 * @param protonSide      "reactants" or "products" (empty when no protons)
 * @param protonSpecies   the model's own proton species in the reaction's compartment, or ""
 * @param water           water molecules to add (≥ 0)
 * @param waterSide       "reactants" or "products" (empty when no water)
 * @param waterSpecies    the model's own water species in the compartment, or ""
 */
public record FixHint(BigInteger protons, String protonSide, String protonSpecies,
                      BigInteger water, String waterSide, String waterSpecies) {

    /** The hint for a balance, when protons and water alone fix it exactly. */
    public static Optional<FixHint> of(ModelView model, ReactionInfo reaction, ReactionBalance balance,
                                       Map<String, SpeciesChemistry> chemistry) {
        if (!balance.elementImbalanced() || balance.charge() == null) {
            return Optional.empty();
        }
        SortedMap<String, Rational> d = balance.elements();
        for (String symbol : d.keySet()) {
            if (!symbol.equals("H") && !symbol.equals("O")) {
                return Optional.empty();
            }
        }
        Rational dh = d.getOrDefault("H", Rational.ZERO);
        Rational dO = d.getOrDefault("O", Rational.ZERO);
        Rational dq = balance.charge();
        if (!dh.isInteger() || !dO.isInteger() || !dq.isInteger()) {
            return Optional.empty();
        }
        if (!dh.equals(dO.multiply(2).add(dq))) {
            return Optional.empty();
        }
        String compartment = mainCompartment(model, reaction);
        BigInteger w = dO.numerator();
        BigInteger p = dq.numerator();
        return Optional.of(new FixHint(p.abs(), side(p), p.signum() == 0 ? "" : find(model, chemistry, compartment, "H", 1),
                w.abs(), side(w), w.signum() == 0 ? "" : find(model, chemistry, compartment, "H2O", 0)));
    }

    private static String side(BigInteger amount) {
        return amount.signum() > 0 ? "reactants" : amount.signum() < 0 ? "products" : "";
    }

    /** Data entries for a finding ("fix.protons", "fix.protonSide", ...), only the non-empty ones. */
    public SortedMap<String, String> toData() {
        SortedMap<String, String> m = new TreeMap<>();
        if (protons.signum() > 0) {
            m.put("fix.protons", protons.toString());
            m.put("fix.protonSide", protonSide);
            if (!protonSpecies.isEmpty()) {
                m.put("fix.protonSpecies", protonSpecies);
            }
        }
        if (water.signum() > 0) {
            m.put("fix.water", water.toString());
            m.put("fix.waterSide", waterSide);
            if (!waterSpecies.isEmpty()) {
                m.put("fix.waterSpecies", waterSpecies);
            }
        }
        return m;
    }

    /** "add 1 H+ (M_h_c) to the products and 1 H2O (M_h2o_c) to the reactants". */
    public String describe() {
        StringBuilder sb = new StringBuilder("add ");
        if (protons.signum() > 0) {
            sb.append(protons).append(" H+").append(protonSpecies.isEmpty() ? "" : " (" + protonSpecies + ")")
                    .append(" to the ").append(protonSide);
        }
        if (water.signum() > 0) {
            if (protons.signum() > 0) {
                sb.append(" and ");
            }
            sb.append(water).append(" H2O").append(waterSpecies.isEmpty() ? "" : " (" + waterSpecies + ")")
                    .append(" to the ").append(waterSide);
        }
        return sb.toString();
    }

    private static String mainCompartment(ModelView model, ReactionInfo r) {
        Map<String, Integer> counts = new LinkedHashMap<>();
        for (Participant p : r.participants()) {
            model.species(p.species()).ifPresent(s -> counts.merge(s.compartment(), 1, Integer::sum));
        }
        String best = "";
        int bestCount = -1;
        for (Map.Entry<String, Integer> e : counts.entrySet()) {
            if (e.getValue() > bestCount) {
                best = e.getKey();
                bestCount = e.getValue();
            }
        }
        return best;
    }

    private static String find(ModelView model, Map<String, SpeciesChemistry> chemistry, String compartment,
                               String hill, int charge) {
        for (SpeciesInfo s : model.species()) {
            if (!s.compartment().equals(compartment)) {
                continue;
            }
            SpeciesChemistry c = chemistry.get(s.id());
            if (c != null && c.formula() != null && c.formula().toHillString().equals(hill)
                    && (c.charge() == null || c.charge().equals(Rational.of(charge)))) {
                return s.id();
            }
        }
        return "";
    }
}
