package io.github.atomledger.checker.trace;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * Where one source carbon goes along a pathway.
 *
 * @param atom      the carbon's heavy-atom index in the source structure
 * @param status    decided, split or undecided
 * @param positions where it ends, with the share of the label at each (exact, summing to 1):
 *                  decided, one symmetry class of one species; split, every place it can be; for
 *                  an undecided carbon, where it was before the step that left it undecided
 * @param lastMove  1-based index of the last step that moved it, 0 when it never moved
 * @param path      every step that moved it, in order, with where it was afterwards
 * @param stopStep  for an undecided carbon the 1-based step that left it undecided, else 0
 * @param reason    why it is undecided or split (one clause, no final full stop), "" when decided
 */
public record CarbonTrace(int atom, CarbonStatus status, SortedMap<Position, Rational> positions, int lastMove,
                          List<Hop> path, int stopStep, String reason) {

    /** A step that moved the carbon, and where it can be afterwards (with shares). */
    public record Hop(int index, Step step, SortedMap<Position, Rational> positions) {
        public Hop {
            positions = Collections.unmodifiableSortedMap(new TreeMap<>(positions));
        }
    }

    public CarbonTrace {
        Objects.requireNonNull(status, "status");
        positions = Collections.unmodifiableSortedMap(new TreeMap<>(positions));
        path = List.copyOf(path);
        reason = reason == null ? "" : reason;
    }

    /** The species it ends in, when it is not undecided and every position it can be at lies in one species. */
    public Optional<String> fateSpecies() {
        if (status == CarbonStatus.UNDECIDED || positions.isEmpty()) {
            return Optional.empty();
        }
        String s = positions.firstKey().species();
        return positions.keySet().stream().allMatch(p -> p.species().equals(s)) ? Optional.of(s) : Optional.empty();
    }

    /** The share of the label that ends in each species (empty for an undecided carbon). */
    public SortedMap<String, Rational> sharesBySpecies() {
        SortedMap<String, Rational> out = new TreeMap<>();
        if (status != CarbonStatus.UNDECIDED) {
            positions.forEach((p, w) -> out.merge(p.species(), w, Rational::add));
        }
        return out;
    }

    /** Where it was after step {@code k} (0: the source atom). */
    public SortedMap<Position, Rational> after(int k, String source) {
        SortedMap<Position, Rational> at = new TreeMap<>(Map.of(new Position(source, atom), Rational.ONE));
        for (Hop h : path) {
            if (h.index() > k) {
                break;
            }
            at = h.positions();
        }
        return at;
    }
}
