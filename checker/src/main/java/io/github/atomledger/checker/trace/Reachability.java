package io.github.atomledger.checker.trace;

import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The atom transition network of a model's carbons and the label reach of a source atom in it.
 * Nodes are (species, carbon); each reaction with a usable map (see {@link StepMap}: a valid
 * curated map, or the inferred map with its co-optimal alternatives) links every consumed carbon
 * with the product carbons it can become, forwards, and backwards as well when the reaction is
 * reversible. Inferred maps link whole symmetry classes. Best-found maps count too (label can go
 * where some valid map sends it); reactions without a map do not. A breadth-first search gives
 * each reachable position one shortest chain of reactions (fewest steps; ties broken by document
 * order of the reactions, so the result is deterministic). Not thread-safe.
 */
public final class Reachability {

    /** A link to a product carbon; {@code order} is the reaction's document position (backwards just after). */
    private record Edge(Position to, Step step, int order) {
    }

    private final Atoms atoms;
    private final Map<Position, List<Edge>> exact = new HashMap<>();
    private final Map<Position, List<Edge>> byClass = new HashMap<>();

    public Reachability(ModelView model, MappingData data) {
        this.atoms = new Atoms(data.structures());
        Set<String> seen = new HashSet<>();
        for (ReactionInfo r : model.reactions()) {
            if (!seen.add(r.id())) {
                continue;
            }
            int order = 2 * seen.size();
            link(StepMap.of(new Step(r.id(), false), r, data, true), order);
            if (r.reversible()) {
                link(StepMap.of(new Step(r.id(), true), r, data, true), order + 1);
            }
        }
    }

    private void link(StepMap m, int order) {
        if (m.unusable() != null) {
            return;
        }
        for (Map<Position, List<Position>> table : m.tables()) {
            table.forEach((from, tos) -> {
                for (Position to : tos) {
                    if (m.curated()) {
                        exact.computeIfAbsent(from, k -> new ArrayList<>()).add(new Edge(to, m.step(), order));
                    } else {
                        Position key = new Position(from.species(), atoms.orbit(from));
                        byClass.computeIfAbsent(key, k -> new ArrayList<>()).add(new Edge(to, m.step(), order));
                    }
                }
            });
        }
    }

    /** Every position label from {@code source} can reach, with one shortest chain each. */
    public LabelReach from(Position source) {
        Map<Position, Position> parent = new LinkedHashMap<>();
        Map<Position, Step> via = new HashMap<>();
        ArrayDeque<Position> queue = new ArrayDeque<>();
        parent.put(source, null);
        queue.add(source);
        while (!queue.isEmpty()) {
            Position p = queue.poll();
            List<Edge> out = new ArrayList<>(exact.getOrDefault(p, List.of()));
            for (Edge e : byClass.getOrDefault(new Position(p.species(), atoms.orbit(p)), List.of())) {
                for (Position t : atoms.orbitOf(e.to())) {
                    out.add(new Edge(t, e.step(), e.order()));
                }
            }
            out.sort(Comparator.comparingInt(Edge::order).thenComparing(Edge::to));
            for (Edge e : out) {
                if (!parent.containsKey(e.to())) {
                    parent.put(e.to(), p);
                    via.put(e.to(), e.step());
                    queue.add(e.to());
                }
            }
        }
        List<LabelReach.Reached> reached = new ArrayList<>();
        Map<Position, List<Step>> chains = new HashMap<>();
        for (Position p : parent.keySet()) {
            Position up = parent.get(p);
            List<Step> chain = new ArrayList<>(up == null ? List.of() : chains.get(up));
            if (up != null) {
                chain.add(via.get(p));
            }
            chains.put(p, chain);
            reached.add(new LabelReach.Reached(p, chain));
        }
        reached.sort(Comparator.comparingInt((LabelReach.Reached r) -> r.chain().size())
                .thenComparing(LabelReach.Reached::position));
        return new LabelReach(source, reached);
    }
}
