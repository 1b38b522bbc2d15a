package io.github.atomledger.checker.baseline;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.BaselineStatus;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

/**
 * Matches a run's findings against a {@link Baseline}: each finding gets a {@link BaselineStatus},
 * and each entry of a checked model that matched nothing becomes a {@value #STALE_RULE} finding,
 * so that the file shrinks as problems get fixed. Entries of model files that were not part of
 * the run are left alone (a run may check a subset of the models). Pure and deterministic.
 *
 * @param statuses the status of each finding
 * @param stale    one finding per stale entry (default severity {@link #STALE_SEVERITY}), sorted
 */
public record BaselineMatch(Map<Finding, BaselineStatus> statuses, List<Finding> stale) {

    /** The rule id of a baseline entry that no longer matches a finding. */
    public static final String STALE_RULE = "model.baseline-stale";

    /** Warning: stale entries do not break the build unless configured so, but they are visible. */
    public static final Severity STALE_SEVERITY = Severity.WARNING;

    public BaselineMatch {
        statuses = Map.copyOf(statuses);
        stale = stale.stream().sorted(Finding.ORDER).toList();
    }

    /**
     * Matches findings.
     *
     * @param baseline     the accepted findings
     * @param baselineFile the baseline file as shown to people (for stale findings' data and message)
     * @param findings     every finding of the run
     * @param modelFiles   the model files the run checked
     */
    public static BaselineMatch of(Baseline baseline, String baselineFile, Collection<Finding> findings,
                                   Collection<String> modelFiles) {
        Map<Finding, BaselineStatus> statuses = new HashMap<>();
        Set<BaselineEntry.Key> used = new HashSet<>();
        for (Finding f : findings) {
            BaselineEntry.Key key = BaselineEntry.Key.of(f);
            BaselineStatus status = baseline.find(key)
                    .map(e -> e.hasReason() ? BaselineStatus.ACCEPTED : BaselineStatus.PENDING_REASON)
                    .orElse(BaselineStatus.NEW);
            if (status != BaselineStatus.NEW) {
                used.add(key);
            }
            statuses.put(f, status);
        }
        Set<String> checked = new HashSet<>(modelFiles);
        List<Finding> stale = new ArrayList<>();
        for (BaselineEntry e : baseline.entries()) {
            if (checked.contains(e.modelFile()) && !used.contains(e.key())) {
                stale.add(staleFinding(e, baselineFile));
            }
        }
        return new BaselineMatch(statuses, stale);
    }

    static Finding staleFinding(BaselineEntry e, String baselineFile) {
        Map<String, String> data = new TreeMap<>();
        data.put("baselineFile", baselineFile);
        data.put("baselineLine", Integer.toString(e.line()));
        data.put("fingerprint", e.fingerprint());
        data.put("ruleId", e.ruleId());
        String message = "The baseline entry for " + e.ruleId() + " on " + e.elementId() + " (" + baselineFile
                + " line " + e.line() + ") matches no finding any more; remove it, or run the baseline goal to drop it.";
        return new Finding(STALE_RULE, STALE_SEVERITY, e.modelFile(), e.elementId(), 0, message, new TreeMap<>(data));
    }

    /** The number of findings with this status. */
    public long count(BaselineStatus status) {
        return statuses.values().stream().filter(s -> s == status).count();
    }
}
