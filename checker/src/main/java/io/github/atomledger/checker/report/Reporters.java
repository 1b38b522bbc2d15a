package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.engine.RunResult;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;

/** Writes the selected report formats, in a fixed order. */
public final class Reporters {

    private static final Map<ReportFormat, Supplier<Reporter>> ALL = new EnumMap<>(ReportFormat.class);

    static {
        ALL.put(ReportFormat.JSON, JsonReporter::new);
        ALL.put(ReportFormat.HTML, () -> new HtmlReporter(MappingSource.FROM_ENGINE));
        ALL.put(ReportFormat.JUNIT, JunitReporter::new);
        ALL.put(ReportFormat.SARIF, SarifReporter::new);
        ALL.put(ReportFormat.MARKDOWN, MarkdownReporter::new);
    }

    private final List<Reporter> reporters;

    private Reporters(List<Reporter> reporters) {
        this.reporters = List.copyOf(reporters);
    }

    /**
     * The reporters for these formats.
     *
     * @throws IllegalArgumentException for a format this build cannot write yet
     */
    public static Reporters forFormats(Set<ReportFormat> formats) {
        return forFormats(formats, MappingSource.FROM_ENGINE);
    }

    /**
     * The reporters for these formats; the HTML report draws the atom maps {@code mappings} gives.
     *
     * @throws IllegalArgumentException for a format this build cannot write yet
     */
    public static Reporters forFormats(Set<ReportFormat> formats, MappingSource mappings) {
        List<Reporter> list = new ArrayList<>();
        for (ReportFormat f : ReportFormat.values()) {
            if (!formats.contains(f)) {
                continue;
            }
            Supplier<Reporter> s = ALL.get(f);
            if (s == null) {
                throw new IllegalArgumentException("report format '" + f.label() + "' is not available in this version");
            }
            list.add(f == ReportFormat.HTML ? new HtmlReporter(mappings) : s.get());
            if (f == ReportFormat.JSON) {
                // The traces' machine files travel with the JSON report (written only when something was traced).
                list.add(new TracesReporter());
                list.add(new ReachReporter());
            }
        }
        return new Reporters(list);
    }

    /** Writes every report; returns the paths written, in format order (reports with nothing to say write nothing). */
    public List<Path> write(RunResult result, Path directory) throws IOException {
        List<Path> out = new ArrayList<>();
        for (Reporter r : reporters) {
            Path p = r.write(result, directory);
            if (p != null) {
                out.add(p);
            }
        }
        return out;
    }

    /** The formats that this build can write. */
    public static Set<ReportFormat> available() {
        return Set.copyOf(ALL.keySet());
    }
}
