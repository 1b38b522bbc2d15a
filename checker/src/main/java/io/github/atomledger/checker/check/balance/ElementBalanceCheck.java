package io.github.atomledger.checker.check.balance;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * {@code balance.elements}: the net element vector (products − reactants) of a reaction is not
 * zero. Pseudo-elements (R, X, ...) count like elements. Data: {@code class}, {@code delta.<symbol>}
 * for each non-zero entry, {@code delta.charge} when the charge is known, and {@code fix.*}
 * when protons and water alone repair it.
 */
public final class ElementBalanceCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "balance.elements";
    }

    @Override
    public String description() {
        return "A reaction's elements (products minus reactants, weighted by stoichiometry) do not sum to zero.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.ERROR;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            ReactionBalance b = context.balance(r.id());
            if (!b.reactionClass().balanceComputed() || !b.elementImbalanced()) {
                continue;
            }
            Map<String, String> data = new TreeMap<>();
            data.put("class", b.reactionClass().label());
            for (Map.Entry<String, Rational> e : b.elements().entrySet()) {
                data.put("delta." + e.getKey(), e.getValue().toString());
            }
            if (b.charge() != null) {
                data.put("delta.charge", b.charge().toString());
            }
            Optional<FixHint> hint = FixHint.of(context.model(), r, b, context.chemistryById());
            hint.ifPresent(h -> data.putAll(h.toData()));
            String message = "Reaction " + r.id() + " (" + b.reactionClass().label() + ") is not element-balanced: "
                    + Deltas.format(b.elements()) + " (products minus reactants)"
                    + hint.map(h -> "; " + h.describe() + " balances it").orElse("") + ".";
            out.add(context.finding(this, r.id(), r.line(), message, data));
        }
        return out;
    }
}
