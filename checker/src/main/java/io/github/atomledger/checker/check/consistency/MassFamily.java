package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.Rational;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The conservable side of the consistency test: a strictly positive mass for as many species as
 * possible that every internal reaction conserves, proven in exact arithmetic.
 *
 * <p>The search runs over a family of mass vectors that formulas make small: a species with a
 * usable formula weighs Σ<sub>e</sub> w<sub>e</sub> · count<sub>e</sub>, with one weight
 * w<sub>e</sub> ≥ 0 per element symbol (pseudo-elements such as R and X included), and every other
 * species (no usable formula, or named in {@code freed}) has a mass μ ≥ 0 of its own. An
 * element-balanced reaction conserves every member, so only imbalanced reactions and those with
 * formula-less species constrain the weights: on a genome-scale model with formulas the linear
 * program has a few dozen variables and rows. Every member the reactions conserve is a valid
 * mass vector, so the support found is conservable; species outside it may still be conservable
 * by a vector outside the family (the caller settles them with leaks or by freeing them).
 *
 * <p>The LP (largest support: maximise Σ k<sub>g</sub>, k<sub>g</sub> ≤ the masses of group g,
 * 0 ≤ k ≤ 1) is solved in doubles after an exact presolve (a row whose variables all have one
 * sign forces them to zero; a row with two variables of opposite sign fixes their ratio). Its
 * answer is then made exact: the equations restricted to the positive variables are eliminated
 * exactly, the free variables take nearby fractions of the solver's values, and the resulting
 * masses are checked against every reaction. Stateless; deterministic.
 */
final class MassFamily {

    private static final double TOLERANCE = 1e-9;

    /** Outcome of one search. */
    enum Status {
        /** {@code masses} is an exact, verified conserved mass vector. */
        EXACT,
        /** The LP was solved but its answer could not be made exact; {@code floatSupport} stands alone. */
        FLOATING_POINT,
        /** The LP did not finish within its budget. */
        UNDECIDED
    }

    /**
     * @param status       how far the result goes
     * @param masses       species index to positive exact mass (the proven conservable species);
     *                     empty unless {@link Status#EXACT}
     * @param floatSupport the species the solver made positive
     */
    record Outcome(Status status, TreeMap<Integer, Rational> masses, TreeSet<Integer> floatSupport) {
    }

    private MassFamily() {
    }

    /** Searches the family for {@code network}, with an own mass for each species in {@code freed}. */
    static Outcome search(InternalNetwork network, Set<Integer> freed, Lp.Budget budget) {
        int n = network.size();
        Map<String, Integer> elements = new TreeMap<>();
        for (int i = 0; i < n; i++) {
            Formula f = network.formulas().get(i);
            if (f != null && !freed.contains(i)) {
                f.counts().keySet().forEach(e -> elements.put(e, 0));
            }
        }
        int next = 0;
        for (Map.Entry<String, Integer> e : elements.entrySet()) {
            e.setValue(next++);
        }
        List<Map<Integer, Rational>> mass = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Formula f = network.formulas().get(i);
            Map<Integer, Rational> m = new TreeMap<>();
            if (f != null && !freed.contains(i)) {
                f.counts().forEach((e, c) -> {
                    if (c != 0) {
                        m.put(elements.get(e), Rational.of(c));
                    }
                });
            } else {
                m.put(next++, Rational.ONE);
            }
            mass.add(m);
        }
        int variables = next;
        List<Map<Integer, Rational>> rows = rows(network, mass);
        Presolve pre = Presolve.of(variables, rows);
        double[] x = solve(pre, variables, mass, budget);
        if (x == null) {
            return new Outcome(Status.UNDECIDED, new TreeMap<>(), new TreeSet<>());
        }
        TreeSet<Integer> floatSupport = new TreeSet<>();
        for (int i = 0; i < n; i++) {
            double m = 0;
            for (Map.Entry<Integer, Rational> e : mass.get(i).entrySet()) {
                m += Lp.toDouble(e.getValue()) * x[e.getKey()];
            }
            if (m > TOLERANCE) {
                floatSupport.add(i);
            }
        }
        TreeMap<Integer, Rational> exact = exact(network, mass, rows, x);
        return exact == null ? new Outcome(Status.FLOATING_POINT, new TreeMap<>(), floatSupport)
                : new Outcome(Status.EXACT, exact, floatSupport);
    }

    /** One row per reaction, Σ S_ir · mass_i over the family's variables; zero rows and repeats dropped. */
    private static List<Map<Integer, Rational>> rows(InternalNetwork network, List<Map<Integer, Rational>> mass) {
        Map<String, Map<Integer, Rational>> distinct = new LinkedHashMap<>();
        for (InternalNetwork.Column c : network.columns()) {
            Map<Integer, Rational> row = wholeRow(c, mass);
            if (row == null) {
                Map<Integer, Rational> exact = new TreeMap<>();
                c.entries().forEach((i, s) -> mass.get(i).forEach((j, a) -> exact.merge(j, s.multiply(a), Rational::add)));
                row = exact;
            }
            row.values().removeIf(Rational::isZero);
            if (row.isEmpty()) {
                continue;
            }
            Rational first = row.values().iterator().next();
            StringBuilder key = new StringBuilder();
            row.forEach((j, a) -> key.append(j).append(':').append(a.divide(first)).append(' '));
            distinct.putIfAbsent(key.toString(), row);
        }
        return new ArrayList<>(distinct.values());
    }

    /**
     * The row of a reaction with whole coefficients (a positive multiple of the exact row: the
     * equation is homogeneous), in long arithmetic; null when something does not fit.
     */
    private static Map<Integer, Rational> wholeRow(InternalNetwork.Column c, List<Map<Integer, Rational>> mass) {
        if (c.whole() == null) {
            return null;
        }
        Map<Integer, long[]> sums = new TreeMap<>();
        try {
            for (int k = 0; k < c.species().length; k++) {
                long s = c.whole()[k];
                for (Map.Entry<Integer, Rational> e : mass.get(c.species()[k]).entrySet()) {
                    Rational a = e.getValue();
                    if (!a.isInteger() || a.numerator().bitLength() > 62) {
                        return null;
                    }
                    long[] acc = sums.computeIfAbsent(e.getKey(), x -> new long[1]);
                    acc[0] = Math.addExact(acc[0], Math.multiplyExact(s, a.numerator().longValue()));
                }
            }
        } catch (ArithmeticException overflow) {
            return null;
        }
        Map<Integer, Rational> row = new TreeMap<>();
        sums.forEach((j, acc) -> row.put(j, Rational.of(acc[0])));
        return row;
    }

    /** Largest-support LP on the presolved rows; the value of every family variable, or null when undecided. */
    private static double[] solve(Presolve pre, int variables, List<Map<Integer, Rational>> mass, Lp.Budget budget) {
        double[] x = new double[variables];
        List<Integer> roots = pre.roots();
        if (roots.isEmpty()) {
            return x;
        }
        if (pre.rows().stream().allMatch(row -> row.values().stream().reduce(Rational.ZERO, Rational::add).isZero())) {
            // Every root at 1 satisfies what the presolve left (nothing, on a balanced model with
            // formulas): the largest support without an LP.
            for (int j = 0; j < variables; j++) {
                x[j] = pre.zero(j) ? 0 : Lp.toDouble(pre.ratio(j));
            }
            return x;
        }
        Lp lp = new Lp(budget);
        Map<Integer, Integer> column = new HashMap<>();
        for (int root : roots) {
            column.put(root, lp.variable(0, null, 0));
        }
        for (Map<Integer, Rational> row : pre.rows()) {
            Map<Integer, Double> a = new TreeMap<>();
            row.forEach((root, c) -> a.put(column.get(root), Lp.toDouble(c)));
            lp.row(a, 0.0, 0.0);
        }
        // Species whose masses depend on the same variables share one indicator k.
        Map<Set<Integer>, Integer> groups = new LinkedHashMap<>();
        for (Map<Integer, Rational> m : mass) {
            TreeSet<Integer> key = new TreeSet<>();
            m.keySet().forEach(j -> {
                if (!pre.zero(j)) {
                    key.add(pre.root(j));
                }
            });
            if (!key.isEmpty()) {
                groups.merge(key, 1, Integer::sum);
            }
        }
        groups.forEach((key, size) -> {
            int k = lp.variable(0, 1.0, size);
            Map<Integer, Double> a = new TreeMap<>();
            a.put(k, 1.0);
            key.forEach(root -> a.put(column.get(root), -1.0));
            lp.row(a, null, 0.0);
        });
        Lp.Solution s = lp.maximise();
        if (!s.solved()) {
            return null;
        }
        for (int j = 0; j < variables; j++) {
            x[j] = pre.zero(j) ? 0 : Lp.toDouble(pre.ratio(j)) * Math.max(0, s.values()[column.get(pre.root(j))]);
        }
        return x;
    }

    /**
     * Exact masses near the LP's answer, or null when they fail the exact check: the family rows
     * restricted to the variables the LP made positive are eliminated exactly; the free ones take
     * nearby fractions of the LP's values.
     */
    private static TreeMap<Integer, Rational> exact(InternalNetwork network, List<Map<Integer, Rational>> mass,
                                                    List<Map<Integer, Rational>> rows, double[] x) {
        double scale = Arrays.stream(x).max().orElse(0);
        if (scale <= 0) {
            return new TreeMap<>();
        }
        Set<Integer> positive = new TreeSet<>();
        for (int j = 0; j < x.length; j++) {
            if (x[j] > TOLERANCE * scale) {
                positive.add(j);
            }
        }
        List<Map<Integer, Rational>> restricted = new ArrayList<>();
        for (Map<Integer, Rational> row : rows) {
            Map<Integer, Rational> r = new TreeMap<>(row);
            r.keySet().retainAll(positive);
            if (!r.isEmpty()) {
                restricted.add(r);
            }
        }
        Elimination elimination = Elimination.of(restricted, List.of());
        Map<Integer, Rational> free = new TreeMap<>();
        for (int j : positive) {
            free.put(j, Lp.nearbyFraction(x[j] / scale));
        }
        TreeMap<Integer, Rational> values = elimination.solve(free);
        for (int j : positive) {
            Rational v = values.get(j);
            if (v == null || v.signum() <= 0) {
                return null;
            }
        }
        if (!positive.containsAll(values.keySet())) {
            return null;
        }
        TreeMap<Integer, Rational> masses = new TreeMap<>();
        for (int i = 0; i < mass.size(); i++) {
            Rational m = Rational.ZERO;
            for (Map.Entry<Integer, Rational> e : mass.get(i).entrySet()) {
                m = m.add(e.getValue().multiply(values.getOrDefault(e.getKey(), Rational.ZERO)));
            }
            if (m.signum() > 0) {
                masses.put(i, m);
            }
        }
        return network.conserves(masses) ? masses : null;
    }
}
