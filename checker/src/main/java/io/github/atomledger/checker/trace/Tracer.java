package io.github.atomledger.checker.trace;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * Follows every carbon of a pathway's source through its steps, using the model's own maps. The
 * rules (also in {@code docs/traces.md}):
 * <ul>
 *   <li>The followed carbons are those the source's structure numbers with atom classes, or all
 *   of its carbons when it numbers none.</li>
 *   <li>At each step, a followed carbon that sits in a species the step consumes (its reactants,
 *   or its products when the step runs backwards) moves to the atom the step's map sends it to;
 *   carbons elsewhere stay (one that left as CO2 or in a side product stays there, unless a later
 *   step consumes that species).</li>
 *   <li>A valid curated map stored in the model is used atom for atom. An inferred map is proven
 *   only up to the symmetry of the molecules, so it moves a carbon's whole symmetry class and
 *   lands on whole classes; several copies of a species are not told apart.</li>
 *   <li>When that leaves the carbon on positions of more than one class, it is <em>split</em>: a
 *   symmetric molecule (the label spreads, as in succinate), copies of a species, or branches the
 *   enzyme may tell apart (the step then carries a stereo note; pin it with a curated map).</li>
 *   <li>It is <em>undecided</em>, with the reason and the step, and followed no further, when a
 *   step it passes is not a reaction of the model, has no map (unmappable, no structure, skipped),
 *   has only a best-found map, or has co-optimal maps that send it to different places, or a
 *   curated map that is invalid. Nothing is guessed.</li>
 * </ul>
 * Deterministic; not thread-safe (one per model and thread).
 */
public final class Tracer {

    private final ModelView model;
    private final MappingData data;
    private final Atoms atoms;
    private final Map<String, ReactionInfo> reactions = new HashMap<>();
    private final Map<Step, StepMap> steps = new HashMap<>();

    public Tracer(ModelView model, MappingData data) {
        this.model = model;
        this.data = data;
        this.atoms = new Atoms(data.structures());
        for (ReactionInfo r : model.reactions()) {
            reactions.putIfAbsent(r.id(), r);
        }
    }

    Atoms atoms() {
        return atoms;
    }

    /** Traces every carbon of the pathway's source; a pathway that cannot be traced says why. */
    public PathwayTrace trace(Pathway pathway) {
        List<StepMap> maps = new ArrayList<>();
        List<StepUse> uses = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (int i = 0; i < pathway.steps().size(); i++) {
            Step s = pathway.steps().get(i);
            StepMap m = steps.computeIfAbsent(s, k -> StepMap.of(k, reactions.get(k.reactionId()), data));
            maps.add(m);
            uses.add(m.use());
            if (!m.present()) {
                problems.add("step " + (i + 1) + ", " + s.reactionId() + ", is not a reaction of the model");
            }
        }
        String source = pathway.source();
        if (model.species(source).isEmpty()) {
            problems.add(0, "the source " + source + " is not a species of the model");
            return new PathwayTrace(pathway, List.of(), uses, problems);
        }
        if (atoms.atomCount(source) == 0) {
            problems.add(0, "the source " + source + " has no structure");
            return new PathwayTrace(pathway, List.of(), uses, problems);
        }
        List<Integer> carbons = followed(source);
        if (carbons.isEmpty()) {
            problems.add(0, "the source " + source + " has no carbon");
            return new PathwayTrace(pathway, List.of(), uses, problems);
        }
        List<CarbonTrace> out = new ArrayList<>();
        for (int atom : carbons) {
            out.add(follow(source, atom, maps));
        }
        return new PathwayTrace(pathway, out, uses, problems);
    }

    /**
     * The carbons followed: those the source's structure numbers with atom classes (numbering a
     * carbon is how a curator says it matters, and it keeps the CoA of an acyl-CoA out of the
     * way), or every carbon when none is numbered.
     */
    private List<Integer> followed(String source) {
        List<Integer> all = atoms.carbons(source);
        var structure = data.structures().get(source).orElseThrow().structure();
        List<Integer> numbered = all.stream().filter(a -> structure.atomClass(a) > 0).toList();
        return numbered.isEmpty() ? all : numbered;
    }

    private CarbonTrace follow(String source, int atom, List<StepMap> maps) {
        SortedMap<Position, Rational> at = new TreeMap<>(Map.of(new Position(source, atom), Rational.ONE));
        List<CarbonTrace.Hop> path = new ArrayList<>();
        Set<String> splitBy = new LinkedHashSet<>();
        int lastMove = 0;
        for (int i = 0; i < maps.size(); i++) {
            StepMap m = maps.get(i);
            String where = "step " + (i + 1) + ", " + m.step().text() + ", ";
            if (!m.present()) {
                return undecided(atom, at, lastMove, path, i + 1, where + m.unusable());
            }
            SortedMap<Position, Rational> consumed = new TreeMap<>();
            at.forEach((p, w) -> {
                if (m.from().contains(p.species())) {
                    consumed.put(p, w);
                }
            });
            if (consumed.isEmpty()) {
                continue;
            }
            if (m.unusable() != null) {
                return undecided(atom, at, lastMove, path, i + 1, where + m.unusable());
            }
            List<SortedMap<Position, Rational>> images = new ArrayList<>();
            for (Map<Position, List<Position>> table : m.tables()) {
                SortedMap<Position, Rational> image = image(table, consumed, m.curated());
                if (image == null) {
                    return undecided(atom, at, lastMove, path, i + 1, where + "has a map that does not place "
                            + atoms.text(consumed.keySet()));
                }
                if (!images.contains(image)) {
                    images.add(image);
                }
            }
            if (images.size() > 1) {
                return undecided(atom, at, lastMove, path, i + 1, where + "has co-optimal maps that send it to "
                        + String.join(" or ", images.stream().map(x -> atoms.text(x.keySet())).distinct().toList()));
            }
            SortedMap<Position, Rational> next = new TreeMap<>(at);
            consumed.keySet().forEach(next::remove);
            images.get(0).forEach((p, w) -> next.merge(p, w, Rational::add));
            if (atoms.classes(next.keySet()) > atoms.classes(at.keySet())) {
                splitBy.add(m.step().text() + (m.stereoNotes().isEmpty() ? "" : " (whose map needs a stereo pin)"));
            }
            at = next;
            lastMove = i + 1;
            path.add(new CarbonTrace.Hop(i + 1, m.step(), at));
        }
        boolean oneSpecies = at.keySet().stream().map(Position::species).distinct().count() == 1;
        if (oneSpecies && atoms.classes(at.keySet()) == 1) {
            return new CarbonTrace(atom, CarbonStatus.DECIDED, at, lastMove, path, 0, "");
        }
        String why = "it can be at " + atoms.text(at.keySet()) + ", which the structures cannot tell apart"
                + (splitBy.isEmpty() ? "" : " (split at " + String.join(", ", splitBy) + ")");
        return new CarbonTrace(atom, CarbonStatus.SPLIT, at, lastMove, path, 0, why);
    }

    /**
     * Where the consumed label goes under one map, with shares; null when the map leaves a
     * consumed atom out. An inferred map spreads each atom's share evenly over its symmetry class
     * before and after the step; copies of a species share evenly too.
     */
    private SortedMap<Position, Rational> image(Map<Position, List<Position>> table, SortedMap<Position, Rational> consumed,
                                                boolean curated) {
        SortedMap<Position, Rational> out = new TreeMap<>();
        for (Map.Entry<Position, Rational> e : consumed.entrySet()) {
            List<Position> ins = curated ? List.of(e.getKey()) : atoms.orbitOf(e.getKey());
            Rational perIn = e.getValue().divide(Rational.of(ins.size()));
            for (Position q : ins) {
                List<Position> targets = table.get(q);
                if (targets == null) {
                    return null;
                }
                Rational perTarget = perIn.divide(Rational.of(targets.size()));
                for (Position t : targets) {
                    List<Position> outs = curated ? List.of(t) : atoms.orbitOf(t);
                    Rational each = perTarget.divide(Rational.of(outs.size()));
                    outs.forEach(o -> out.merge(o, each, Rational::add));
                }
            }
        }
        return out;
    }

    private static CarbonTrace undecided(int atom, SortedMap<Position, Rational> at, int lastMove, List<CarbonTrace.Hop> path,
                                         int step, String reason) {
        return new CarbonTrace(atom, CarbonStatus.UNDECIDED, at, lastMove, path, step, reason);
    }
}
