package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.checker.annotate.StoredStructure;
import io.github.atomledger.checker.annotate.TransitionAnnotation;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * {@code mapping.stale}: a map stored in the model was written for structures that have changed
 * since (their fingerprints differ from the structures used now), so its atom numbers may no
 * longer mean the same atoms. Re-run {@code annotate} (inferred maps) or review the curated map.
 * Data: {@code species} (comma list), {@code origin}.
 */
public final class StaleMapCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "mapping.stale";
    }

    @Override
    public String description() {
        return "A stored atom map was written for a structure that has changed since.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            TransitionAnnotation a = context.mapping().stored().get(r.id());
            if (a == null) {
                continue;
            }
            TreeSet<String> changed = new TreeSet<>();
            for (StoredStructure s : a.structures()) {
                if (s.fingerprint().isEmpty()) {
                    continue;
                }
                String now = context.mapping().structures().get(s.species())
                        .map(SpeciesStructures.Resolved::structure).map(x -> x.fingerprint()).orElse("");
                if (!now.equals(s.fingerprint())) {
                    changed.add(s.species());
                }
            }
            if (changed.isEmpty()) {
                continue;
            }
            out.add(context.finding(this, r.id(), r.line(), "The " + a.origin() + " atom map of reaction " + r.id()
                    + " was written for other structures of " + String.join(", ", changed)
                    + "; the structure changed since the map was written.",
                    Map.of("species", String.join(",", changed), "origin", a.origin())));
        }
        return out;
    }
}
