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
 * {@code mapping.structure-missing}: species without a structure from any source keep reactions
 * from being mapped. One finding per model, listing the species ranked by how many reactions each
 * would unblock on its own (then by how many it takes part in), so a curator knows which
 * structures to add first. Generic and polymer species are not listed here
 * ({@link GenericSpeciesCheck}). Data: {@code species}, {@code unblocks}, {@code blocks} (comma
 * lists in rank order), {@code missingCount}, {@code blockedReactions} (reactions held back by at
 * least one of them), {@code mappable}, {@code considered} (see {@link Coverage}).
 */
public final class StructureMissingCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "mapping.structure-missing";
    }

    @Override
    public String description() {
        return "Species without a structure block atom mapping of their reactions (ranked by reactions unblocked).";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    /** The model's coverage, computed once for the checks that report on it. */
    static Coverage coverage(CheckContext context) {
        return context.shared(Coverage.class,
                () -> Coverage.of(context.model(), context.mapping(), id -> context.balance(id).reactionClass()));
    }

    @Override
    public List<Finding> check(CheckContext context) {
        if (!context.mapping().enabled()) {
            return List.of();
        }
        Coverage c = coverage(context);
        if (c.missing().isEmpty()) {
            return List.of();
        }
        StringJoiner species = new StringJoiner(",");
        StringJoiner unblocks = new StringJoiner(",");
        StringJoiner blocks = new StringJoiner(",");
        StringJoiner shown = new StringJoiner(", ");
        int listed = 0;
        java.util.Set<String> blockedByMissing = new java.util.TreeSet<>();
        for (Coverage.Missing m : c.missing()) {
            species.add(m.species());
            unblocks.add(Integer.toString(m.unblocks()));
            blocks.add(Integer.toString(m.blocks()));
            blockedByMissing.addAll(m.reactions());
            if (shown.length() < 160) {
                listed++;
                shown.add(m.species() + " (" + m.unblocks() + " alone, " + m.blocks() + " in all)");
            }
        }
        Map<String, String> data = new TreeMap<>();
        data.put("species", species.toString());
        data.put("unblocks", unblocks.toString());
        data.put("blocks", blocks.toString());
        data.put("missingCount", Integer.toString(c.missing().size()));
        data.put("blockedReactions", Integer.toString(blockedByMissing.size()));
        data.put("mappable", Integer.toString(c.mappable()));
        data.put("considered", Integer.toString(c.considered()));
        String message = c.missing().size() + " species have no structure, which keeps " + blockedByMissing.size()
                + " of " + c.considered() + " mappable-class reactions from being mapped; the ones that unblock most: "
                + shown + (c.missing().size() > listed ? " and " + (c.missing().size() - listed) + " more" : "") + ".";
        return List.of(context.finding(this, context.model().modelId(), 0, message, data));
    }
}
