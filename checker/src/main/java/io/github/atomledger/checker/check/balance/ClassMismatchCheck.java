package io.github.atomledger.checker.check.balance;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * {@code balance.class-mismatch}: the SBO term says one kind of reaction and the participants
 * say another in a way that changes how it is checked — a one-sided class (exchange, demand,
 * sink) on a two-sided reaction or the reverse, or a transport term on a reaction in which no
 * chemical changes compartment. The SBO class is used for the checks. Data: {@code sboClass},
 * {@code structureClass}, {@code sboTerm}.
 */
public final class ClassMismatchCheck implements ModelCheck {

    private static final Set<ReactionClass> OPEN = Set.of(ReactionClass.EXCHANGE, ReactionClass.DEMAND, ReactionClass.SINK);

    @Override
    public String ruleId() {
        return "balance.class-mismatch";
    }

    @Override
    public String description() {
        return "A reaction's SBO term and its participants disagree about what kind of reaction it is.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            Classification c = context.balance(r.id()).classification();
            if (c.fromSbo() == null || !conflicts(c.fromSbo(), c.fromStructure())) {
                continue;
            }
            out.add(context.finding(this, r.id(), r.line(), "Reaction " + r.id() + " has SBO term " + r.sboTerm()
                    + " (" + c.fromSbo().label() + ") but its participants make it " + c.fromStructure().label()
                    + " (" + c.reason() + ").",
                    Map.of("sboClass", c.fromSbo().label(), "structureClass", c.fromStructure().label(),
                            "sboTerm", r.sboTerm())));
        }
        return out;
    }

    static boolean conflicts(ReactionClass sbo, ReactionClass structure) {
        if (OPEN.contains(sbo) != OPEN.contains(structure)) {
            return true;
        }
        return sbo == ReactionClass.TRANSPORT && structure == ReactionClass.INTERNAL;
    }
}
