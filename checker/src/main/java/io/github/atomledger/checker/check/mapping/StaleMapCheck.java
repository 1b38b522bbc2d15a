package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import io.github.atomledger.checker.transitions.StoredStructure;
import io.github.atomledger.checker.transitions.TransitionAnnotation;
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
 * The same molecule written as another SMILES counts too when it numbers the atoms differently,
 * because atom numbers follow the SMILES text; a text that only adds or changes atom classes
 * (readable positions) numbers them alike and is not stale. Data: {@code species} (comma list), {@code origin}, {@code reason} ("structure-changed"
 * or "renumbered").
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
            TreeSet<String> renumbered = new TreeSet<>();
            for (StoredStructure s : a.structures()) {
                SpeciesStructures.Resolved now = context.mapping().structures().get(s.species()).orElse(null);
                String fingerprint = now == null ? "" : now.structure().fingerprint();
                if (!s.fingerprint().isEmpty() && !fingerprint.equals(s.fingerprint())) {
                    changed.add(s.species());
                } else if (now != null && !s.smiles().isEmpty() && !s.smiles().strip().equals(now.text().strip())
                        && !numberedAlike(s.smiles(), now.structure())) {
                    // Same molecule, other SMILES text: atom numbers follow the text, so they may have moved.
                    renumbered.add(s.species());
                }
            }
            if (changed.isEmpty() && renumbered.isEmpty()) {
                continue;
            }
            TreeSet<String> all = new TreeSet<>(changed);
            all.addAll(renumbered);
            String why = !changed.isEmpty()
                    ? "was written for other structures of " + String.join(", ", changed) + "; the structure changed since"
                    : "was written for another SMILES of " + String.join(", ", renumbered)
                            + " (the same molecule), so its atom numbers may have moved";
            out.add(context.finding(this, r.id(), r.line(), "The " + a.origin() + " atom map of reaction " + r.id()
                    + " " + why + ".",
                    Map.of("species", String.join(",", all), "origin", a.origin(),
                            "reason", changed.isEmpty() ? "renumbered" : "structure-changed")));
        }
        return out;
    }

    /**
     * True when the stored SMILES numbers its heavy atoms as the structure used now does, for
     * example when only atom classes ({@code [CH2:3]}), brackets or stereo marks changed (#14).
     */
    private static boolean numberedAlike(String storedSmiles, Structure now) {
        try {
            return Structure.fromSmiles(storedSmiles).numberedAlike(now);
        } catch (StructureException e) {
            return false;
        }
    }
}
