package io.github.atomledger.checker.baseline;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Writes a baseline from the current findings: every finding at or above a severity gets an
 * entry. An entry that already exists stays (whatever the finding's severity now) and keeps its
 * reason and who accepted it; a new one gets
 * {@link Baseline#PLACEHOLDER_REASON} and the given owner. Entries of the checked models that
 * match no finding any more are dropped; entries of models outside the run are kept unchanged.
 * Stale-entry findings are never recorded. Pure and deterministic.
 *
 * @param baseline the updated baseline
 * @param kept     entries carried over unchanged
 * @param added    new entries (with the placeholder reason)
 * @param removed  entries dropped as stale
 */
public record BaselineUpdate(Baseline baseline, List<BaselineEntry> kept, List<BaselineEntry> added,
                             List<BaselineEntry> removed) {

    public BaselineUpdate {
        kept = List.copyOf(kept);
        added = List.copyOf(added);
        removed = List.copyOf(removed);
    }

    /**
     * Computes the update.
     *
     * @param existing   the baseline as committed (or {@link Baseline#empty()})
     * @param findings   every finding of the run
     * @param modelFiles the model files the run checked
     * @param threshold  the lowest severity recorded
     * @param owner      who accepts new entries
     */
    public static BaselineUpdate of(Baseline existing, Collection<Finding> findings, Collection<String> modelFiles,
                                    Severity threshold, String owner) {
        Map<BaselineEntry.Key, BaselineEntry> next = new LinkedHashMap<>();
        List<BaselineEntry> kept = new ArrayList<>();
        List<BaselineEntry> added = new ArrayList<>();
        for (Finding f : findings.stream().sorted(Finding.ORDER).toList()) {
            if (f.ruleId().equals(BaselineMatch.STALE_RULE)) {
                continue;
            }
            BaselineEntry.Key key = BaselineEntry.Key.of(f);
            if (next.containsKey(key)) {
                continue;
            }
            BaselineEntry entry = existing.find(key).orElse(null);
            if (entry != null) {
                kept.add(entry);
            } else if (f.severity().atLeast(threshold)) {
                entry = BaselineEntry.pending(f, owner);
                added.add(entry);
            } else {
                continue;
            }
            next.put(key, entry.atLine(0));
        }
        Set<String> checked = new HashSet<>(modelFiles);
        List<BaselineEntry> removed = new ArrayList<>();
        for (BaselineEntry e : existing.entries()) {
            if (next.containsKey(e.key())) {
                continue;
            }
            if (checked.contains(e.modelFile())) {
                removed.add(e);
            } else {
                next.put(e.key(), e.atLine(0));
            }
        }
        return new BaselineUpdate(Baseline.of(new ArrayList<>(next.values())), kept, added, removed);
    }
}
