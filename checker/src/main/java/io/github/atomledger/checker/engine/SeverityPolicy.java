package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.check.consistency.MassConsistencyCheck;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.ReactionClass;

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
                throw new IllegalArgumentException("unknown rule id '" + rule + "' in severities; known rule ids: "
                        + String.join(", ", known));
            }
            rules.put(r, validValue(value, "severity of rule " + r));
        });
        Map<ReactionClass, String> classes = new EnumMap<>(ReactionClass.class);
        byClass.forEach((cls, value) -> classes.put(ReactionClass.parse(cls), validValue(value, "severity of class " + cls)));
        return new SeverityPolicy(rules, classes);
    }

    private static String validValue(String value, String what) {
        String v = value == null ? "" : value.strip().toLowerCase(java.util.Locale.ROOT);
        if (v.equals(OFF)) {
            return OFF;
        }
        try {
            return Severity.parse(v).label();
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("bad " + what + ": '" + value + "'; allowed: info, warning, error, off");
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
}
