package io.github.atomledger.atommapper.mapping;

import java.util.Objects;

/**
 * A reactant atom and the product atom it becomes, with their (shared) element symbol.
 * Ordered by {@code from}, then {@code to}.
 */
public record AtomTransition(AtomRef from, AtomRef to, String element) implements Comparable<AtomTransition> {

    /** Rejects nulls. */
    public AtomTransition {
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        Objects.requireNonNull(element, "element");
    }

    @Override
    public int compareTo(AtomTransition o) {
        int c = from.compareTo(o.from);
        return c != 0 ? c : to.compareTo(o.to);
    }
}
