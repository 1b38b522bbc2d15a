package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ModelResult;

/** Balance counts shared by the HTML and Markdown reports; reactions of unchecked classes never count. */
final class ModelCounts {

    private ModelCounts() {
    }

    static long elementImbalanced(ModelResult m) {
        return m.reactions().stream()
                .filter(r -> r.reactionClass().balanceComputed() && r.balance().elementImbalanced()).count();
    }

    static long chargeImbalanced(ModelResult m) {
        return m.reactions().stream()
                .filter(r -> r.reactionClass().balanceComputed() && r.balance().chargeImbalanced()).count();
    }
}
