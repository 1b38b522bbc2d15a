package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.CheckContext;

import java.util.Map;
import java.util.Set;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Stoichiometric consistency without formulas (Gevorgyan, Poolman &amp; Fell 2008, Bioinformatics
 * 24:2245): the internal network S is consistent when a strictly positive mass vector m with
 * Sᵀm = 0 exists, that is, every metabolite can be given a positive mass that every reaction
 * conserves. The unconserved metabolites are those no such vector (m ≥ 0) can make positive.
 *
 * <p>Method. Both sides are proven in exact arithmetic, with linear programs (ojAlgo) only as
 * guides. The species split exactly into two sets (Goldman and Tucker 1956): those some conserved
 * mass vector m ≥ 0 makes positive, and those some leak (reactions v with Sv ≥ 0) makes from
 * nothing.
 * <ol>
 *   <li>{@link MassFamily}: a conserved mass vector of largest support among masses built from
 *       formulas (element weights) and free masses for formula-less species; a small LP on a
 *       model with formulas, verified exactly. Its support is proven conservable.</li>
 *   <li>{@link LeakSearch}: for the other species, one leak that makes every species any leak can
 *       make, on the network compressed and reduced by exact elimination over the proven
 *       species; rebuilt and verified exactly. What it makes is proven unconserved.</li>
 *   <li>Species in neither set are conservable (no leak makes them) by vectors outside the family;
 *       the family is searched again with their masses freed, then their neighbours' too, until
 *       they are proven (at worst with every mass free, the plain LP). Any that still lack a proof
 *       (a solve ran out of budget) are reported as undetermined, never guessed.</li>
 *   <li>For the report, a leak with few reactions: it names what to look at first.</li>
 * </ol>
 *
 * <p>Internal reactions are those of class internal, transport and ATP maintenance; exchange,
 * demand, sink, biomass and other pseudo-reactions are left out (they exchange matter with the
 * outside by design), and so are boundary species and reactions with unusable coefficients.
 *
 * <p>Does not handle: it cannot see an imbalance that some positive mass vector explains (it is
 * weaker than element balance), and massless pseudo-species (photons, electrons) always look
 * unconserved. Each LP has a wall-clock budget ({@link #LP_TIME_BUDGET_MS}); a solve that runs out
 * leaves the verdict "undecided", never "consistent". Stateless and thread-safe.
 */
public final class StoichiometricConsistency {

    /** Wall-clock budget of one LP solve, in milliseconds. */
    static final long LP_TIME_BUDGET_MS = 5_000;

    private final Lp.Budget budget;

    public StoichiometricConsistency() {
        this(Lp.Budget.DEFAULT);
    }

    StoichiometricConsistency(Lp.Budget budget) {
        this.budget = budget;
    }

    /** The wall-clock budget of one LP solve, in milliseconds. */
    long budgetMillis() {
        return budget.millis();
    }

    /** Tests the internal network of the model in {@code context}. */
    public ConsistencyResult analyse(CheckContext context) {
        return analyse(InternalNetwork.of(context));
    }

    ConsistencyResult analyse(InternalNetwork network) {
        int n = network.size();
        if (n == 0) {
            return result(network, Set.of(), Set.of(), null, ConsistencyResult.EXACT);
        }
        MassFamily.Outcome family = MassFamily.search(network, Set.of(), budget);
        if (family.status() == MassFamily.Status.UNDECIDED) {
            return result(network, Set.of(), Set.of(), null, ConsistencyResult.UNDECIDED);
        }
        // Only exact masses prove a species conservable; the leak search may lean on the solver's
        // support, since every leak it reports is verified on its own.
        TreeSet<Integer> conserved = new TreeSet<>(family.masses().keySet());
        if (conserved.size() == n) {
            return result(network, Set.of(), Set.of(), null, ConsistencyResult.EXACT);
        }
        Set<Integer> assumed = family.status() == MassFamily.Status.EXACT ? conserved : family.floatSupport();
        LeakSearch leaks = new LeakSearch(network, assumed, budget);
        LeakSearch.Leak cover = leaks.covering();
        if (cover == null && leaks.undecided()) {
            return result(network, Set.of(), Set.of(), null, ConsistencyResult.UNDECIDED);
        }
        Set<Integer> unconserved = cover == null ? Set.of() : cover.net().keySet();
        TreeSet<Integer> rest = new TreeSet<>();
        for (int i = 0; i < n; i++) {
            if (!conserved.contains(i) && !unconserved.contains(i)) {
                rest.add(i);
            }
        }
        prove(network, rest);
        LeakSearch.Leak shown = unconserved.isEmpty() ? null : leaks.small();
        return result(network, unconserved, rest, shown == null ? cover : shown,
                rest.isEmpty() ? ConsistencyResult.EXACT : ConsistencyResult.PARTIAL);
    }

    /**
     * Species that no leak makes are conservable, but not by element weights (those are forced to
     * zero by some imbalanced reaction). Frees their masses, then those of their neighbours (species
     * sharing a reaction), widening until every one is proven or every mass is free (the plain LP
     * of Gevorgyan et al.). Removes the proven ones from {@code rest}.
     */
    private void prove(InternalNetwork network, TreeSet<Integer> rest) {
        TreeSet<Integer> freed = new TreeSet<>(rest);
        while (!rest.isEmpty()) {
            MassFamily.Outcome wider = MassFamily.search(network, freed, budget);
            rest.removeAll(wider.masses().keySet());
            if (wider.status() == MassFamily.Status.UNDECIDED || freed.size() == network.size()) {
                return;
            }
            TreeSet<Integer> next = new TreeSet<>(freed);
            for (InternalNetwork.Column c : network.columns()) {
                if (c.entries().keySet().stream().anyMatch(freed::contains)) {
                    next.addAll(c.entries().keySet());
                }
            }
            if (next.size() == freed.size()) {
                // Nothing links the rest to more species: free every mass.
                for (int i = 0; i < network.size(); i++) {
                    next.add(i);
                }
            }
            freed = next;
        }
    }

    private static ConsistencyResult result(InternalNetwork network, Set<Integer> unconserved, Set<Integer> undetermined,
                                            LeakSearch.Leak leak, String verification) {
        TreeSet<String> names = new TreeSet<>();
        unconserved.forEach(i -> names.add(network.species().get(i)));
        TreeSet<String> unsettled = new TreeSet<>();
        undetermined.forEach(i -> unsettled.add(network.species().get(i)));
        SortedMap<String, Rational> fluxes = new TreeMap<>();
        SortedMap<String, Rational> net = new TreeMap<>();
        if (leak != null) {
            for (Map.Entry<Integer, Rational> e : leak.fluxes().entrySet()) {
                fluxes.merge(network.columns().get(e.getKey()).reaction(), e.getValue(), Rational::add);
            }
            leak.net().forEach((i, x) -> net.put(network.species().get(i), x));
        }
        return new ConsistencyResult(network.size(), network.columns().size(), names, unsettled, fluxes, net, verification);
    }
}
