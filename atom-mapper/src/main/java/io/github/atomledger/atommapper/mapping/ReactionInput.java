package io.github.atomledger.atommapper.mapping;

import java.util.List;
import java.util.Objects;

/**
 * A reaction to map: reactants on the left, products on the right, each list in the order the
 * model gives them (the order decides copy numbering and the order of the mapped SMILES, not the
 * map itself). Lists are copied; nothing may be null.
 */
public record ReactionInput(String reactionId, List<Participant> reactants, List<Participant> products) {

    /** Copies the lists and rejects nulls. */
    public ReactionInput {
        Objects.requireNonNull(reactionId, "reactionId");
        reactants = List.copyOf(reactants);
        products = List.copyOf(products);
    }
}
