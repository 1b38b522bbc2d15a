package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.check.balance.ReactionClass;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.List;
import java.util.Objects;

/**
 * One reaction's verdicts: its class, its balance and its findings (sorted).
 *
 * @param reaction the reaction as read
 * @param balance  its balance
 * @param findings findings whose element is this reaction, in {@link Finding#ORDER}
 * @param mapping  its atom map, or null when mapping was not run
 */
public record ReactionResult(ReactionInfo reaction, ReactionBalance balance, List<Finding> findings,
                             ReactionMapping mapping) {

    public ReactionResult {
        Objects.requireNonNull(reaction, "reaction");
        Objects.requireNonNull(balance, "balance");
        findings = findings.stream().sorted(Finding.ORDER).toList();
    }

    public String id() {
        return reaction.id();
    }

    public ReactionClass reactionClass() {
        return balance.reactionClass();
    }
}
