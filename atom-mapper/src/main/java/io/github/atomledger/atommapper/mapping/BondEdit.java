package io.github.atomledger.atommapper.mapping;

import java.util.Comparator;
import java.util.Objects;

/**
 * One bond change implied by a map. Atoms are named on both sides: {@code reactantA/B} are the
 * reactant atoms whose pair changes and {@code productA/B} their images. Bond codes are 0 (none),
 * 1, 2, 3 and 4 (aromatic). Ordered by kind, then reactant atoms.
 *
 * @param kind what happened to the pair
 * @param reactantA first reactant atom (the smaller of the two)
 * @param reactantB second reactant atom
 * @param productA image of {@code reactantA}
 * @param productB image of {@code reactantB}
 * @param oldOrder bond code among the reactants (0 for {@link Kind#FORMED})
 * @param newOrder bond code among the products (0 for {@link Kind#BROKEN})
 * @param weight the cost of this edit under the options used
 */
public record BondEdit(Kind kind, AtomRef reactantA, AtomRef reactantB, AtomRef productA, AtomRef productB,
                       int oldOrder, int newOrder, int weight) implements Comparable<BondEdit> {

    /** The kind of bond change. */
    public enum Kind { BROKEN, FORMED, ORDER_CHANGED }

    private static final Comparator<BondEdit> ORDER = Comparator.comparing(BondEdit::kind)
            .thenComparing(BondEdit::reactantA).thenComparing(BondEdit::reactantB);

    /** Rejects nulls. */
    public BondEdit {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(reactantA, "reactantA");
        Objects.requireNonNull(reactantB, "reactantB");
        Objects.requireNonNull(productA, "productA");
        Objects.requireNonNull(productB, "productB");
    }

    @Override
    public int compareTo(BondEdit o) {
        return ORDER.compare(this, o);
    }
}
