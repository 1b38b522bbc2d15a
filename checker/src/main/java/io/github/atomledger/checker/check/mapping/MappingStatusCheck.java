package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.Deltas;
import io.github.atomledger.checker.transitions.CarbonMapText;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.atommapper.formula.Rational;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * One rule per mapping outcome that needs a person's attention:
 * {@code mapping.unmappable} (heavy atoms do not balance, or a coefficient is not whole),
 * {@code mapping.ambiguous} (co-optimal maps send a carbon to different places),
 * {@code mapping.budget-reached} (best map found, optimality not proven in the time budget),
 * {@code mapping.too-large} (a molecule over the size cap),
 * {@code mapping.mapper-failed} (the mapper threw on the reaction: see {@link MapperFailure}), and
 * {@code mapping.stereo-pin-needed} (a map that is unique only up to a symmetry an enzyme breaks,
 * such as citrate's two arms, and that no curated map pins).
 * Minimum weighted bond edits is a chemical criterion, not proof of mechanism: a "mapped" reaction
 * still deserves expert review.
 */
public final class MappingStatusCheck implements ModelCheck {

    /** Which outcome this instance reports. */
    public enum Kind { UNMAPPABLE, AMBIGUOUS, BUDGET_REACHED, TOO_LARGE, STEREO_PIN_NEEDED, MAPPER_FAILED }

    private final Kind kind;

    public MappingStatusCheck(Kind kind) {
        this.kind = kind;
    }

    public static List<ModelCheck> all() {
        List<ModelCheck> out = new ArrayList<>();
        for (Kind k : Kind.values()) {
            out.add(new MappingStatusCheck(k));
        }
        return out;
    }

    @Override
    public String ruleId() {
        return switch (kind) {
            case UNMAPPABLE -> "mapping.unmappable";
            case AMBIGUOUS -> "mapping.ambiguous";
            case BUDGET_REACHED -> "mapping.budget-reached";
            case TOO_LARGE -> "mapping.too-large";
            case STEREO_PIN_NEEDED -> "mapping.stereo-pin-needed";
            case MAPPER_FAILED -> "mapping.mapper-failed";
        };
    }

    @Override
    public String description() {
        return switch (kind) {
            case UNMAPPABLE -> "A reaction cannot be atom-mapped: its heavy atoms do not balance or a coefficient is not whole.";
            case AMBIGUOUS -> "Several maps with the same minimum bond-edit cost send some carbon to different places.";
            case BUDGET_REACHED -> "The mapper's time budget ran out before the best map was proven optimal.";
            case TOO_LARGE -> "A participant is larger than the mapper's size cap, so the reaction was not mapped.";
            case STEREO_PIN_NEEDED -> "The map is unique only up to a symmetry that enzymes distinguish; pin it with a curated map.";
            case MAPPER_FAILED -> "The atom mapper (or the chemistry library below it) failed on a reaction; it has no map.";
        };
    }

    @Override
    public Severity defaultSeverity() {
        return switch (kind) {
            case UNMAPPABLE, MAPPER_FAILED -> Severity.ERROR;
            case AMBIGUOUS, BUDGET_REACHED, TOO_LARGE -> Severity.WARNING;
            case STEREO_PIN_NEEDED -> Severity.INFO;
        };
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        MappingData data = context.mapping();
        for (ReactionInfo r : context.model().reactions()) {
            ReactionMapping m = data.mappings().get(r.id());
            if (m == null) {
                continue;
            }
            boolean curated = data.curated().containsKey(r.id());
            Finding f = switch (kind) {
                case UNMAPPABLE -> m.status() == MapStatus.UNMAPPABLE ? unmappable(context, r, m) : null;
                case AMBIGUOUS -> m.status() == MapStatus.AMBIGUOUS && !curated ? ambiguous(context, r, m) : null;
                case BUDGET_REACHED -> m.status() == MapStatus.BEST_FOUND ? context.finding(this, r.id(), r.line(),
                        "The map of reaction " + r.id() + " is the best found within the time budget (cost " + m.cost()
                                + ", proven lower bound " + m.lowerBound() + "), not proven optimal.",
                        Map.of("cost", Integer.toString(m.cost()), "lowerBound", Integer.toString(m.lowerBound()))) : null;
                case MAPPER_FAILED -> MapperFailure.is(m) ? context.finding(this, r.id(), r.line(), "Reaction " + r.id()
                        + " has no atom map because " + m.reason() + "; please report it with the reaction's structures.",
                        Map.of("error", m.reason().substring(MapperFailure.REASON.length()).replaceFirst("^[^:]*: ", ""),
                                "species", String.join(" ", speciesOf(r)))) : null;
                case TOO_LARGE -> m.status() == MapStatus.SKIPPED && m.reason().startsWith("too large")
                        ? context.finding(this, r.id(), r.line(), "Reaction " + r.id() + " was not mapped: " + m.reason() + ".",
                        Map.of("reason", m.reason())) : null;
                case STEREO_PIN_NEEDED -> m.status() == MapStatus.MAPPED && !m.stereoNotes().isEmpty() && !curated
                        ? context.finding(this, r.id(), r.line(), "The map of reaction " + r.id()
                        + " is unique only up to a symmetry that stereochemistry breaks: " + String.join("; ", m.stereoNotes())
                        + (String.join(" ", m.stereoNotes()).contains("curated") ? "." : "; a curated map should pin it."),
                        Map.of("notes", String.join("; ", m.stereoNotes()))) : null;
            };
            if (f != null) {
                out.add(f);
            }
        }
        return out;
    }

    private static java.util.SortedSet<String> speciesOf(ReactionInfo r) {
        java.util.SortedSet<String> out = new java.util.TreeSet<>();
        r.participants().forEach(p -> out.add(p.species()));
        return out;
    }

    private Finding unmappable(CheckContext context, ReactionInfo r, ReactionMapping m) {
        Map<String, String> data = new TreeMap<>();
        data.put("reason", m.reason());
        TreeMap<String, Rational> diff = new TreeMap<>();
        m.elementDifference().forEach((k, v) -> {
            data.put("delta." + k, Long.toString(v));
            diff.put(k, Rational.of(v));
        });
        String detail = diff.isEmpty() ? m.reason() : "heavy atoms differ by " + Deltas.format(diff) + " (products minus reactants)";
        return context.finding(this, r.id(), r.line(), "Reaction " + r.id() + " cannot be atom-mapped: " + detail + ".", data);
    }

    private Finding ambiguous(CheckContext context, ReactionInfo r, ReactionMapping m) {
        Map<String, String> data = new TreeMap<>();
        data.put("alternatives", Integer.toString(m.alternatives().size()));
        data.put("cost", Integer.toString(m.cost()));
        data.put("optimum", String.join("; ", CarbonMapText.format(m.carbons())));
        for (int i = 0; i < m.alternatives().size(); i++) {
            data.put("alternative." + (i + 1), String.join("; ", CarbonMapText.format(m.alternatives().get(i))));
        }
        return context.finding(this, r.id(), r.line(), "Reaction " + r.id() + " has " + (m.alternatives().size() + 1)
                + " maps with the same minimum cost " + m.cost() + " that send carbons to different places; a curated map must choose.", data);
    }
}
