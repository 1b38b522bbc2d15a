package io.github.atomledger.atommapper.structure;

/**
 * Thrown when a structure text (SMILES or InChI) cannot be turned into a molecule. The message names
 * the text and what is wrong, for example {@code invalid SMILES 'C1CC': unclosed ring}.
 */
public final class StructureException extends Exception {

    private static final long serialVersionUID = 1L;

    /** A structure problem with a complete, human-readable message. */
    public StructureException(String message) {
        super(message);
    }

    /** A structure problem caused by a lower-level failure (kept as the cause). */
    public StructureException(String message, Throwable cause) {
        super(message, cause);
    }
}
