package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Exact presolve of homogeneous equations {@code Σ a_j x_j = 0} over variables {@code x ≥ 0}:
 * a row whose remaining coefficients all have one sign forces its variables to zero, and a row
 * with two variables of opposite sign fixes their ratio, so one replaces the other
 * ({@code x_b = ratio · x_a}, ratio &gt; 0). Repeated until nothing changes. Transport and
 * isomerase reactions, most of a genome-scale model, disappear this way.
 */
final class Presolve {

    private final int[] parent;
    private final Rational[] ratio;
    private final boolean[] zero;
    private final List<Map<Integer, Rational>> rows;

    private Presolve(int variables) {
        parent = new int[variables];
        ratio = new Rational[variables];
        zero = new boolean[variables];
        for (int j = 0; j < variables; j++) {
            parent[j] = j;
            ratio[j] = Rational.ONE;
        }
        rows = new ArrayList<>();
    }

    static Presolve of(int variables, List<Map<Integer, Rational>> equations) {
        Presolve p = new Presolve(variables);
        boolean changed = true;
        while (changed) {
            changed = false;
            p.rows.clear();
            for (Map<Integer, Rational> row : equations) {
                Map<Integer, Rational> reduced = new TreeMap<>();
                row.forEach((j, a) -> {
                    int root = p.root(j);
                    if (!p.zero[root]) {
                        reduced.merge(root, a.multiply(p.ratio[j]), Rational::add);
                    }
                });
                reduced.values().removeIf(Rational::isZero);
                if (reduced.isEmpty()) {
                    continue;
                }
                boolean anyPositive = reduced.values().stream().anyMatch(v -> v.signum() > 0);
                boolean anyNegative = reduced.values().stream().anyMatch(v -> v.signum() < 0);
                if (!anyPositive || !anyNegative) {
                    reduced.keySet().forEach(root -> p.zero[root] = true);
                    changed = true;
                } else if (reduced.size() == 2) {
                    List<Map.Entry<Integer, Rational>> two = new ArrayList<>(reduced.entrySet());
                    int a = two.get(0).getKey();
                    int b = two.get(1).getKey();
                    // c_a x_a + c_b x_b = 0, so x_b = (-c_a / c_b) x_a, a positive ratio.
                    p.parent[b] = a;
                    p.ratio[b] = two.get(0).getValue().negate().divide(two.get(1).getValue());
                    changed = true;
                } else {
                    p.rows.add(reduced);
                }
            }
        }
        return p;
    }

    /** The remaining rows over root variables. */
    List<Map<Integer, Rational>> rows() {
        return rows;
    }

    /** Root variables not forced to zero, ascending. */
    List<Integer> roots() {
        List<Integer> roots = new ArrayList<>();
        for (int j = 0; j < parent.length; j++) {
            if (root(j) == j && !zero[j]) {
                roots.add(j);
            }
        }
        return roots;
    }

    /** True when x_j is forced to zero. */
    boolean zero(int j) {
        return zero[root(j)];
    }

    /** The root of j; afterwards x_j = {@link #ratio(int)} · x_root. */
    int root(int j) {
        List<Integer> path = new ArrayList<>();
        int root = j;
        while (parent[root] != root) {
            path.add(root);
            root = parent[root];
        }
        // Walk back from the node nearest the root, so each parent is already final.
        for (int p = path.size() - 1; p >= 0; p--) {
            int node = path.get(p);
            int up = parent[node];
            if (up != root) {
                ratio[node] = ratio[node].multiply(ratio[up]);
                parent[node] = root;
            }
        }
        return root;
    }

    /** x_j / x_root(j). */
    Rational ratio(int j) {
        root(j);
        return ratio[j];
    }
}
