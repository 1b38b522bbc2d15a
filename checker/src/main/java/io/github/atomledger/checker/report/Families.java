package io.github.atomledger.checker.report;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.StandardChecks;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Check families: the area part of a rule id ({@code balance.charge} belongs to {@code balance}).
 * JUnit XML makes one test case per reaction and family; the HTML groups filters by them.
 */
final class Families {

    /** Known areas in reading order; others follow alphabetically. */
    private static final List<String> ORDER = List.of("model", "balance", "structure", "mapping");

    private static final Map<String, String> TITLES = Map.of(
            "model", "model integrity",
            "balance", "balance",
            "structure", "structure",
            "mapping", "mapping");

    private Families() {
    }

    static String of(String ruleId) {
        int dot = ruleId.indexOf('.');
        return dot < 0 ? ruleId : ruleId.substring(0, dot);
    }

    static String title(String family) {
        return TITLES.getOrDefault(family, family);
    }

    /** The families of the standard checks plus those of these findings, in reading order. */
    static List<String> inRun(Collection<Finding> findings) {
        TreeSet<String> found = new TreeSet<>();
        for (ModelCheck c : StandardChecks.all()) {
            found.add(of(c.ruleId()));
        }
        findings.forEach(f -> found.add(of(f.ruleId())));
        List<String> out = new ArrayList<>();
        for (String f : ORDER) {
            if (found.remove(f)) {
                out.add(f);
            }
        }
        out.addAll(found);
        return out;
    }

    /** The most severe of these findings, or null when there are none. */
    static Severity worst(Collection<Finding> findings) {
        Severity worst = null;
        for (Finding f : findings) {
            if (worst == null || f.severity().ordinal() > worst.ordinal()) {
                worst = f.severity();
            }
        }
        return worst;
    }

    /** The threshold reports treat as failing: the run's failOn, or error when the run never fails. */
    static Severity threshold(io.github.atomledger.checker.engine.RunResult result) {
        return result.config().failOn() == null ? Severity.ERROR : result.config().failOn();
    }
}
