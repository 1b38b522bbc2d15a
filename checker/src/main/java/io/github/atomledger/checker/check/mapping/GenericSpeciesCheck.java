package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;

import java.util.List;
import java.util.Map;
import java.util.StringJoiner;
import java.util.TreeMap;

/**
 * {@code mapping.generic-species}: generic and polymer species (an R group in the formula, an
 * {@code *} atom in the structure, a {@code (...)n} formula) take part in reactions that could be
 * mapped. No single structure exists for them, so they are not counted as missing structures; a
 * curator decides whether to split them into defined species. One finding per model. Data:
 * {@code species}, {@code reasons}, {@code blocks} (comma lists by species id; {@code reasons}
 * separated by {@code ;}), {@code genericCount}, {@code blockedOnlyByGeneric}.
 */
public final class GenericSpeciesCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "mapping.generic-species";
    }

    @Override
    public String description() {
        return "Generic or polymer species (R groups, * atoms, (...)n formulas) take part in mappable reactions.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.INFO;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        if (!context.mapping().enabled()) {
            return List.of();
        }
        Coverage c = StructureMissingCheck.coverage(context);
        if (c.generic().isEmpty()) {
            return List.of();
        }
        StringJoiner species = new StringJoiner(",");
        StringJoiner reasons = new StringJoiner(";");
        StringJoiner blocks = new StringJoiner(",");
        StringJoiner shown = new StringJoiner(", ");
        int listed = 0;
        for (Coverage.Generic g : c.generic()) {
            species.add(g.species());
            reasons.add(g.reason());
            blocks.add(Integer.toString(g.blocks()));
            if (shown.length() < 160) {
                listed++;
                shown.add(g.species() + " (" + g.reason() + ")");
            }
        }
        Map<String, String> data = new TreeMap<>();
        data.put("species", species.toString());
        data.put("reasons", reasons.toString());
        data.put("blocks", blocks.toString());
        data.put("genericCount", Integer.toString(c.generic().size()));
        data.put("blockedOnlyByGeneric", Integer.toString(c.blockedByGenericOnly()));
        String message = c.generic().size() + " generic or polymer species take part in mappable-class reactions and "
                + "have no single structure (" + c.blockedByGenericOnly() + " reaction(s) wait only on them): " + shown
                + (c.generic().size() > listed ? " and " + (c.generic().size() - listed) + " more" : "") + ".";
        return List.of(context.finding(this, context.model().modelId(), 0, message, data));
    }
}
