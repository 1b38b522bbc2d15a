package io.github.atomledger.atommapper.mapping;

/** How a mapping attempt ended. {@link #label()} is the stable machine name. */
public enum MappingStatus {
    /** Proven optimal, and every co-optimal map sends the carbons to the same places up to symmetry. */
    MAPPED("mapped"),
    /** Proven optimal, but co-optimal maps send some carbon to different places; see alternatives. */
    AMBIGUOUS("ambiguous"),
    /** The budget ran out: the best map found and a proven lower bound, not proven optimal. */
    BEST_FOUND("best-found"),
    /** Heavy atoms do not balance (or a coefficient is not an integer): no bijection exists. */
    UNMAPPABLE("unmappable"),
    /** A side has more heavy atoms than the configured cap; not attempted. */
    TOO_LARGE("too-large");

    private final String label;

    MappingStatus(String label) {
        this.label = label;
    }

    /** The stable lower-case name, e.g. "best-found". */
    public String label() {
        return label;
    }
}
