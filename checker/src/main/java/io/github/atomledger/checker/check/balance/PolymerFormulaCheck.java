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
 * {@code balance.polymer}: a participant has an fbc version 3 polymer formula {@code (...)n}, so
 * the reaction cannot be balanced exactly; AtomLedger does not guess {@code n}. Data: {@code class},
 * {@code polymerSpecies}.
 */
public final class PolymerFormulaCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "balance.polymer";
    }

    @Override
    public String description() {
        return "A reaction involves a (...)n polymer formula and cannot be balanced exactly.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            ReactionBalance b = context.balance(r.id());
            if (!b.reactionClass().balanceComputed() || b.polymer().isEmpty()) {
                continue;
            }
            out.add(context.finding(this, r.id(), r.line(), "Reaction " + r.id()
                    + " cannot be balanced exactly: " + String.join(", ", b.polymer())
                    + " has a repeating-unit formula (...)n.",
                    Map.of("class", b.reactionClass().label(), "polymerSpecies", String.join(",", b.polymer()))));
        }
        return out;
    }
}
