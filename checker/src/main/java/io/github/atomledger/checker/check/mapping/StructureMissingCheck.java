package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * {@code mapping.structure-missing}: a species has no structure from any source, so the reactions
 * it takes part in cannot be mapped. One finding per species, listing the reactions it blocks.
 * Data: {@code reactions}, {@code reactionCount}.
 */
public final class StructureMissingCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "mapping.structure-missing";
    }

    @Override
    public String description() {
        return "A species has no structure, which blocks atom mapping of its reactions.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        Map<String, TreeSet<String>> blocked = new LinkedHashMap<>();
        context.mapping().mappings().values().stream()
                .filter(m -> m.status() == MapStatus.NO_STRUCTURE)
                .sorted(java.util.Comparator.comparing(ReactionMapping::reactionId))
                .forEach(m -> m.missingStructures().forEach(s -> blocked.computeIfAbsent(s, k -> new TreeSet<>()).add(m.reactionId())));
        List<Finding> out = new ArrayList<>();
        for (SpeciesInfo s : context.model().species()) {
            TreeSet<String> reactions = blocked.get(s.id());
            if (reactions == null) {
                continue;
            }
            String shown = String.join(", ", reactions.stream().limit(5).toList()) + (reactions.size() > 5 ? ", ..." : "");
            out.add(context.finding(this, s.id(), s.line(), "Species " + s.id() + " has no structure, so "
                    + reactions.size() + " reaction(s) cannot be mapped: " + shown + ".",
                    Map.of("reactions", String.join(",", reactions), "reactionCount", Integer.toString(reactions.size()))));
        }
        return out;
    }
}
