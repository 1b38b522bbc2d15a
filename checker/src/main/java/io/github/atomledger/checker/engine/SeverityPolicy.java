package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.check.consistency.MassConsistencyCheck;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.ReactionClass;

import io.github.atomledger.checker.NearestName;

import java.util.Arrays;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Turns a check's default severity into the effective one, or drops the finding ("off").
 *
 * <p>Precedence, most specific first: the class override (for {@code balance.*} findings on a
 * reaction of that class), then the rule override, then the built-in class defaults (biomass and
 * pseudo-reactions are reported at info level, not failed: SBO describes pseudoreactions as "not
 * usually subjected to mass balance considerations"), then the check's default.
 *
 * <p>An override value is a {@link Severity} label or {@code off}. Immutable.
 */
public final class SeverityPolicy {

    /** The override value that removes findings. */
    public static final String OFF = "off";

    private static final Map<ReactionClass, String> CLASS_DEFAULTS = Map.of(
            ReactionClass.BIOMASS, "info",
            ReactionClass.PSEUDO, "info");

    private final Map<String, String> byRule;
    private final Map<ReactionClass, String> byClass;

    private SeverityPolicy(Map<String, String> byRule, Map<ReactionClass, String> byClass) {
        this.byRule = Collections.unmodifiableMap(new TreeMap<>(byRule));
        Map<ReactionClass, String> classes = new EnumMap<>(ReactionClass.class);
        classes.putAll(byClass);
        this.byClass = Collections.unmodifiableMap(classes);
    }

    /** Built-in defaults only. */
    public static SeverityPolicy defaults() {
        return new SeverityPolicy(Map.of(), new EnumMap<>(ReactionClass.class));
    }

    /**
     * A policy with overrides, validated against the known rules.
     *
     * @param byRule  rule id to severity label or "off"
     * @param byClass reaction class label to severity label or "off"
     * @throws IllegalArgumentException naming the unknown rule id (listing the known ones), class
     *         or severity
     */
    public static SeverityPolicy of(Map<String, String> byRule, Map<String, String> byClass, List<ModelCheck> checks) {
        Set<String> known = new TreeSet<>();
        checks.forEach(c -> known.add(c.ruleId()));
        return of(byRule, byClass, known);
    }

    /**
     * A policy with overrides, validated against known rule ids (the checks' and, for example,
     * the release gate's own rules).
     *
     * @throws IllegalArgumentException naming the unknown rule id (listing the known ones), class
     *         or severity
     */
    public static SeverityPolicy of(Map<String, String> byRule, Map<String, String> byClass, Set<String> knownRuleIds) {
        Set<String> known = new TreeSet<>(knownRuleIds);
        Map<String, String> rules = new TreeMap<>();
        byRule.forEach((rule, value) -> {
            String r = rule.strip();
            if (!known.contains(r)) {
                throw new IllegalArgumentException("unknown rule id '" + rule + "' in severities"
                        + NearestName.sentence(r, known) + " Known rule ids: " + String.join(", ", known));
            }
            rules.put(r, validValue(value, "severity of rule " + r));
        });
        Map<ReactionClass, String> classes = new EnumMap<>(ReactionClass.class);
        byClass.forEach((cls, value) -> classes.put(reactionClass(cls), validValue(value, "severity of class " + cls)));
        return new SeverityPolicy(rules, classes);
    }

    private static ReactionClass reactionClass(String label) {
        try {
            return ReactionClass.parse(label);
        } catch (IllegalArgumentException e) {
            List<String> labels = Arrays.stream(ReactionClass.values()).map(ReactionClass::label).toList();
            throw new IllegalArgumentException("unknown reaction class '" + label + "'"
                    + NearestName.sentence(label, labels) + " Known classes: " + String.join(", ", labels));
        }
    }

    /**
     * Severity overrides written in one line, the form of {@code -Datomledger.severity}: entries
     * separated by commas, semicolons or line breaks, each {@code key=level} with {@code level}
     * one of {@code error}, {@code warning}, {@code info}, {@code off}, and {@code key} one of
     * <ul>
     *   <li>a rule id ({@code structure.protonation=off});</li>
     *   <li>an area and {@code .*} ({@code mapping.*=info}): every known rule of that area;
     *       an entry naming one rule of the area wins over it, wherever it stands;</li>
     *   <li>{@code @} and a reaction class ({@code @biomass=off}): {@code balance.*} findings on
     *       reactions of that class, as {@code classSeverities}.</li>
     * </ul>
     * Later entries for the same key win. Blank text gives no overrides.
     *
     * @param text  the setting
     * @param where how messages name the setting ("atomledger.severity")
     * @param knownRuleIds every rule id a severity may be set for
     * @throws IllegalArgumentException naming the entry and what is wrong, with the nearest known
     *         rule id, area or class when the key is misspelt
     */
    public static Overrides parse(String text, String where, Set<String> knownRules) {
        Set<String> knownRuleIds = new TreeSet<>(knownRules);
        Map<String, String> areaRules = new TreeMap<>();
        Map<String, String> rules = new TreeMap<>();
        Map<String, String> classes = new TreeMap<>();
        if (text == null || text.isBlank()) {
            return new Overrides(rules, classes);
        }
        Set<String> areas = new TreeSet<>();
        knownRuleIds.forEach(r -> areas.add(r.substring(0, Math.max(0, r.indexOf('.')))));
        List<String> classLabels = Arrays.stream(ReactionClass.values()).map(ReactionClass::label).toList();
        for (String raw : text.split("[,;\\n\\r]")) {
            String entry = raw.strip();
            if (entry.isEmpty()) {
                continue;
            }
            int eq = entry.indexOf('=');
            if (eq < 0) {
                throw new IllegalArgumentException(where + ": '" + entry + "' is not of the form key=level (for example "
                        + "structure.protonation=off, mapping.*=info or @biomass=off)");
            }
            String key = entry.substring(0, eq).strip();
            String level = validValue(entry.substring(eq + 1), where + ": the level of '" + key + "'");
            if (key.startsWith("@")) {
                String cls = key.substring(1).strip();
                if (!classLabels.contains(cls.toLowerCase(java.util.Locale.ROOT))) {
                    throw new IllegalArgumentException(where + ": unknown reaction class '" + cls + "'"
                            + NearestName.sentence(cls, classLabels) + " Known classes: " + String.join(", ", classLabels));
                }
                classes.put(cls.toLowerCase(java.util.Locale.ROOT), level);
            } else if (key.endsWith(".*")) {
                String area = key.substring(0, key.length() - 2);
                if (!areas.contains(area)) {
                    throw new IllegalArgumentException(where + ": no rule belongs to the area '" + area + "'"
                            + NearestName.sentence(area, areas) + " Areas: " + String.join(", ", areas));
                }
                knownRuleIds.stream().filter(r -> r.startsWith(area + ".")).forEach(r -> areaRules.put(r, level));
            } else if (knownRuleIds.contains(key)) {
                rules.put(key, level);
            } else {
                throw new IllegalArgumentException(where + ": unknown rule id '" + key + "'"
                        + NearestName.sentence(key, knownRuleIds) + " Known rule ids: " + String.join(", ", knownRuleIds));
            }
        }
        areaRules.putAll(rules);
        return new Overrides(areaRules, classes);
    }

    /**
     * Overrides parsed from one line ({@link #parse}): rule id to level and reaction class label
     * to level, both sorted; levels are labels or {@code off}.
     */
    public record Overrides(Map<String, String> byRule, Map<String, String> byClass) {

        public Overrides {
            byRule = Collections.unmodifiableMap(new TreeMap<>(byRule));
            byClass = Collections.unmodifiableMap(new TreeMap<>(byClass));
        }

        /** These overrides laid over {@code rules} and {@code classes} (for example a pom's): ours win. */
        public Overrides over(Map<String, String> rules, Map<String, String> classes) {
            Map<String, String> r = new TreeMap<>(rules == null ? Map.of() : rules);
            r.putAll(byRule);
            Map<String, String> c = new TreeMap<>(classes == null ? Map.of() : classes);
            c.putAll(byClass);
            return new Overrides(r, c);
        }
    }

    private static String validValue(String value, String what) {
        String v = value == null ? "" : value.strip().toLowerCase(java.util.Locale.ROOT);
        if (v.equals(OFF)) {
            return OFF;
        }
        try {
            return Severity.parse(v).label();
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException((what.startsWith("atomledger") ? what : "bad " + what) + ": '"
                    + (value == null ? "" : value.strip()) + "' is not a level" + NearestName.sentence(v, List.of("error", "warning", "info", "off"))
                    + " Allowed: error, warning, info, off");
        }
    }

    /** The finding with its effective severity, or empty when switched off. */
    public Optional<Finding> apply(Finding f, ReactionClass reactionClass) {
        String value = null;
        if (reactionClass != null && f.ruleId().startsWith("balance.")) {
            value = byClass.get(reactionClass);
        }
        if (value == null) {
            value = byRule.get(f.ruleId());
        }
        if (value == null && reactionClass != null && f.ruleId().startsWith("balance.")) {
            value = CLASS_DEFAULTS.get(reactionClass);
        }
        if (value == null) {
            return Optional.of(f);
        }
        if (value.equals(OFF)) {
            return Optional.empty();
        }
        return Optional.of(f.withSeverity(Severity.parse(value)));
    }

    /**
     * True when every finding of the rule would be dropped, so the engine need not run the check at
     * all (some are expensive, such as the consistency LP): the rule is {@code off} and no class
     * override could bring a finding back.
     */
    public boolean switchedOff(String ruleId) {
        if (ruleId.equals(MassConsistencyCheck.UNDECIDED) && switchedOff(MassConsistencyCheck.INCONSISTENT)) {
            // The undecided outcome belongs to the consistency test: switching the test off skips both.
            return true;
        }
        return OFF.equals(byRule.get(ruleId)) && (!ruleId.startsWith("balance.") || byClass.isEmpty());
    }

    public Map<String, String> ruleOverrides() {
        return byRule;
    }

    public Map<ReactionClass, String> classOverrides() {
        return byClass;
    }

    /** Every override, in a stable order (part of the key of a reused run, {@code UnchangedRun}). */
    @Override
    public String toString() {
        return "SeverityPolicy[byRule=" + new java.util.TreeMap<>(byRule) + ", byClass=" + new java.util.TreeMap<>(byClass) + "]";
    }
}
