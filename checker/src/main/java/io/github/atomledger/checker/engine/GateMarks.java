package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.check.Finding;

import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * What the release gate decided beyond severities: the baseline status of each finding, and
 * which rules may fail the build at all. Immutable.
 *
 * @param baselineFile the baseline file as shown in reports (relative to the base directory), or
 *                     "" when no baseline was applied
 * @param baseline     the baseline status of each finding; empty when no baseline was applied
 * @param onlyRules    when not empty, only findings of these rule ids can fail the run (used to
 *                     fail on release regressions only); empty means every rule can
 */
public record GateMarks(String baselineFile, Map<Finding, BaselineStatus> baseline, Set<String> onlyRules) {

    /** No gate: every finding at or above the threshold fails. */
    public static final GateMarks NONE = new GateMarks("", Map.of(), Set.of());

    public GateMarks {
        baselineFile = baselineFile == null ? "" : baselineFile;
        baseline = Map.copyOf(baseline);
        onlyRules = Set.copyOf(onlyRules);
    }

    /** The finding's baseline status; empty when no baseline was applied or the finding is not in the run. */
    public Optional<BaselineStatus> status(Finding f) {
        return Optional.ofNullable(baseline.get(f));
    }

    /** True when the finding may fail the run (its severity is decided elsewhere). */
    public boolean mayFail(Finding f) {
        return baseline.get(f) != BaselineStatus.ACCEPTED && (onlyRules.isEmpty() || onlyRules.contains(f.ruleId()));
    }

    /** True when a baseline was applied. */
    public boolean hasBaseline() {
        return !baselineFile.isEmpty();
    }
}
