package io.github.atomledger.checker;

/**
 * The tool or its input is broken: a file that is missing, not XML or not SBML, a bad
 * configuration, or a check that threw. The message names the file, the line or element, and
 * what is wrong. Problems <em>in</em> a model (a bad formula, an unbalanced reaction) are never
 * thrown; they are findings.
 */
public final class AtomLedgerException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public AtomLedgerException(String message) {
        super(message);
    }

    public AtomLedgerException(String message, Throwable cause) {
        super(message, cause);
    }
}
