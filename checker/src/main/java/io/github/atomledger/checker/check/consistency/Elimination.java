package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Exact Gaussian elimination of sparse homogeneous linear equations over the rationals.
 *
 * <p>Given equations {@code Σ a_ij x_j = 0} to eliminate and further rows to keep, each equation
 * is solved for one of its variables (the pivot), which is substituted into every other row.
 * What remains are the kept rows written over the free variables (those never chosen as pivot),
 * and the pivot rows, from which {@link #solve} computes every pivot variable from values of the
 * free ones by back-substitution: the result satisfies every eliminated equation exactly.
 *
 * <p>Pivots are chosen by a Markowitz-style rule (the shortest row first, then its variable that
 * occurs in the fewest rows; ties by the smaller index), which keeps the fill-in small on the
 * sparse matrices of metabolic networks, and makes the outcome deterministic. Arithmetic is exact,
 * so any non-zero pivot is acceptable. Equations that turn out to depend on earlier ones reduce
 * to nothing and are dropped.
 *
 * <p>Not thread-safe while being built; the result is immutable.
 */
final class Elimination {

    /** One solved equation: {@code column = -Σ (row_k / row_column) x_k} over the other columns. */
    private record Pivot(int column, Map<Integer, Rational> row) {
    }

    private final List<Pivot> pivots;
    private final java.util.Set<Integer> pivotColumns = new java.util.HashSet<>();
    private final List<Map<Integer, Rational>> kept;

    private Elimination(List<Pivot> pivots, List<Map<Integer, Rational>> kept) {
        this.pivots = pivots;
        this.kept = kept;
        pivots.forEach(p -> pivotColumns.add(p.column()));
    }

    /**
     * Eliminates {@code equations} and rewrites {@code keep} over the free variables. Rows map a
     * variable index to a non-zero coefficient; the inputs are not changed.
     */
    static Elimination of(List<Map<Integer, Rational>> equations, List<Map<Integer, Rational>> keep) {
        int total = equations.size() + keep.size();
        List<Map<Integer, Rational>> rows = new ArrayList<>(total);
        Map<Integer, TreeSet<Integer>> rowsOf = new HashMap<>();
        for (List<Map<Integer, Rational>> part : List.of(equations, keep)) {
            for (Map<Integer, Rational> row : part) {
                Map<Integer, Rational> copy = new HashMap<>();
                row.forEach((column, a) -> {
                    if (!a.isZero()) {
                        copy.put(column, a);
                        rowsOf.computeIfAbsent(column, c -> new TreeSet<>()).add(rows.size());
                    }
                });
                rows.add(copy);
            }
        }
        boolean[] open = new boolean[equations.size()];
        java.util.Arrays.fill(open, true);
        List<Pivot> pivots = new ArrayList<>();
        for (int step = 0; step < equations.size(); step++) {
            int best = -1;
            for (int i = 0; i < open.length; i++) {
                if (open[i] && (best < 0 || rows.get(i).size() < rows.get(best).size())) {
                    best = i;
                }
            }
            open[best] = false;
            Map<Integer, Rational> pivotRow = rows.get(best);
            if (pivotRow.isEmpty()) {
                continue;
            }
            int column = -1;
            for (int c : new TreeSet<>(pivotRow.keySet())) {
                if (column < 0 || rowsOf.get(c).size() < rowsOf.get(column).size()) {
                    column = c;
                }
            }
            Rational a = pivotRow.get(column);
            for (int other : new ArrayList<>(rowsOf.get(column))) {
                if (other == best) {
                    continue;
                }
                Map<Integer, Rational> target = rows.get(other);
                Rational factor = target.get(column).divide(a);
                pivotRow.forEach((c, value) -> {
                    Rational updated = target.getOrDefault(c, Rational.ZERO).subtract(factor.multiply(value));
                    if (updated.isZero()) {
                        target.remove(c);
                        rowsOf.get(c).remove(other);
                    } else if (target.put(c, updated) == null) {
                        rowsOf.get(c).add(other);
                    }
                });
            }
            for (int c : pivotRow.keySet()) {
                rowsOf.get(c).remove(best);
            }
            pivots.add(new Pivot(column, pivotRow));
        }
        List<Map<Integer, Rational>> reduced = new ArrayList<>();
        for (int i = equations.size(); i < total; i++) {
            reduced.add(new TreeMap<>(rows.get(i)));
        }
        return new Elimination(pivots, reduced);
    }

    /** The kept rows, in input order, over free variables only. */
    List<Map<Integer, Rational>> kept() {
        return kept;
    }

    /** True when {@code column} was solved for (its value follows from the free ones). */
    boolean isPivot(int column) {
        return pivotColumns.contains(column);
    }

    /**
     * For each free variable that {@code columns} mention, how many variables (itself included)
     * its fundamental solution can touch: the solution with that variable 1 and every other free
     * one 0, counted by back-substitution of non-zero patterns (cancellations ignored, so this is
     * an upper bound).
     */
    Map<Integer, Integer> footprints(Set<Integer> columns) {
        // Which free variables each pivot depends on, as bit sets, from the last pivot back.
        Map<Integer, Integer> position = new HashMap<>();
        for (int c : columns) {
            if (!isPivot(c)) {
                position.put(c, position.size());
            }
        }
        Map<Integer, java.util.BitSet> dependsOn = new HashMap<>();
        int[] count = new int[position.size()];
        for (int k = pivots.size() - 1; k >= 0; k--) {
            Pivot p = pivots.get(k);
            java.util.BitSet bits = new java.util.BitSet();
            for (int c : p.row().keySet()) {
                if (c == p.column()) {
                    continue;
                }
                java.util.BitSet later = dependsOn.get(c);
                if (later != null) {
                    bits.or(later);
                } else if (position.containsKey(c)) {
                    bits.set(position.get(c));
                }
            }
            dependsOn.put(p.column(), bits);
            bits.stream().forEach(b -> count[b]++);
        }
        Map<Integer, Integer> out = new TreeMap<>();
        position.forEach((c, b) -> out.put(c, count[b] + 1));
        return out;
    }

    /**
     * Every variable's value from the free ones: {@code free} gives free variables (absent ones
     * are zero; entries for pivot variables are ignored), and each pivot variable is computed so
     * that its equation holds exactly. Returns only non-zero values, sorted by index.
     */
    TreeMap<Integer, Rational> solve(Map<Integer, Rational> free) {
        Map<Integer, Rational> values = new HashMap<>(free);
        for (Pivot p : pivots) {
            values.remove(p.column());
        }
        for (int k = pivots.size() - 1; k >= 0; k--) {
            Pivot p = pivots.get(k);
            Rational sum = Rational.ZERO;
            for (Map.Entry<Integer, Rational> e : p.row().entrySet()) {
                if (e.getKey() != p.column()) {
                    sum = sum.add(e.getValue().multiply(values.getOrDefault(e.getKey(), Rational.ZERO)));
                }
            }
            values.put(p.column(), sum.negate().divide(p.row().get(p.column())));
        }
        TreeMap<Integer, Rational> out = new TreeMap<>();
        values.forEach((c, v) -> {
            if (!v.isZero()) {
                out.put(c, v);
            }
        });
        return out;
    }
}
