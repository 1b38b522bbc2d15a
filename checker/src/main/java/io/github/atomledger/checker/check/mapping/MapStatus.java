package io.github.atomledger.checker.check.mapping;

/** A reaction's mapping status as reported (the report's machine names are the labels). */
public enum MapStatus {
    /** Proven optimal and unique up to symmetry. */
    MAPPED("mapped"),
    /** Several co-optimal maps send some carbon to different places. */
    AMBIGUOUS("ambiguous"),
    /** The time budget ran out: the best map found, with a proven lower bound. */
    BEST_FOUND("best-found"),
    /** Heavy atoms do not balance, or a coefficient is not an integer. */
    UNMAPPABLE("unmappable"),
    /** A participant has no structure. */
    NO_STRUCTURE("no-structure"),
    /** Not attempted: an exchange, biomass or pseudo-reaction, or a molecule over the size cap. */
    SKIPPED("skipped");

    private final String label;

    MapStatus(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    public static MapStatus fromLabel(String label) {
        for (MapStatus s : values()) {
            if (s.label.equals(label)) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown mapping status '" + label + "'");
    }
}
