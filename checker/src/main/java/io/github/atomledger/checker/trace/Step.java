package io.github.atomledger.checker.trace;

import java.util.Objects;

/**
 * One step of a pathway: a reaction, run forwards or (written with a leading {@code -})
 * backwards, so that its products are consumed and its reactants made.
 *
 * @param reactionId the reaction's SBML id
 * @param backwards  true to run it from products to reactants
 */
public record Step(String reactionId, boolean backwards) {

    public Step {
        Objects.requireNonNull(reactionId, "reactionId");
        if (reactionId.isEmpty()) {
            throw new IllegalArgumentException("empty reaction id");
        }
    }

    /** Reads {@code R_X} or {@code -R_X}. */
    public static Step parse(String token) {
        return token.startsWith("-") ? new Step(token.substring(1), true) : new Step(token, false);
    }

    /** The step as written: the reaction id, with {@code -} in front when run backwards. */
    public String text() {
        return backwards ? "-" + reactionId : reactionId;
    }

    @Override
    public String toString() {
        return text();
    }
}
