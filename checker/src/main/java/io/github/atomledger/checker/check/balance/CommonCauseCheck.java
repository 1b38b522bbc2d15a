package io.github.atomledger.checker.check.balance;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * {@code balance.common-cause}: several imbalanced reactions are explained by one species' formula.
 * When a species' declared formula is off by a vector e (declared minus right), every reaction it
 * takes part in is off by s·e, s being the species' net coefficient (products minus reactants).
 * So for each imbalanced reaction and each participant the candidate e = Δ/s is computed; a species
 * whose candidate is the same exact vector in at least {@value #MIN_REACTIONS} reactions is named
 * once, with those reactions and the formula that would balance them all. Reactions that contain
 * the species but do not fit (a balanced one, or another Δ) count against it; a species is named only
 * when it explains more reactions than it contradicts. Greedy: the species explaining most is named
 * first, its reactions are taken out, and the search repeats. The same is done for charge alone
 * when the elements balance. Biomass and pseudo-reactions, which are imbalanced by design, take no
 * part. This is arithmetic, not proof: two wrong formulas can mimic one, so it says "likely".
 *
 * <p>Data: {@code species}, {@code reactions} (comma list), {@code reactionCount},
 * {@code delta.<symbol>} and {@code delta.charge} (declared minus the value that would balance,
 * per molecule), {@code declared}, {@code suggested} (Hill formula; absent when it would have a
 * negative count), {@code declaredCharge}, {@code suggestedCharge}, {@code contradicting} (comma
 * list, may be empty).
 */
public final class CommonCauseCheck implements ModelCheck {

    /** The fewest reactions one cause must explain to be named ("several"). */
    static final int MIN_REACTIONS = 3;

    private static final String CHARGE = "charge";

    @Override
    public String ruleId() {
        return "balance.common-cause";
    }

    @Override
    public String description() {
        return "Several imbalanced reactions are explained by one species' formula or charge.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    /** A candidate: this species' declared formula or charge is off by {@code excess}. */
    private record Candidate(String species, SortedMap<String, Rational> excess) {
    }

    @Override
    public List<Finding> check(CheckContext context) {
        Map<String, Map<String, Rational>> net = new LinkedHashMap<>();
        for (ReactionInfo r : context.model().reactions()) {
            ReactionBalance b = context.balance(r.id());
            if (b.reactionClass().balanceComputed() && !b.reactionClass().isPseudo() && !net.containsKey(r.id())) {
                Map<String, Rational> s = netCoefficients(r);
                if (s != null) {
                    net.put(r.id(), s);
                }
            }
        }
        Set<String> open = new TreeSet<>();
        net.keySet().forEach(id -> {
            ReactionBalance b = context.balance(id);
            if (b.elementImbalanced() || (b.elementsComputable() && b.chargeImbalanced())) {
                open.add(id);
            }
        });
        List<Finding> out = new ArrayList<>();
        Set<String> named = new HashSet<>();
        while (true) {
            Map<Candidate, TreeSet<String>> explains = new LinkedHashMap<>();
            for (String id : open) {
                ReactionBalance b = context.balance(id);
                SortedMap<String, Rational> delta = vector(b);
                net.get(id).forEach((species, s) -> {
                    if (!named.contains(species)) {
                        explains.computeIfAbsent(new Candidate(species, divide(delta, s)), k -> new TreeSet<>()).add(id);
                    }
                });
            }
            Candidate best = null;
            List<String> bestAgainst = List.of();
            for (Map.Entry<Candidate, TreeSet<String>> e : explains.entrySet()) {
                if (e.getValue().size() < MIN_REACTIONS) {
                    continue;
                }
                List<String> against = contradicting(context, net, e.getKey());
                if (against.size() >= e.getValue().size()) {
                    continue;
                }
                if (best == null || better(e.getValue().size(), against.size(), e.getKey().species(),
                        explains.get(best).size(), bestAgainst.size(), best.species())) {
                    best = e.getKey();
                    bestAgainst = against;
                }
            }
            if (best == null) {
                return out;
            }
            TreeSet<String> reactions = explains.get(best);
            out.add(finding(context, best, reactions, bestAgainst));
            named.add(best.species());
            open.removeAll(reactions);
        }
    }

    private static boolean better(int n, int against, String species, int bestN, int bestAgainst, String bestSpecies) {
        if (n != bestN) {
            return n > bestN;
        }
        if (against != bestAgainst) {
            return against < bestAgainst;
        }
        return species.compareTo(bestSpecies) < 0;
    }

    /** The element vector, or the charge alone when the elements balance. */
    private static SortedMap<String, Rational> vector(ReactionBalance b) {
        if (b.elementImbalanced()) {
            return b.elements();
        }
        SortedMap<String, Rational> v = new TreeMap<>();
        v.put(CHARGE, b.charge());
        return v;
    }

    private static SortedMap<String, Rational> divide(SortedMap<String, Rational> v, Rational s) {
        SortedMap<String, Rational> out = new TreeMap<>();
        v.forEach((k, x) -> out.put(k, x.divide(s)));
        return out;
    }

    /** Reactions containing the species whose known balance does not fit s·e (balanced ones included). */
    private static List<String> contradicting(CheckContext context, Map<String, Map<String, Rational>> net, Candidate c) {
        boolean chargeOnly = c.excess().containsKey(CHARGE);
        List<String> out = new ArrayList<>();
        net.forEach((id, coefficients) -> {
            Rational s = coefficients.get(c.species());
            if (s == null) {
                return;
            }
            ReactionBalance b = context.balance(id);
            if (chargeOnly) {
                if (b.charge() != null && b.elementsComputable() && !b.elementImbalanced()
                        && !b.charge().equals(c.excess().get(CHARGE).multiply(s))) {
                    out.add(id);
                }
            } else if (b.elementsComputable()) {
                SortedMap<String, Rational> expected = new TreeMap<>();
                c.excess().forEach((k, x) -> expected.put(k, x.multiply(s)));
                if (!expected.equals(b.elements())) {
                    out.add(id);
                }
            }
        });
        return out;
    }

    /** Products minus reactants per species; null when a coefficient is unusable. */
    private static Map<String, Rational> netCoefficients(ReactionInfo r) {
        Map<String, Rational> net = new TreeMap<>();
        for (int side = 0; side < 2; side++) {
            for (Participant p : side == 0 ? r.reactants() : r.products()) {
                Rational c;
                try {
                    c = p.stoichiometryText() == null ? null : Rational.parse(p.stoichiometryText());
                } catch (NumberFormatException | ArithmeticException e) {
                    c = null;
                }
                if (c == null || c.signum() < 0) {
                    return null;
                }
                net.merge(p.species(), side == 0 ? c.negate() : c, Rational::add);
            }
        }
        net.values().removeIf(Rational::isZero);
        return net;
    }

    private Finding finding(CheckContext context, Candidate c, TreeSet<String> reactions, List<String> against) {
        SpeciesInfo s = context.model().species(c.species()).orElse(null);
        SpeciesChemistry chem = context.chemistry(c.species()).orElse(null);
        Map<String, String> data = new TreeMap<>();
        data.put("species", c.species());
        data.put("reactions", String.join(",", reactions));
        data.put("reactionCount", Integer.toString(reactions.size()));
        data.put("contradicting", String.join(",", against));
        c.excess().forEach((k, v) -> data.put("delta." + k, v.toString()));
        boolean chargeOnly = c.excess().containsKey(CHARGE);
        String name = s == null || s.name().equals(c.species()) ? c.species() : s.name() + " (" + c.species() + ")";
        String shortName = s == null || s.name().isBlank() ? c.species() : s.name();
        String declared = "";
        String fix = "";
        if (!chargeOnly && chem != null && chem.formula() != null) {
            data.put("declared", chem.formula().toHillString());
            declared = ", declared as " + data.get("declared") + ",";
            suggested(chem.formula(), c.excess()).ifPresent(f -> data.put("suggested", f));
            fix = data.containsKey("suggested") ? ", so " + data.get("suggested") + " would balance all of them" : "";
        } else if (chargeOnly && chem != null && chem.charge() != null) {
            Rational suggested = chem.charge().subtract(c.excess().get(CHARGE));
            data.put("declaredCharge", chem.charge().toString());
            data.put("suggestedCharge", suggested.toString());
            declared = ", declared as " + Wording.signed(chem.charge()) + ",";
            fix = ", so charge " + Wording.signed(suggested) + " would balance all of them";
        }
        List<String> parts = new ArrayList<>();
        c.excess().forEach((k, v) -> parts.add((k.equals(CHARGE) ? "charge " : k + " ") + Wording.signed(v)));
        String message = "The " + (chargeOnly ? "charge" : "formula") + " of " + name + declared
                + " is the likely common cause of " + Wording.count(reactions.size(), "imbalanced reaction") + " ("
                + Wording.shortList(reactions, 6) + "): each imbalance is the reaction's coefficient of " + shortName
                + " times " + String.join(", ", parts) + fix + (against.isEmpty() ? "" : "; "
                + Wording.count(against.size(), "other reaction") + " with " + shortName + " ("
                + Wording.shortList(against, 3) + ") would then be off") + ".";
        return context.finding(this, c.species(), s == null ? 0 : s.line(), message, data);
    }

    /** The declared formula minus the excess, when every count stays a whole number of zero or more. */
    private static java.util.Optional<String> suggested(Formula declared, SortedMap<String, Rational> excess) {
        if (declared.isPolymer()) {
            return java.util.Optional.empty();
        }
        Formula f = declared;
        for (Map.Entry<String, Rational> e : excess.entrySet()) {
            Rational v = e.getValue();
            if (!v.isInteger() || v.numerator().bitLength() > 31 || declared.count(e.getKey()) < v.numerator().longValue()) {
                return java.util.Optional.empty();
            }
            f = f.plus(e.getKey(), -v.numerator().longValue());
        }
        return java.util.Optional.of(f.toHillString());
    }
}
