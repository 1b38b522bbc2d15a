package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.Collections;
import java.util.List;
import java.util.SortedMap;
import java.util.SortedSet;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The outcome of the stoichiometric consistency test of one model.
 *
 * @param metabolites  metabolites in the tested network (non-boundary species of internal reactions)
 * @param reactions    internal reactions tested
 * @param unconserved  metabolites that no strictly positive conserved mass vector can cover,
 *                     sorted; empty when the network is consistent
 * @param fluxes       a small combination of reactions (reaction id to exact coefficient) whose
 *                     net stoichiometry is non-negative and not zero: it makes matter from nothing;
 *                     empty when consistent
 * @param net          the net stoichiometry of {@code fluxes} (species to exact amount, only
 *                     non-zero entries)
 * @param verification "exact" when the verdict was re-checked in rational arithmetic (a mass
 *                     vector with Sᵀm = 0 for a consistent network; for an inconsistent one, every
 *                     unconserved metabolite is in the net output of a verified leak combination
 *                     and the last LP found no further one); "exact-partial" when the leak
 *                     combinations are verified but the search stopped at its round budget (the
 *                     list may be incomplete); "floating-point" when only the LP solver's answer
 *                     stands; "undecided" when the solver ran out of its time budget
 */
public record ConsistencyResult(int metabolites, int reactions, SortedSet<String> unconserved,
                                SortedMap<String, Rational> fluxes, SortedMap<String, Rational> net,
                                String verification) {

    public ConsistencyResult {
        unconserved = Collections.unmodifiableSortedSet(new TreeSet<>(unconserved));
        fluxes = Collections.unmodifiableSortedMap(new TreeMap<>(fluxes));
        net = Collections.unmodifiableSortedMap(new TreeMap<>(net));
    }

    /** True when no unconserved metabolite was found (also when undecided). */
    public boolean consistent() {
        return unconserved.isEmpty();
    }

    /** The reactions of {@link #fluxes()}, sorted. */
    public List<String> causingReactions() {
        return List.copyOf(fluxes.keySet());
    }
}
