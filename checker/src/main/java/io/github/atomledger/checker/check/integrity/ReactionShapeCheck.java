package io.github.atomledger.checker.check.integrity;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * {@code model.reaction-shape}: a reaction with no participants at all, or a reaction whose net
 * stoichiometry (species to exact net coefficient) equals an earlier reaction's, or its exact
 * reverse (a duplicate). Also reports a model with no reactions. Data: {@code problem}
 * ("empty", "duplicate", "reverse-duplicate", "no-reactions"), {@code duplicateOf}.
 */
public final class ReactionShapeCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "model.reaction-shape";
    }

    @Override
    public String description() {
        return "A reaction has no participants or duplicates another reaction, or the model has no reactions.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        if (context.model().reactions().isEmpty()) {
            String id = context.model().modelId();
            out.add(context.finding(this, id, 0, "The model " + (id.isEmpty() ? "" : id + " ")
                    + "has no reactions, so nothing is checked.", Map.of("problem", "no-reactions")));
        }
        Map<SortedMap<String, Rational>, String> seen = new HashMap<>();
        for (ReactionInfo r : context.model().reactions()) {
            if (r.reactants().isEmpty() && r.products().isEmpty()) {
                out.add(context.finding(this, r.id(), r.line(), "Reaction " + r.id() + " has no reactants and no products.",
                        Map.of("problem", "empty")));
                continue;
            }
            SortedMap<String, Rational> net = net(r);
            if (net == null || net.isEmpty()) {
                continue;
            }
            String first = seen.get(net);
            String reverse = first == null ? seen.get(negate(net)) : null;
            if (first != null) {
                out.add(context.finding(this, r.id(), r.line(), "Reaction " + r.id()
                        + " has the same net stoichiometry as reaction " + first + ".",
                        Map.of("problem", "duplicate", "duplicateOf", first)));
            } else if (reverse != null) {
                out.add(context.finding(this, r.id(), r.line(), "Reaction " + r.id()
                        + " is the exact reverse of reaction " + reverse
                        + " (intended only when they are different enzymes).",
                        Map.of("problem", "reverse-duplicate", "duplicateOf", reverse)));
            } else {
                seen.put(net, r.id());
            }
        }
        return out;
    }

    private static SortedMap<String, Rational> net(ReactionInfo r) {
        SortedMap<String, Rational> m = new TreeMap<>();
        try {
            for (Participant p : r.reactants()) {
                m.merge(p.species(), parse(p).negate(), Rational::add);
            }
            for (Participant p : r.products()) {
                m.merge(p.species(), parse(p), Rational::add);
            }
        } catch (NumberFormatException e) {
            return null;
        }
        m.values().removeIf(Rational::isZero);
        return m;
    }

    private static Rational parse(Participant p) {
        if (p.stoichiometryText() == null) {
            throw new NumberFormatException("unset");
        }
        return Rational.parse(p.stoichiometryText());
    }

    private static SortedMap<String, Rational> negate(SortedMap<String, Rational> m) {
        SortedMap<String, Rational> n = new TreeMap<>();
        m.forEach((k, v) -> n.put(k, v.negate()));
        return n;
    }
}
