package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.check.balance.ReactionClass;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.TreeSet;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.Variable;

/**
 * Stoichiometric consistency without formulas (Gevorgyan, Poolman &amp; Fell 2008, Bioinformatics
 * 24:2245): the internal network S is consistent when a strictly positive mass vector m with
 * Sᵀm = 0 exists, that is, every metabolite can be given a positive mass that every reaction
 * conserves.
 *
 * <p>Method. One LP (ojAlgo) finds the metabolites that some conserved mass vector can make
 * positive: maximise Σ k<sub>i</sub> subject to Sᵀm = 0, 0 ≤ k<sub>i</sub> ≤ 1, k<sub>i</sub> ≤
 * m<sub>i</sub>, m ≥ 0 (the LP relaxation of the paper's unconserved-metabolite MILP; because
 * conserved vectors can be scaled and summed, every optimum has k<sub>i</sub> = 1 exactly for the
 * conservable metabolites and 0 for the rest). The rest are unconserved. A second LP finds a
 * sparse flux combination v (minimum Σ|v|) with Sv ≥ 0 and Sv ≠ 0, which by Stiemke's theorem of
 * the alternative is what an inconsistent network must have: the reactions of v make matter from
 * nothing. Both answers are re-checked in exact rational arithmetic after rounding the solver's
 * numbers to nearby fractions: m for a consistent network (Sᵀm = 0, m &gt; 0), v for an
 * inconsistent one (Sv ≥ 0, Sv ≠ 0).
 *
 * <p>Internal reactions are those of class internal, transport and ATP maintenance; exchange,
 * demand, sink, biomass and other pseudo-reactions are left out (they exchange matter with the
 * outside by design), and so are boundary species and reactions with unusable coefficients.
 *
 * <p>Does not handle: it cannot see an imbalance that some positive mass vector explains (it is
 * weaker than element balance), and massless pseudo-species (photons, electrons) always look
 * unconserved. Stateless and thread-safe.
 */
public final class StoichiometricConsistency {

    private static final double TOLERANCE = 1e-7;

    /** The most leak LPs solved to collect unconserved metabolites. */
    static final int MAX_LEAK_ROUNDS = 3;

    /** Wall-clock budget of one LP solve, in milliseconds. */
    static final long LP_TIME_BUDGET_MS = 5_000;

    /** The net stoichiometry of one reaction: species index to coefficient. */
    private record Column(String reaction, Map<Integer, Rational> entries) {
    }

    /** Tests the internal network of the model in {@code context}. */
    public ConsistencyResult analyse(CheckContext context) {
        Map<String, Integer> index = new LinkedHashMap<>();
        List<Column> columns = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            ReactionBalance b = context.balance(r.id());
            if (!isInternal(b.reactionClass()) || !b.missingSpecies().isEmpty() || !b.badCoefficients().isEmpty()) {
                continue;
            }
            Map<String, Rational> net = new TreeMap<>();
            for (Participant p : r.reactants()) {
                net.merge(p.species(), Rational.parse(p.stoichiometryText()).negate(), Rational::add);
            }
            for (Participant p : r.products()) {
                net.merge(p.species(), Rational.parse(p.stoichiometryText()), Rational::add);
            }
            Map<Integer, Rational> entries = new LinkedHashMap<>();
            net.forEach((species, c) -> {
                boolean boundary = context.model().species(species).map(SpeciesInfo::boundary).orElse(true);
                if (!c.isZero() && !boundary) {
                    entries.put(index.computeIfAbsent(species, k -> index.size()), c);
                }
            });
            if (!entries.isEmpty()) {
                columns.add(new Column(r.id(), entries));
            }
        }
        List<String> names = new ArrayList<>(index.keySet());
        int n = names.size();
        if (n == 0) {
            return new ConsistencyResult(0, columns.size(), new TreeSet<>(), new TreeMap<>(), new TreeMap<>(), "exact");
        }
        double[] masses = new double[n];
        boolean[] zeroed = new boolean[n];
        Boolean consistent = conservable(n, columns, masses, zeroed);
        if (consistent == null) {
            return new ConsistencyResult(n, columns.size(), new TreeSet<>(), new TreeMap<>(), new TreeMap<>(), "undecided");
        }
        if (consistent) {
            boolean exact = verifyMasses(n, columns, masses);
            return new ConsistencyResult(n, columns.size(), new TreeSet<>(), new TreeMap<>(), new TreeMap<>(),
                    exact ? "exact" : "floating-point");
        }
        // Inconsistent: collect unconserved metabolites from leak combinations, each new one
        // required to reach a metabolite not yet found, until none is left or the budget ends.
        // The first round looks for any leak (so the reported combination may explain the presolve's
        // zeros too); the presolve's proven zeros then join the found set.
        boolean[] found = new boolean[n];
        SortedMap<String, Rational> firstFluxes = null;
        SortedMap<String, Rational> firstNet = null;
        boolean exact = true;
        boolean complete = false;
        for (int round = 0; round < MAX_LEAK_ROUNDS; round++) {
            double[] flux = leak(n, columns, found);
            if (flux == null) {
                complete = true;
                break;
            }
            if (flux.length == 0) {
                break;
            }
            SortedMap<String, Rational> fluxes = new TreeMap<>();
            Rational[] net = new Rational[n];
            Arrays.fill(net, Rational.ZERO);
            for (int j = 0; j < columns.size(); j++) {
                if (Math.abs(flux[j]) <= TOLERANCE) {
                    continue;
                }
                Rational v = nearbyFraction(flux[j]);
                fluxes.put(columns.get(j).reaction(), v);
                for (Map.Entry<Integer, Rational> e : columns.get(j).entries().entrySet()) {
                    net[e.getKey()] = net[e.getKey()].add(e.getValue().multiply(v));
                }
            }
            SortedMap<String, Rational> netBySpecies = new TreeMap<>();
            boolean verified = true;
            boolean progress = false;
            for (int i = 0; i < n; i++) {
                if (!net[i].isZero()) {
                    netBySpecies.put(names.get(i), net[i]);
                    verified &= net[i].signum() > 0;
                    progress |= !found[i];
                    found[i] = true;
                }
            }
            exact &= verified && !netBySpecies.isEmpty();
            if (firstFluxes == null) {
                firstFluxes = fluxes;
                firstNet = netBySpecies;
                for (int i = 0; i < n; i++) {
                    progress |= zeroed[i] && !found[i];
                    found[i] |= zeroed[i];
                }
            }
            if (!progress) {
                break;
            }
        }
        TreeSet<String> unconserved = new TreeSet<>();
        for (int i = 0; i < n; i++) {
            if (found[i] || zeroed[i]) {
                unconserved.add(names.get(i));
            }
        }
        return new ConsistencyResult(n, columns.size(), unconserved, firstFluxes == null ? new TreeMap<>() : firstFluxes,
                firstNet == null ? new TreeMap<>() : firstNet, exact && complete ? "exact" : exact ? "exact-partial"
                        : "floating-point");
    }

    /** A model with a time budget, so that one large network cannot hold a build for long. */
    static ExpressionsBasedModel newModel() {
        ExpressionsBasedModel lp = new ExpressionsBasedModel();
        lp.options.time_abort = LP_TIME_BUDGET_MS;
        return lp;
    }

    private static BigDecimal decimal(Rational r) {
        return new BigDecimal(r.numerator()).divide(new BigDecimal(r.denominator()), MathContext.DECIMAL64);
    }

    static boolean isInternal(ReactionClass c) {
        return c == ReactionClass.INTERNAL || c == ReactionClass.TRANSPORT || c == ReactionClass.ATP_MAINTENANCE;
    }

    /**
     * Which metabolites some conserved mass vector makes positive; fills {@code masses} with one
     * such vector (positive exactly on the conservable ones).
     *
     * <p>An exact presolve first: a reaction whose remaining entries all have one sign forces
     * them to zero mass; a reaction with two entries of opposite signs fixes the ratio of their
     * masses, so the two are merged (transport and isomerase reactions, most of a genome-scale
     * model). The LP then runs on what is left, with m = k + s, 0 ≤ k ≤ 1, s ≥ 0 and the
     * objective Σ k, so it has one row per remaining reaction and no others.
     */
    private static Boolean conservable(int n, List<Column> columns, double[] masses, boolean[] zeroed) {
        int[] parent = new int[n];
        Rational[] ratio = new Rational[n];
        boolean[] zero = new boolean[n];
        for (int i = 0; i < n; i++) {
            parent[i] = i;
            ratio[i] = Rational.ONE;
        }
        List<Map<Integer, Rational>> rest = new ArrayList<>();
        boolean changed = true;
        while (changed) {
            changed = false;
            rest.clear();
            for (Column c : columns) {
                Map<Integer, Rational> reduced = new TreeMap<>();
                for (Map.Entry<Integer, Rational> e : c.entries().entrySet()) {
                    int root = find(parent, ratio, e.getKey());
                    if (!zero[root]) {
                        reduced.merge(root, e.getValue().multiply(ratio[e.getKey()]), Rational::add);
                    }
                }
                reduced.values().removeIf(Rational::isZero);
                if (reduced.isEmpty()) {
                    continue;
                }
                boolean anyPositive = reduced.values().stream().anyMatch(v -> v.signum() > 0);
                boolean anyNegative = reduced.values().stream().anyMatch(v -> v.signum() < 0);
                if (!anyPositive || !anyNegative) {
                    reduced.keySet().forEach(root -> zero[root] = true);
                    changed = true;
                } else if (reduced.size() == 2) {
                    List<Map.Entry<Integer, Rational>> two = new ArrayList<>(reduced.entrySet());
                    int a = two.get(0).getKey();
                    int b = two.get(1).getKey();
                    // c_a m_a + c_b m_b = 0, so m_b = (-c_a / c_b) m_a.
                    parent[b] = a;
                    ratio[b] = two.get(0).getValue().negate().divide(two.get(1).getValue());
                    changed = true;
                } else {
                    rest.add(reduced);
                }
            }
        }
        TreeSet<Integer> roots = new TreeSet<>();
        for (int i = 0; i < n; i++) {
            int root = find(parent, ratio, i);
            if (!zero[root]) {
                roots.add(root);
            }
        }
        boolean anyZero = false;
        for (int i = 0; i < n; i++) {
            // Forced to zero by the presolve: proven unconserved (a one-signed row of non-negative masses).
            zeroed[i] = zero[find(parent, ratio, i)];
            anyZero |= zeroed[i];
        }
        Map<Integer, Double> rootMass = new LinkedHashMap<>();
        if (!roots.isEmpty()) {
            // Feasibility: every remaining mass at least 1 (Gevorgyan et al. 2008, section 3.1).
            ExpressionsBasedModel lp = newModel();
            Map<Integer, Variable> m = new LinkedHashMap<>();
            for (int root : roots) {
                m.put(root, lp.addVariable("m" + root).lower(1).weight(1));
            }
            int row = 0;
            for (Map<Integer, Rational> reduced : rest) {
                Expression conserve = lp.addExpression("r" + row++).level(0);
                reduced.forEach((root, c) -> conserve.set(m.get(root), decimal(c)));
            }
            Optimisation.Result result = lp.minimise();
            if (!result.getState().isFeasible() && result.getState() != Optimisation.State.INFEASIBLE) {
                return null;
            }
            boolean feasible = result.getState().isFeasible();
            for (int root : roots) {
                rootMass.put(root, feasible ? m.get(root).getValue().doubleValue() : 1.0);
            }
            if (!feasible) {
                return false;
            }
        }
        if (anyZero) {
            return false;
        }
        for (int i = 0; i < n; i++) {
            int root = find(parent, ratio, i);
            masses[i] = rootMass.get(root) * ratio[i].numerator().doubleValue() / ratio[i].denominator().doubleValue();
        }
        return true;
    }

    /** Root of i, with path compression; afterwards m_i = ratio[i] · m_root. Iterative: chains can be long. */
    private static int find(int[] parent, Rational[] ratio, int i) {
        List<Integer> path = new ArrayList<>();
        int root = i;
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

    /**
     * A sparse leak: v with Sv ≥ 0 and Σ(Sv) ≥ 1 over the metabolites not yet {@code found};
     * minimises Σ|v| (v = v⁺ − v⁻). Null when there is none (the LP is infeasible), an empty array
     * when the solver stopped at its time budget.
     */
    private static double[] leak(int n, List<Column> columns, boolean[] found) {
        ExpressionsBasedModel lp = newModel();
        int r = columns.size();
        Variable[] up = new Variable[r];
        Variable[] down = new Variable[r];
        for (int j = 0; j < r; j++) {
            up[j] = lp.addVariable("p" + j).lower(0).weight(1);
            down[j] = lp.addVariable("q" + j).lower(0).weight(1);
        }
        Expression[] rows = new Expression[n];
        for (int i = 0; i < n; i++) {
            rows[i] = lp.addExpression("s" + i).lower(0);
        }
        Expression total = lp.addExpression("total").lower(1);
        for (int j = 0; j < r; j++) {
            for (Map.Entry<Integer, Rational> e : columns.get(j).entries().entrySet()) {
                BigDecimal c = decimal(e.getValue());
                rows[e.getKey()].set(up[j], c);
                rows[e.getKey()].set(down[j], c.negate());
                if (!found[e.getKey()]) {
                    total.add(up[j], c);
                    total.add(down[j], c.negate());
                }
            }
        }
        Optimisation.Result result = lp.minimise();
        if (result.getState() == Optimisation.State.INFEASIBLE) {
            return null;
        }
        if (!result.getState().isFeasible()) {
            return new double[0];
        }
        double[] v = new double[r];
        for (int j = 0; j < r; j++) {
            v[j] = up[j].getValue().doubleValue() - down[j].getValue().doubleValue();
        }
        return v;
    }

    /** Rounds m to nearby fractions and checks Sᵀm = 0 and m &gt; 0 exactly. */
    private static boolean verifyMasses(int n, List<Column> columns, double[] masses) {
        Rational[] m = new Rational[n];
        for (int i = 0; i < n; i++) {
            m[i] = nearbyFraction(masses[i]);
            if (m[i].signum() <= 0) {
                return false;
            }
        }
        for (Column c : columns) {
            Rational sum = Rational.ZERO;
            for (Map.Entry<Integer, Rational> e : c.entries().entrySet()) {
                sum = sum.add(e.getValue().multiply(m[e.getKey()]));
            }
            if (!sum.isZero()) {
                return false;
            }
        }
        return true;
    }

    /** The simplest fraction within 1e-9 (relative) of x, by continued fractions. */
    static Rational nearbyFraction(double x) {
        if (x == 0 || Double.isNaN(x) || Double.isInfinite(x)) {
            return Rational.ZERO;
        }
        double tolerance = Math.max(1e-9, Math.abs(x) * 1e-9);
        BigInteger h0 = BigInteger.ZERO;
        BigInteger h1 = BigInteger.ONE;
        BigInteger k0 = BigInteger.ONE;
        BigInteger k1 = BigInteger.ZERO;
        double rest = Math.abs(x);
        for (int step = 0; step < 40; step++) {
            double a = Math.floor(rest);
            BigInteger ai = BigDecimal.valueOf(a).toBigInteger();
            BigInteger h2 = ai.multiply(h1).add(h0);
            BigInteger k2 = ai.multiply(k1).add(k0);
            h0 = h1;
            h1 = h2;
            k0 = k1;
            k1 = k2;
            if (Math.abs(h1.doubleValue() / k1.doubleValue() - Math.abs(x)) <= tolerance || rest - a < 1e-15) {
                break;
            }
            rest = 1 / (rest - a);
        }
        Rational r = Rational.of(h1, k1);
        return x < 0 ? r.negate() : r;
    }
}
