package io.github.atomledger.checker.check;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/** How serious a finding is. Ordered: the fail threshold compares by ordinal. */
public enum Severity {
    INFO, WARNING, ERROR;

    /** The lower-case name used in configuration and reports ("info", "warning", "error"). */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    public boolean atLeast(Severity other) {
        return ordinal() >= other.ordinal();
    }

    /**
     * Parses a configuration value, case-insensitively.
     *
     * @throws IllegalArgumentException naming the value and the allowed ones
     */
    public static Severity parse(String text) {
        for (Severity s : values()) {
            if (s.name().equalsIgnoreCase(text == null ? "" : text.strip())) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown severity '" + text + "'; allowed: "
                + Arrays.stream(values()).map(Severity::label).collect(Collectors.joining(", ")));
    }
}
