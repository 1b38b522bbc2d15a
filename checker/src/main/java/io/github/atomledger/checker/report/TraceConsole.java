package io.github.atomledger.checker.report;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.trace.LabelReach;
import io.github.atomledger.checker.trace.PathwayTrace;
import io.github.atomledger.checker.trace.PositionText;

import java.util.ArrayList;
import java.util.List;

/**
 * Console lines of a model's traces: one per pathway with its fate counts, under it the failing
 * declared fates (the {@code trace.*} findings at or above the fail threshold that the gate lets
 * fail), and one line per label source.
 */
final class TraceConsole {

    private TraceConsole() {
    }

    static List<String> lines(RunResult result, ModelResult m, Severity threshold) {
        List<String> out = new ArrayList<>();
        for (PathwayTrace t : m.traces().pathways()) {
            out.add("  pathway " + t.pathway().name() + ": " + TraceSummary.line(m.model(), m.traces(), t));
            for (Finding f : failing(result, m, threshold)) {
                if (t.pathway().name().equals(f.data().get("pathway"))) {
                    out.add("    [" + f.ruleId() + "] " + f.message());
                }
            }
        }
        for (LabelReach r : m.traces().reach()) {
            long species = r.reached().stream().map(x -> x.position().species()).distinct().count();
            int furthest = r.reached().stream().mapToInt(x -> x.chain().size()).max().orElse(0);
            out.add("  label from " + PositionText.of(m.mapping().structures(), List.of(r.source())) + " can reach "
                    + r.reached().size() + " positions in " + species + " species (at most " + furthest + " steps away)");
        }
        return out;
    }

    /** The trace findings that fail the run; the console shows them under their pathway. */
    static List<Finding> failing(RunResult result, ModelResult m, Severity threshold) {
        return m.modelFindings().stream().filter(TraceConsole::isTrace).filter(f -> f.severity().atLeast(threshold))
                .filter(result.gate()::mayFail).toList();
    }

    static boolean isTrace(Finding f) {
        return f.ruleId().startsWith("trace.");
    }
}
