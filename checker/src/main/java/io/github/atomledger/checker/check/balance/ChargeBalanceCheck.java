package io.github.atomledger.checker.check.balance;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * {@code balance.charge}: the net charge (products − reactants) is known and not zero. Exact, so
 * fractional fbc version 3 charges compare without tolerance. Data: {@code class},
 * {@code delta.charge}.
 */
public final class ChargeBalanceCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "balance.charge";
    }

    @Override
    public String description() {
        return "A reaction's charges (products minus reactants) do not sum to zero.";
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
            if (!b.reactionClass().balanceComputed() || !b.chargeImbalanced()) {
                continue;
            }
            String delta = Deltas.signed(b.charge());
            out.add(context.finding(this, r.id(), r.line(), "Reaction " + r.id() + " (" + b.reactionClass().label()
                    + ") is not charge-balanced: charge " + delta + " (products minus reactants).",
                    Map.of("class", b.reactionClass().label(), "delta.charge", b.charge().toString())));
        }
        return out;
    }
}
