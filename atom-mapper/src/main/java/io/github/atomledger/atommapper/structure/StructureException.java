package io.github.atomledger.atommapper.structure;

/**
 * Thrown when a structure text (SMILES, InChI, an MDL molfile or RXN file) cannot be turned into a
 * molecule. The message names the text and what is wrong, for example
 * {@code invalid SMILES 'C1CC': unclosed ring}; for line-based formats {@link #line()} says where.
 */
public final class StructureException extends Exception {

    private static final long serialVersionUID = 1L;

    private final int line;

    /** A structure problem with a complete, human-readable message. */
    public StructureException(String message) {
        this(message, 0, null);
    }

    /** A structure problem caused by a lower-level failure (kept as the cause). */
    public StructureException(String message, Throwable cause) {
        this(message, 0, cause);
    }

    /**
     * A problem at a line of a line-based text.
     *
     * @param line 1-based line within the text that was read, 0 when unknown
     */
    public StructureException(String message, int line, Throwable cause) {
        super(message, cause);
        this.line = Math.max(0, line);
    }

    /** The 1-based line of the text where the problem was found, 0 when unknown or not line-based. */
    public int line() {
        return line;
    }
}
