package io.github.atomledger.checker.report;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunResult;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Writes {@code summary.md}, a short GitHub-flavoured Markdown page for CI job summaries: the
 * verdict, one table row per model (reactions, imbalanced reactions, findings by severity), the
 * worst findings (most severe first, then file and line; at most {@link #MAX_FINDINGS}), and the
 * relative path of the HTML report. Table cells are escaped; no timestamps or absolute paths.
 */
public final class MarkdownReporter implements Reporter {

    /** The most findings listed. */
    public static final int MAX_FINDINGS = 15;

    private static final Comparator<Finding> WORST_FIRST =
            Comparator.comparing(Finding::severity).reversed().thenComparing(Finding.ORDER);

    @Override
    public ReportFormat format() {
        return ReportFormat.MARKDOWN;
    }

    @Override
    public Path write(RunResult result, Path directory) throws IOException {
        Path file = directory.resolve(ReportFormat.MARKDOWN.fileName());
        ReportFiles.write(file, toMarkdown(result));
        return file;
    }

    /** The page, exactly the bytes {@link #write} puts in the file. */
    public String toMarkdown(RunResult result) {
        StringBuilder md = new StringBuilder();
        Map<Severity, Integer> counts = result.countsBySeverity();
        boolean failed = !result.failing().isEmpty();
        md.append("## AtomLedger: ").append(failed ? "failed" : "passed").append("\n\n");
        md.append(Wording.count(result.models().size(), "model")).append(", ")
                .append(Wording.count(result.models().stream().mapToInt(m -> m.reactions().size()).sum(), "reaction"))
                .append("; ").append(Wording.count(counts.get(Severity.ERROR), "error")).append(", ")
                .append(Wording.count(counts.get(Severity.WARNING), "warning")).append(", ")
                .append(counts.get(Severity.INFO)).append(" info");
        md.append(result.config().failOn() == null ? " (the build never fails on findings)"
                : " (fails at " + result.config().failOn().label() + ")").append(".\n\n");

        md.append("| model | reactions | balance-checked | element-imbalanced | charge-imbalanced | not computable (elements / charge) | errors | warnings | info |\n");
        md.append("|---|--:|--:|--:|--:|--:|--:|--:|--:|\n");
        List<String> notes = new java.util.ArrayList<>();
        for (ModelResult m : result.models()) {
            List<Finding> all = m.allFindings();
            ModelCounts c = ModelCounts.of(m);
            md.append("| ").append(cell(m.file())).append(" | ").append(m.reactions().size())
                    .append(" | ").append(c.checked())
                    .append(" | ").append(c.elements().imbalanced())
                    .append(" | ").append(c.charge().imbalanced())
                    .append(" | ").append(c.elements().notComputable()).append(" / ").append(c.charge().notComputable())
                    .append(" | ").append(count(all, Severity.ERROR)).append(" | ").append(count(all, Severity.WARNING))
                    .append(" | ").append(count(all, Severity.INFO)).append(" |\n");
            if (!c.whyCharge().isEmpty()) {
                notes.add(cell(m.file()) + ": charge not computable for " + Wording.count(c.charge().notComputable(), "reaction")
                        + " (" + cell(c.whyCharge()) + ").");
            }
            if (!c.whyElements().isEmpty()) {
                notes.add(cell(m.file()) + ": elements not computable for "
                        + Wording.count(c.elements().notComputable(), "reaction") + " (" + cell(c.whyElements()) + ").");
            }
            for (Finding f : all) {
                if (f.ruleId().equals("balance.common-cause")) {
                    notes.add("Likely common cause: " + cell(f.message()));
                }
            }
        }
        if (!notes.isEmpty()) {
            md.append('\n');
            notes.forEach(n -> md.append("- ").append(n).append('\n'));
        }

        List<Finding> worst = result.allFindings().stream().sorted(WORST_FIRST).limit(MAX_FINDINGS).toList();
        int total = result.allFindings().size();
        if (!worst.isEmpty()) {
            md.append("\n### ").append(total > worst.size() ? "Worst " + worst.size() + " of " + total + " findings"
                    : total == 1 ? "Finding" : "Findings").append("\n\n");
            md.append("| severity | rule | element | location | message |\n");
            md.append("|---|---|---|---|---|\n");
            for (Finding f : worst) {
                md.append("| ").append(f.severity().label()).append(" | `").append(code(f.ruleId())).append("` | `")
                        .append(code(f.elementId())).append("` | ")
                        .append(cell(f.modelFile() + (f.line() > 0 ? ":" + f.line() : ""))).append(" | ")
                        .append(cell(f.message())).append(" |\n");
            }
            Map<String, Integer> byRule = new TreeMap<>();
            result.allFindings().forEach(f -> byRule.merge(f.ruleId(), 1, Integer::sum));
            md.append("\nBy rule: ");
            StringBuilder rules = new StringBuilder();
            byRule.forEach((k, v) -> rules.append(rules.length() == 0 ? "" : ", ").append('`').append(code(k))
                    .append("` ").append(v));
            md.append(rules).append(".\n");
        }
        if (result.config().formats().contains(ReportFormat.HTML)) {
            md.append("\nFull report: [").append(cell(htmlPath(result))).append("](")
                    .append(ReportFormat.HTML.fileName()).append(") (beside this summary).\n");
        }
        return md.toString();
    }

    /** The HTML report relative to the project directory, or its bare name when the reports lie elsewhere. */
    static String htmlPath(RunResult result) {
        Path base = result.config().baseDirectory().toAbsolutePath().normalize();
        Path html = result.config().reportDirectory().toAbsolutePath().normalize().resolve(ReportFormat.HTML.fileName());
        return html.startsWith(base) ? base.relativize(html).toString().replace('\\', '/') : ReportFormat.HTML.fileName();
    }

    private static long count(List<Finding> all, Severity s) {
        return all.stream().filter(f -> f.severity() == s).count();
    }

    /** Escapes what would break a table cell or start Markdown/HTML markup. */
    static String cell(String text) {
        StringBuilder sb = new StringBuilder();
        for (char c : text.toCharArray()) {
            switch (c) {
                case '|', '\\', '*', '_', '`', '[', ']', '<', '>', '#' -> sb.append('\\').append(c);
                case '\n', '\r' -> sb.append(' ');
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }

    /** Inside a code span only '|' and backticks matter. */
    static String code(String text) {
        return text.replace("`", "'").replace("|", "\\|");
    }
}
