package io.github.atomledger.checker.report;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.engine.BaselineStatus;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.model.SpeciesInfo;
import io.github.atomledger.checker.transitions.CarbonMapText;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * The console text of a run, each line with the level it is logged at. Per model: an
 * {@code INFO} line with the reaction classes and finding counts, the balance counts
 * ({@link ModelCounts}: how many reactions were checked and why some were not), the atom-map
 * statuses and an example map; then the likely common causes, then what fails the build at
 * {@code ERROR}, then the other warnings at {@code WARNING}, grouped by rule. Each group shows at
 * most {@link #MAX_PER_FAILING_RULE} (failing) or {@link #MAX_PER_WARNING_RULE} (other) lines and
 * ends with "and N more (see report)". Each line names the element, its name and
 * {@code file:line}, and says the reason in words. Info findings are counted, not listed.
 *
 * <p>Plain text by default; {@link #lines(RunResult, boolean)} adds ANSI colour for a terminal,
 * and {@link #colourWanted} is the rule for when to ask for it.
 */
public final class ConsoleSummary {

    /** At most this many lines per failing rule and model; the rest are counted. */
    public static final int MAX_PER_FAILING_RULE = 10;

    /** At most this many lines per warning rule that does not fail the build. */
    public static final int MAX_PER_WARNING_RULE = 3;

    private static final String RED = "\u001b[31m";
    private static final String YELLOW = "\u001b[33m";
    private static final String BOLD = "\u001b[1m";
    private static final String RESET = "\u001b[0m";

    /** The level a line is logged at. */
    public enum Level { INFO, WARNING, ERROR }

    /** One line of the summary. */
    public record Line(Level level, String text) {
    }

    private ConsoleSummary() {
    }

    /** The summary as plain text, levels dropped. */
    public static List<String> lines(RunResult result) {
        return lines(result, false);
    }

    /** The summary text, with ANSI colour when {@code colour} is true, levels dropped. */
    public static List<String> lines(RunResult result, boolean colour) {
        return report(result, colour).stream().map(Line::text).toList();
    }

    /**
     * Colour only on an interactive terminal: a console is attached, the {@code CI} variable is
     * unset, {@code NO_COLOR} is unset (no-color.org convention) and {@code TERM} is not
     * {@code dumb}. Build logs and CI pages therefore stay plain text.
     *
     * @param env        the environment (usually {@code System.getenv()})
     * @param hasConsole whether {@code System.console() != null}
     */
    public static boolean colourWanted(Map<String, String> env, boolean hasConsole) {
        return hasConsole && !env.containsKey("CI") && !env.containsKey("NO_COLOR") && !"dumb".equals(env.get("TERM"));
    }

    /** The summary with a level per line; ANSI colour when {@code colour} is true. */
    public static List<Line> report(RunResult result, boolean colour) {
        List<Line> out = new ArrayList<>();
        for (ModelResult m : result.models()) {
            out.add(new Line(Level.INFO, colour ? paintCounts(modelLine(m)) : modelLine(m)));
            out.add(new Line(Level.INFO, "  " + ModelCounts.of(m).balanceLine()));
            if (m.mapping().enabled()) {
                out.add(new Line(Level.INFO, "  " + mappingLine(m)));
                example(m).ifPresent(e -> out.add(new Line(Level.INFO, e)));
            }
            // Pathway traces (their failing fates under the pathway, at ERROR).
            for (String t : TraceConsole.lines(result, m, Families.threshold(result))) {
                out.add(new Line(t.startsWith("    [") ? Level.ERROR : Level.INFO, t));
            }
            findings(result, m, colour, out);
        }
        return out;
    }

    private static void findings(RunResult result, ModelResult m, boolean colour, List<Line> out) {
        Severity threshold = Families.threshold(result);
        List<Finding> all = m.allFindings();
        Map<String, String> explained = FindingWords.explainedBy(all, m);
        Map<String, List<Finding>> failing = new LinkedHashMap<>();
        Map<String, List<Finding>> warnings = new TreeMap<>();
        List<Finding> causes = new ArrayList<>();
        int accepted = 0;
        int tracesFailing = 0; // listed under their pathway by TraceConsole
        for (Finding f : all) {
            boolean fails = result.config().failOn() != null && f.severity().atLeast(threshold) && result.gate().mayFail(f);
            if (!fails && result.gate().status(f).filter(s -> s == BaselineStatus.ACCEPTED).isPresent()) {
                accepted++;
            } else if (f.ruleId().equals("balance.common-cause")) {
                causes.add(f);
            } else if (fails && TraceConsole.isTrace(f)) {
                tracesFailing++;
            } else if (fails) {
                failing.computeIfAbsent(f.ruleId(), k -> new ArrayList<>()).add(f);
            } else if (f.severity() != Severity.INFO) {
                warnings.computeIfAbsent(f.ruleId(), k -> new ArrayList<>()).add(f);
            }
        }
        if (!causes.isEmpty()) {
            boolean fails = causes.stream().anyMatch(f -> result.config().failOn() != null
                    && f.severity().atLeast(threshold) && result.gate().mayFail(f));
            group("balance.common-cause", causes, m, Map.of(), MAX_PER_FAILING_RULE, fails ? Level.ERROR : Level.WARNING,
                    colour, out);
        }
        int failingCount = failing.values().stream().mapToInt(List::size).sum() + tracesFailing;
        if (failingCount > 0) {
            out.add(new Line(Level.ERROR, "  " + (threshold == Severity.ERROR ? Wording.count(failingCount, "error")
                    : Wording.count(failingCount, "finding") + " at " + threshold.label() + " or above") + " "
                    + (failingCount == 1 ? "fails" : "fail") + " the build:"));
            new TreeMap<>(failing).forEach((rule, list) -> group(rule, list, m, explained, MAX_PER_FAILING_RULE,
                    Level.ERROR, colour, out));
        }
        warnings.forEach((rule, list) -> group(rule, list, m, explained, MAX_PER_WARNING_RULE, Level.WARNING, colour, out));
        if (accepted > 0) {
            out.add(new Line(Level.INFO, "  " + Wording.count(accepted, "finding") + " accepted by the baseline (see report)"));
        }
    }

    private static void group(String rule, List<Finding> list, ModelResult m, Map<String, String> explained, int max,
                              Level level, boolean colour, List<Line> out) {
        String about = FindingWords.description(rule).map(d -> ": " + lowerFirst(d)).orElse("");
        out.add(new Line(level, "  " + rule + " (" + list.size() + ")" + about));
        for (int i = 0; i < Math.min(max, list.size()); i++) {
            Finding f = list.get(i);
            String subject = FindingWords.subject(f, m);
            if (colour) {
                subject = subject.replaceFirst("^(\\S+)", BOLD + "$1" + RESET);
            }
            String cause = explained.containsKey(f.elementId()) && f.ruleId().startsWith("balance.")
                    ? " (likely cause: " + explained.get(f.elementId()) + ")" : "";
            out.add(new Line(level, "    " + subject + ": " + FindingWords.reason(f) + FindingWords.unknownElements(f, m) + cause));
        }
        if (list.size() > max) {
            out.add(new Line(level, "    and " + (list.size() - max) + " more (see report)"));
        }
    }

    private static String lowerFirst(String s) {
        String t = s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
        return t.isEmpty() ? t : Character.toLowerCase(t.charAt(0)) + t.substring(1);
    }

    private static String paintCounts(String line) {
        return line.replaceFirst("; ([1-9][0-9]*) (errors?)", "; " + RED + "$1 $2" + RESET)
                .replaceFirst(", ([1-9][0-9]*) (warnings?)", ", " + YELLOW + "$1 $2" + RESET);
    }

    /** {@code models/m.xml: 43 reactions (1 ATP maintenance, ...); 0 errors, 1 warning, 11 info}. */
    static String modelLine(ModelResult m) {
        Map<String, Integer> classes = new TreeMap<>();
        m.reactions().forEach(r -> classes.merge(r.reactionClass().label(), 1, Integer::sum));
        List<Finding> all = m.allFindings();
        List<String> classText = new ArrayList<>();
        classes.forEach((k, v) -> classText.add(v + " " + k));
        return m.file() + ": " + Wording.count(m.reactions().size(), "reaction") + " (" + String.join(", ", classText)
                + "); " + Wording.count(count(all, Severity.ERROR), "error") + ", "
                + Wording.count(count(all, Severity.WARNING), "warning") + ", " + count(all, Severity.INFO) + " info";
    }

    static String mappingLine(ModelResult m) {
        Map<String, Integer> statuses = new TreeMap<>();
        m.reactions().forEach(r -> {
            if (r.mapping() != null) {
                statuses.merge(r.mapping().status().label(), 1, Integer::sum);
            }
        });
        List<String> parts = new ArrayList<>();
        statuses.forEach((k, v) -> parts.add(v + " " + k));
        return "atom maps: " + (parts.isEmpty() ? "none" : String.join(", ", parts));
    }

    /**
     * A short, telling example: the proven map with at least two substrate molecules feeding
     * carbons and the fewest carbons (a carboxylation, say); first in document order on ties.
     * Written with species names: {@code carbon 2 of CO2 (co2_c) → carbon 2 of oxaloacetate (oaa_c)}.
     */
    static Optional<String> example(ModelResult m) {
        ReactionResult best = null;
        for (ReactionResult r : m.reactions()) {
            if (r.mapping() == null || r.mapping().status() != MapStatus.MAPPED) {
                continue;
            }
            long sources = r.mapping().carbons().stream().map(t -> t.from().species() + "#" + t.from().copy()).distinct().count();
            if (sources >= 2 && (best == null || r.mapping().carbons().size() < best.mapping().carbons().size())) {
                best = r;
            }
        }
        if (best == null) {
            return Optional.empty();
        }
        List<String> parts = new ArrayList<>();
        for (String group : CarbonMapText.format(best.mapping().carbons(), m.mapping().structures()::label)) {
            parts.add(spell(group, m));
        }
        return Optional.of("  example " + best.id() + FindingWords.name(best.id(), m).map(n -> " (" + n + ")").orElse("")
                + ", carbons by position in each species' structure: " + String.join("; ", parts));
    }

    /** {@code "co2_c: 2 = oaa_c: 2"} as {@code "CO2 2 → oxaloacetate 2"}; a second copy is "(2nd)". */
    private static String spell(String group, ModelResult m) {
        String[] sides = group.split(" = ", 2);
        if (sides.length != 2) {
            return group;
        }
        return side(sides[0], m) + " \u2192 " + side(sides[1], m);
    }

    private static String side(String text, ModelResult m) {
        int colon = text.indexOf(": ");
        if (colon < 0) {
            return text;
        }
        String species = text.substring(0, colon);
        String copy = "";
        int hash = species.indexOf('#');
        if (hash > 0) {
            copy = " (copy " + species.substring(hash + 1) + ")";
            species = species.substring(0, hash);
        }
        String name = m.model().species(species).map(SpeciesInfo::name).filter(n -> !n.isBlank()).orElse(species);
        return name + copy + " " + text.substring(colon + 2).replace(' ', ',');
    }

    private static long count(List<Finding> all, Severity s) {
        return all.stream().filter(f -> f.severity() == s).count();
    }
}
