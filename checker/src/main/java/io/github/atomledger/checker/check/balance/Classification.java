package io.github.atomledger.checker.check.balance;

import java.util.Objects;

/**
 * The class of one reaction and how it was decided.
 *
 * @param reactionClass the class used for the balance checks
 * @param fromSbo       the class the SBO term says, or null when the term says nothing
 * @param fromStructure the class read from the participants alone
 * @param reason        one phrase on how the structural class was decided
 */
public record Classification(ReactionClass reactionClass, ReactionClass fromSbo, ReactionClass fromStructure,
                             String reason) {

    public Classification {
        Objects.requireNonNull(reactionClass, "reactionClass");
        Objects.requireNonNull(fromStructure, "fromStructure");
        Objects.requireNonNull(reason, "reason");
    }

    /** "sbo" when the SBO term decided, "structure" otherwise. */
    public String source() {
        return fromSbo != null ? "sbo" : "structure";
    }
}
