package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The unconserved side of the consistency test: leaks, that is combinations v of reactions whose
 * net stoichiometry Sv is non-negative and not zero. Each species a leak makes from nothing is
 * unconserved (a conserved mass m ≥ 0 would give 0 = mᵀSv &gt; 0), and by the theorem of the
 * alternative (Goldman and Tucker 1956) every unconserved species is made by some leak.
 *
 * <p>The search knows a set of species already proven conservable ({@code conserved}): no leak
 * can change their amount, so their rows are equations, and only the other species ("open") can
 * be made. The network is first compressed exactly: a conserved species that only one reaction
 * touches blocks that reaction, and one that exactly two touch lumps them into one combination
 * (linear pathways, cofactor shuttles). The remaining equations are then eliminated exactly
 * ({@link Elimination}), which leaves one row per open species over a few hundred free
 * combinations; the linear programs run on that small system. Every leak the solver suggests is
 * rebuilt in exact arithmetic (the equations at the suggested support are solved exactly, with
 * nearby fractions of the solver's values for the free variables) and checked on the original
 * reactions before it is reported.
 *
 * <p>Not thread-safe; one instance per analysis.
 */
final class LeakSearch {

    private static final double TOLERANCE = 1e-9;

    /**
     * A verified leak.
     *
     * @param fluxes column index of the internal network to exact coefficient, non-zero only
     * @param net    species index to the exact amount made (all positive)
     */
    record Leak(TreeMap<Integer, Rational> fluxes, TreeMap<Integer, Rational> net) {
    }

    /** A lumped combination of reactions: its net stoichiometry and the reactions it is made of. */
    private record Lump(Map<Integer, Rational> entries, Map<Integer, Rational> parts) {
    }

    private final InternalNetwork network;
    private final Set<Integer> conserved;
    private final Lp.Budget budget;
    private final List<Lump> lumps;
    private Elimination elimination;
    private boolean undecided;

    LeakSearch(InternalNetwork network, Set<Integer> conserved, Lp.Budget budget) {
        this.network = network;
        this.conserved = conserved;
        this.budget = budget;
        this.lumps = compress();
    }

    /** True when an LP ran out of its budget. */
    boolean undecided() {
        return undecided;
    }

    /**
     * A leak making every open species that any leak can make, or null when the solver gave no
     * answer or the answer could not be verified exactly.
     */
    Leak covering() {
        List<Map<Integer, Rational>> rows = reduced();
        Lp lp = new Lp(budget);
        // A tiny cost on the flux keeps the solver's numbers small; it cannot outweigh one k.
        Map<Integer, int[]> split = splitVariables(lp, rows, -1e-7);
        for (Map<Integer, Rational> row : rows) {
            if (row.isEmpty()) {
                continue;
            }
            Map<Integer, Double> a = signedRow(row, split);
            a.put(lp.variable(0, 1.0, 1), -1.0);
            lp.row(a, 0.0, null);
        }
        return leakFrom(lp.maximise(), split);
    }

    /**
     * A leak with few reactions, for people to read: on the reduced system, the least total flux
     * with each free lump weighted by how many lumps its fundamental combination involves (an
     * upper bound that is exact for a leak made of one such combination). A vertex of this LP is
     * usually an elementary leak: no reaction can be left out. Null when none was found.
     */
    Leak small() {
        List<Map<Integer, Rational>> rows = reduced();
        Lp lp = new Lp(budget);
        Map<Integer, int[]> split = new TreeMap<>();
        Set<Integer> used = new TreeSet<>();
        rows.forEach(row -> used.addAll(row.keySet()));
        // Each free lump weighs as many lumps as its fundamental combination can involve.
        elimination.footprints(used).forEach((j, w) -> split.put(j, new int[] {lp.variable(0, null, w), lp.variable(0, null, w)}));
        Map<Integer, Double> total = new TreeMap<>();
        for (Map<Integer, Rational> row : rows) {
            if (!row.isEmpty()) {
                Map<Integer, Double> a = signedRow(row, split);
                lp.row(a, 0.0, null);
                a.forEach((j, c) -> total.merge(j, c, Double::sum));
            }
        }
        lp.row(total, 1.0, null);
        return leakFrom(lp.minimise(), split);
    }

    /** Exact compression over the conserved species (see the class comment). */
    private List<Lump> compress() {
        List<Lump> all = new ArrayList<>();
        Map<Integer, TreeSet<Integer>> touching = new HashMap<>();
        for (int j = 0; j < network.columns().size(); j++) {
            Map<Integer, Rational> parts = new TreeMap<>();
            parts.put(j, Rational.ONE);
            add(all, touching, new Lump(network.columns().get(j).entries(), parts));
        }
        Deque<Integer> queue = new ArrayDeque<>(new TreeSet<>(touching.keySet()));
        while (!queue.isEmpty()) {
            int s = queue.poll();
            TreeSet<Integer> users = touching.get(s);
            if (users.size() == 1) {
                remove(all, touching, users.first(), queue);
            } else if (users.size() == 2) {
                int a = users.first();
                int b = users.last();
                Lump la = all.get(a);
                Lump lb = all.get(b);
                // v_b = f v_a makes s balance: c_a + f c_b = 0.
                Rational f = la.entries().get(s).negate().divide(lb.entries().get(s));
                Map<Integer, Rational> entries = new TreeMap<>(la.entries());
                lb.entries().forEach((i, c) -> entries.merge(i, c.multiply(f), Rational::add));
                entries.values().removeIf(Rational::isZero);
                Map<Integer, Rational> parts = new TreeMap<>(la.parts());
                lb.parts().forEach((r, c) -> parts.merge(r, c.multiply(f), Rational::add));
                parts.values().removeIf(Rational::isZero);
                remove(all, touching, a, queue);
                remove(all, touching, b, queue);
                if (!entries.isEmpty()) {
                    add(all, touching, new Lump(entries, parts));
                    entries.keySet().stream().filter(conserved::contains)
                            .filter(i -> touching.get(i).size() <= 2).forEach(queue::add);
                }
            }
        }
        List<Lump> left = new ArrayList<>();
        for (Lump l : all) {
            if (l != null) {
                left.add(l);
            }
        }
        return left;
    }

    private void add(List<Lump> all, Map<Integer, TreeSet<Integer>> touching, Lump lump) {
        int k = all.size();
        all.add(lump);
        lump.entries().keySet().stream().filter(conserved::contains)
                .forEach(i -> touching.computeIfAbsent(i, x -> new TreeSet<>()).add(k));
    }

    private void remove(List<Lump> all, Map<Integer, TreeSet<Integer>> touching, int k, Deque<Integer> queue) {
        for (int i : all.get(k).entries().keySet()) {
            TreeSet<Integer> users = touching.get(i);
            if (users != null && users.remove(k) && users.size() <= 2) {
                queue.add(i);
            }
        }
        all.set(k, null);
    }

    /** Rows of the open species over the free lumps, after eliminating the conserved species' equations. */
    private List<Map<Integer, Rational>> reduced() {
        if (elimination == null) {
            Map<Integer, Map<Integer, Rational>> rowOf = new TreeMap<>();
            for (int j = 0; j < lumps.size(); j++) {
                int col = j;
                lumps.get(j).entries().forEach((i, c) -> rowOf.computeIfAbsent(i, x -> new TreeMap<>()).put(col, c));
            }
            List<Map<Integer, Rational>> equations = new ArrayList<>();
            List<Map<Integer, Rational>> keep = new ArrayList<>();
            rowOf.forEach((i, row) -> (conserved.contains(i) ? equations : keep).add(row));
            elimination = Elimination.of(equations, keep);
        }
        return elimination.kept();
    }

    /** One pair p − q of non-negative LP variables per free lump used by the rows. */
    private static Map<Integer, int[]> splitVariables(Lp lp, List<Map<Integer, Rational>> rows, double weight) {
        Map<Integer, int[]> split = new TreeMap<>();
        rows.forEach(row -> row.keySet().forEach(j -> split.computeIfAbsent(j, x -> new int[2])));
        split.values().forEach(pq -> {
            pq[0] = lp.variable(0, null, weight);
            pq[1] = lp.variable(0, null, weight);
        });
        return split;
    }

    private static Map<Integer, Double> signedRow(Map<Integer, Rational> row, Map<Integer, int[]> split) {
        Map<Integer, Double> a = new TreeMap<>();
        row.forEach((j, c) -> {
            double d = Lp.toDouble(c);
            a.put(split.get(j)[0], d);
            a.put(split.get(j)[1], -d);
        });
        return a;
    }

    /** The exact leak behind a solution of an LP on the reduced system. */
    private Leak leakFrom(Lp.Solution s, Map<Integer, int[]> split) {
        if (!s.solved()) {
            undecided |= !s.infeasible();
            return null;
        }
        double scale = 0;
        for (int[] pq : split.values()) {
            scale = Math.max(scale, Math.abs(s.values()[pq[0]] - s.values()[pq[1]]));
        }
        if (scale == 0) {
            return null;
        }
        Map<Integer, Rational> free = new TreeMap<>();
        for (Map.Entry<Integer, int[]> e : split.entrySet()) {
            double v = (s.values()[e.getValue()[0]] - s.values()[e.getValue()[1]]) / scale;
            if (Math.abs(v) > TOLERANCE) {
                free.put(e.getKey(), Lp.nearbyFraction(v));
            }
        }
        TreeMap<Integer, Rational> v = elimination.solve(free);
        double[] guess = new double[lumps.size()];
        v.forEach((j, x) -> guess[j] = Lp.toDouble(x));
        return exact(guess);
    }

    /**
     * The exact leak near {@code guess} (a value per lump): the conserved species' equations, and
     * the open species the guess leaves at zero, are solved exactly on the guess's support; the
     * result is checked on the original reactions. Null when the check fails.
     */
    private Leak exact(double[] guess) {
        double scale = java.util.Arrays.stream(guess).map(Math::abs).max().orElse(0);
        if (scale == 0) {
            return null;
        }
        TreeSet<Integer> support = new TreeSet<>();
        for (int j = 0; j < guess.length; j++) {
            if (Math.abs(guess[j]) > TOLERANCE * scale) {
                support.add(j);
            }
        }
        Map<Integer, Map<Integer, Rational>> rowOf = new TreeMap<>();
        Map<Integer, Double> made = new TreeMap<>();
        for (int j : support) {
            for (Map.Entry<Integer, Rational> e : lumps.get(j).entries().entrySet()) {
                rowOf.computeIfAbsent(e.getKey(), x -> new TreeMap<>()).put(j, e.getValue());
                made.merge(e.getKey(), Lp.toDouble(e.getValue()) * guess[j] / scale, Double::sum);
            }
        }
        double most = made.values().stream().mapToDouble(Double::doubleValue).max().orElse(0);
        if (most <= 0) {
            return null;
        }
        List<Map<Integer, Rational>> equations = new ArrayList<>();
        rowOf.forEach((i, row) -> {
            if (conserved.contains(i) || Math.abs(made.get(i)) <= 1e-7 * most) {
                equations.add(row);
            }
        });
        Elimination e = Elimination.of(equations, List.of());
        Map<Integer, Rational> free = new TreeMap<>();
        support.forEach(j -> free.put(j, Lp.nearbyFraction(guess[j] / scale)));
        TreeMap<Integer, Rational> fluxes = new TreeMap<>();
        e.solve(free).forEach((j, x) -> lumps.get(j).parts().forEach((r, f) -> fluxes.merge(r, f.multiply(x), Rational::add)));
        fluxes.values().removeIf(Rational::isZero);
        TreeMap<Integer, Rational> net = network.net(fluxes);
        if (net.isEmpty() || net.values().stream().anyMatch(x -> x.signum() < 0)) {
            return null;
        }
        return new Leak(fluxes, net);
    }
}
