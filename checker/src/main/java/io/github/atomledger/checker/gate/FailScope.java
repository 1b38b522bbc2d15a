package io.github.atomledger.checker.gate;

import java.util.Locale;

/** Which findings may fail the build (their severity must still reach the threshold). */
public enum FailScope {
    /** Every finding not accepted in the baseline. */
    FINDINGS,
    /** Only the release diff's findings (changes against the previous release). */
    REGRESSIONS;

    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * Parses "findings" or "regressions", case-insensitively; blank means {@link #FINDINGS}.
     *
     * @throws IllegalArgumentException naming the value and the allowed ones
     */
    public static FailScope parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        if (t.isEmpty()) {
            return FINDINGS;
        }
        for (FailScope s : values()) {
            if (s.label().equals(t)) {
                return s;
            }
        }
        throw new IllegalArgumentException("failOn: unknown value '" + text + "'; allowed: findings, regressions");
    }
}
