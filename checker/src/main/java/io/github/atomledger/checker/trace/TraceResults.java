package io.github.atomledger.checker.trace;

import io.github.atomledger.checker.check.Finding;

import java.util.List;

/**
 * The traces of one model: its pathways (in file order), the outcome of each declared fate, the
 * label reach of each configured source atom, and the findings they give (default severities;
 * the engine applies the severity policy).
 */
public record TraceResults(List<PathwayTrace> pathways, List<FateOutcome> outcomes, List<LabelReach> reach,
                           List<Finding> findings) {

    /** Nothing traced. */
    public static final TraceResults NONE = new TraceResults(List.of(), List.of(), List.of(), List.of());

    public TraceResults {
        pathways = List.copyOf(pathways);
        outcomes = List.copyOf(outcomes);
        reach = List.copyOf(reach);
        findings = findings.stream().sorted(Finding.ORDER).toList();
    }

    public boolean isEmpty() {
        return pathways.isEmpty() && reach.isEmpty();
    }

    /** The outcomes of one pathway's declared fates. */
    public List<FateOutcome> outcomes(String pathway) {
        return outcomes.stream().filter(o -> o.expectation().pathway().equals(pathway)).toList();
    }
}
