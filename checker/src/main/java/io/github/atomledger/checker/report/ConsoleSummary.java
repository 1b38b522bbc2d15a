package io.github.atomledger.checker.report;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.Deltas;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunResult;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The console text of a run: one summary line per model, then one line per reaction with a
 * finding at or above the fail threshold that the release gate lets fail (not accepted in the
 * baseline, within the fail scope), showing its imbalance ({@code R_PFK  C -20  charge ?}).
 * Plain text by default; {@link #lines(RunResult, boolean)} adds ANSI colour (severity counts
 * and reaction ids) for a terminal, and {@link #colourWanted} is the rule for when to ask for it.
 */
public final class ConsoleSummary {

    /** At most this many reaction lines per model; the rest are counted. */
    public static final int MAX_REACTION_LINES = 25;

    private static final String RED = "\u001b[31m";
    private static final String YELLOW = "\u001b[33m";
    private static final String BOLD = "\u001b[1m";
    private static final String RESET = "\u001b[0m";

    private ConsoleSummary() {
    }

    /** The summary as plain text. */
    public static List<String> lines(RunResult result) {
        return lines(result, false);
    }

    /**
     * Colour only on an interactive terminal: a console is attached, the {@code CI} variable is
     * unset, {@code NO_COLOR} is unset (no-color.org convention) and {@code TERM} is not
     * {@code dumb}. Build logs and CI pages therefore stay plain text.
     *
     * @param env        the environment (usually {@code System.getenv()})
     * @param hasConsole whether {@code System.console() != null}
     */
    public static boolean colourWanted(java.util.Map<String, String> env, boolean hasConsole) {
        return hasConsole && !env.containsKey("CI") && !env.containsKey("NO_COLOR") && !"dumb".equals(env.get("TERM"));
    }

    /** The summary, with ANSI colour when {@code colour} is true. */
    public static List<String> lines(RunResult result, boolean colour) {
        List<String> out = new ArrayList<>();
        Severity threshold = result.config().failOn() == null ? Severity.ERROR : result.config().failOn();
        for (ModelResult m : result.models()) {
            out.add(colour ? paintCounts(modelLine(m)) : modelLine(m));
            if (m.mapping().enabled()) {
                out.add("  " + mappingLine(m));
                example(m).ifPresent(out::add);
            }
            out.addAll(TraceConsole.lines(result, m, threshold));
            int shown = 0;
            int hidden = 0;
            for (ReactionResult r : m.reactions()) {
                List<Finding> bad = r.findings().stream().filter(f -> f.severity().atLeast(threshold))
                        .filter(result.gate()::mayFail).toList();
                if (bad.isEmpty()) {
                    continue;
                }
                if (shown++ >= MAX_REACTION_LINES) {
                    hidden++;
                    continue;
                }
                String line = reactionLine(r, bad);
                out.add("  " + (colour ? BOLD + r.id() + RESET + line.substring(r.id().length()) : line));
            }
            if (hidden > 0) {
                out.add("  ... and " + hidden + " more reaction(s); see the report");
            }
            for (Finding f : m.modelFindings()) {
                // Trace findings are shown under their pathway (TraceConsole).
                if (f.severity().atLeast(threshold) && result.gate().mayFail(f) && !TraceConsole.isTrace(f)) {
                    out.add("  " + f.elementId() + "  [" + f.ruleId() + "] " + f.message());
                }
            }
        }
        return out;
    }

    private static String paintCounts(String line) {
        return line.replaceFirst("; ([1-9][0-9]*) errors", "; " + RED + "$1 errors" + RESET)
                .replaceFirst(", ([1-9][0-9]*) warnings", ", " + YELLOW + "$1 warnings" + RESET);
    }

    static String modelLine(ModelResult m) {
        Map<String, Integer> classes = new TreeMap<>();
        m.reactions().forEach(r -> classes.merge(r.reactionClass().label(), 1, Integer::sum));
        long elements = m.reactions().stream().filter(r -> r.balance().elementImbalanced()
                && r.balance().reactionClass().balanceComputed()).count();
        long charge = m.reactions().stream().filter(r -> r.balance().chargeImbalanced()
                && r.balance().reactionClass().balanceComputed()).count();
        long unknown = m.reactions().stream().filter(r -> r.balance().reactionClass().balanceComputed()
                && !r.balance().elementsComputable()).count();
        List<Finding> all = m.allFindings();
        StringBuilder classText = new StringBuilder();
        classes.forEach((k, v) -> classText.append(classText.length() == 0 ? "" : ", ").append(v).append(' ').append(k));
        return m.file() + ": " + m.reactions().size() + " reactions (" + classText + "); "
                + elements + " element-imbalanced, " + charge + " charge-imbalanced, " + unknown + " not computable; "
                + count(all, Severity.ERROR) + " errors, " + count(all, Severity.WARNING) + " warnings, "
                + count(all, Severity.INFO) + " info";
    }

    static String mappingLine(ModelResult m) {
        Map<String, Integer> statuses = new TreeMap<>();
        m.reactions().forEach(r -> {
            if (r.mapping() != null) {
                statuses.merge(r.mapping().status().label(), 1, Integer::sum);
            }
        });
        StringBuilder sb = new StringBuilder("atom maps:");
        statuses.forEach((k, v) -> sb.append(sb.length() > 10 ? ", " : " ").append(v).append(' ').append(k));
        return sb.toString();
    }

    /**
     * A short, telling example: the proven map with at least two substrate molecules feeding
     * carbons and the fewest carbons (a carboxylation, say); first in document order on ties.
     */
    static java.util.Optional<String> example(ModelResult m) {
        ReactionResult best = null;
        for (ReactionResult r : m.reactions()) {
            if (r.mapping() == null || r.mapping().status() != io.github.atomledger.checker.check.mapping.MapStatus.MAPPED) {
                continue;
            }
            long sources = r.mapping().carbons().stream().map(t -> t.from().species() + "#" + t.from().copy()).distinct().count();
            if (sources >= 2 && (best == null || r.mapping().carbons().size() < best.mapping().carbons().size())) {
                best = r;
            }
        }
        if (best == null) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of("  example " + best.id() + " carbons: "
                + String.join("; ", io.github.atomledger.checker.transitions.CarbonMapText.format(best.mapping().carbons(),
                m.mapping().structures()::label)));
    }

    static String reactionLine(ReactionResult r, List<Finding> bad) {
        ReactionBalance b = r.balance();
        StringBuilder sb = new StringBuilder(r.id());
        if (b.elementsComputable()) {
            b.elements().forEach((symbol, n) -> sb.append("  ").append(symbol).append(' ').append(Deltas.signed(n)));
        } else {
            sb.append("  elements ?");
        }
        sb.append("  charge ").append(b.charge() == null ? "?" : Deltas.signed(b.charge()));
        sb.append("  [").append(String.join(", ", bad.stream().map(Finding::ruleId).distinct().toList())).append(']');
        return sb.toString();
    }

    private static long count(List<Finding> all, Severity s) {
        return all.stream().filter(f -> f.severity() == s).count();
    }
}
