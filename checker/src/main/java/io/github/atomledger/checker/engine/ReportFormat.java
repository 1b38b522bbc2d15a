package io.github.atomledger.checker.engine;

import java.util.Arrays;
import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Collectors;

/** The report formats, by their configuration names. */
public enum ReportFormat {
    JSON("json", "report.json"),
    HTML("html", "report.html"),
    JUNIT("junit", "junit"),
    SARIF("sarif", "report.sarif"),
    MARKDOWN("markdown", "summary.md");

    private final String label;
    private final String fileName;

    ReportFormat(String label, String fileName) {
        this.label = label;
        this.fileName = fileName;
    }

    public String label() {
        return label;
    }

    /** The file (or, for JUnit XML, the directory) the format writes inside the report directory. */
    public String fileName() {
        return fileName;
    }

    /**
     * Parses a comma list such as {@code "json,sarif"}; {@code "all"} means every format.
     *
     * @throws IllegalArgumentException naming the bad value and the allowed ones
     */
    public static Set<ReportFormat> parseList(String text) {
        Set<ReportFormat> out = EnumSet.noneOf(ReportFormat.class);
        for (String part : (text == null ? "" : text).split(",")) {
            String p = part.strip().toLowerCase(Locale.ROOT);
            if (p.isEmpty()) {
                continue;
            }
            if (p.equals("all")) {
                out.addAll(EnumSet.allOf(ReportFormat.class));
                continue;
            }
            ReportFormat f = Arrays.stream(values()).filter(v -> v.label.equals(p)).findFirst()
                    .orElseThrow(() -> new IllegalArgumentException("unknown report format '" + part.strip()
                            + "'; allowed: all, " + Arrays.stream(values()).map(ReportFormat::label)
                            .collect(Collectors.joining(", "))));
            out.add(f);
        }
        return out;
    }
}
