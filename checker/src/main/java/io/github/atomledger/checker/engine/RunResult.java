package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The results of one run, models sorted by file path. Immutable.
 *
 * @param config the configuration that produced it
 * @param models one result per model file
 * @param gate   baseline statuses and fail scope from the release gate ({@link GateMarks#NONE} when
 *               no gate was applied)
 */
public record RunResult(RunConfig config, List<ModelResult> models, GateMarks gate) {

    public RunResult {
        models = models.stream().sorted(java.util.Comparator.comparing(ModelResult::file)).toList();
        gate = gate == null ? GateMarks.NONE : gate;
    }

    /** A result without gate marks. */
    public RunResult(RunConfig config, List<ModelResult> models) {
        this(config, models, GateMarks.NONE);
    }

    /** Every finding of the run, in {@link Finding#ORDER}. */
    public List<Finding> allFindings() {
        return models.stream().flatMap(m -> m.allFindings().stream()).sorted(Finding.ORDER).toList();
    }

    /** Finding counts by severity, every severity present (0 when none). */
    public Map<Severity, Integer> countsBySeverity() {
        Map<Severity, Integer> counts = new EnumMap<>(Severity.class);
        for (Severity s : Severity.values()) {
            counts.put(s, 0);
        }
        allFindings().forEach(f -> counts.merge(f.severity(), 1, Integer::sum));
        return counts;
    }

    /**
     * Findings at or above the fail threshold that the gate lets fail (not accepted in the
     * baseline, within the fail scope); empty when the run never fails.
     */
    public List<Finding> failing() {
        Severity threshold = config.failOn();
        if (threshold == null) {
            return List.of();
        }
        return allFindings().stream().filter(f -> f.severity().atLeast(threshold)).filter(gate::mayFail).toList();
    }
}
