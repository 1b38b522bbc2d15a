package io.github.atomledger.checker.check.balance;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * {@code balance.exempt}: an exchange, demand or sink reaction (one side open to the outside of
 * the model) is not balance-checked, by design. Reported at info level so that every reaction's
 * verdict is visible. Data: {@code class}, {@code classSource}.
 */
public final class ExemptReactionCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "balance.exempt";
    }

    @Override
    public String description() {
        return "An exchange, demand or sink reaction is exempt from balance checks.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.INFO;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            ReactionBalance b = context.balance(r.id());
            if (b.reactionClass().balanceComputed()) {
                continue;
            }
            Classification c = b.classification();
            out.add(context.finding(this, r.id(), r.line(), "Reaction " + r.id() + " is " + Wording.withArticle(c.reactionClass().label())
                    + " reaction (" + (c.fromSbo() != null ? "SBO term " + r.sboTerm() : c.reason())
                    + ") and is not balance-checked.",
                    Map.of("class", c.reactionClass().label(), "classSource", c.source())));
        }
        return out;
    }
}
