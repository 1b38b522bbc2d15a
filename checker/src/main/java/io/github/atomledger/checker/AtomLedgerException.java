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

    private static final java.util.regex.Pattern JAVA_CLASS = java.util.regex.Pattern.compile(
            "\\b(?:[a-z][a-z0-9_]*\\.)+[A-Z][A-Za-z0-9_$]*\\b:?\\s*");

    /**
     * What went wrong inside a library, for a message people read: the throwable's own message
     * with Java class names taken out, or "an internal error" when it has none (the stack trace
     * with {@code mvn -e} still has the details).
     */
    public static String reason(Throwable t) {
        String m = t == null ? null : t.getMessage();
        if (m == null || m.isBlank()) {
            return "an internal error";
        }
        String cleaned = JAVA_CLASS.matcher(m.replaceAll("\\s*\\R\\s*", " ")).replaceAll("").strip();
        return cleaned.isEmpty() ? "an internal error" : cleaned;
    }
}
