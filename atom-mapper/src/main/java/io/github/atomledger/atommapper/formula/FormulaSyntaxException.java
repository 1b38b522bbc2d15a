package io.github.atomledger.atommapper.formula;

/**
 * Thrown when a chemical formula text does not follow the SBML fbc grammar. Carries the text, the
 * 0-based character position of the problem and a short reason, so callers can build a finding
 * that names the offending text.
 */
public final class FormulaSyntaxException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String text;
    private final int position;
    private final String reason;

    public FormulaSyntaxException(String text, int position, String reason) {
        super("invalid formula '" + text + "' at position " + (position + 1) + ": " + reason);
        this.text = text;
        this.position = position;
        this.reason = reason;
    }

    /** The formula text as given. */
    public String text() {
        return text;
    }

    /** The 0-based character position where parsing failed. */
    public int position() {
        return position;
    }

    /** Why the text is not a formula, without the text itself. */
    public String reason() {
        return reason;
    }
}
