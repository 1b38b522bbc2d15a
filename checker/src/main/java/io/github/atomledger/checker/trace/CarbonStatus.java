package io.github.atomledger.checker.trace;

/** How well the maps pin down where a followed carbon ends (the JSON names are the labels). */
public enum CarbonStatus {
    /** One position, up to the symmetry of the species it ends in. */
    DECIDED("decided"),
    /**
     * Several positions that the structures cannot tell apart: a symmetric molecule (the label
     * really spreads, as in succinate), copies of one species, or equivalent branches that an
     * enzyme may tell apart (then a curated map must pin them).
     */
    SPLIT("split"),
    /** A step the carbon passes has no usable map: missing, unmapped, best-found or ambiguous. */
    UNDECIDED("undecided");

    private final String label;

    CarbonStatus(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
