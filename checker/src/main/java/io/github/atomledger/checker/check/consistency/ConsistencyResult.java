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
 *                     sorted, each proven by an exact leak; empty when the network is consistent
 * @param undetermined metabolites whose status could not be proven either way (neither an exact
 *                     leak nor an exact mass vector was found), sorted; empty unless partial
 * @param fluxes       a small combination of reactions (reaction id to exact coefficient) whose
 *                     net stoichiometry is non-negative and not zero: it makes matter from nothing;
 *                     empty when consistent
 * @param net          the net stoichiometry of {@code fluxes} (species to exact amount, only
 *                     non-zero entries)
 * @param verification {@value #EXACT} when every metabolite was proven in rational arithmetic:
 *                     exact conserved mass vectors cover the conserved ones and an exact leak makes
 *                     every unconserved one; {@value #PARTIAL} when some are {@code undetermined};
 *                     {@value #UNDECIDED} when a solve ran out of its time budget (no verdict:
 *                     {@link #consistent()} is then true but means nothing)
 */
public record ConsistencyResult(int metabolites, int reactions, SortedSet<String> unconserved, SortedSet<String> undetermined,
                                SortedMap<String, Rational> fluxes, SortedMap<String, Rational> net,
                                String verification) {

    public static final String EXACT = "exact";
    public static final String PARTIAL = "partial";
    public static final String UNDECIDED = "undecided";

    public ConsistencyResult {
        unconserved = Collections.unmodifiableSortedSet(new TreeSet<>(unconserved));
        undetermined = Collections.unmodifiableSortedSet(new TreeSet<>(undetermined));
        fluxes = Collections.unmodifiableSortedMap(new TreeMap<>(fluxes));
        net = Collections.unmodifiableSortedMap(new TreeMap<>(net));
    }

    /** True when no unconserved metabolite was found (also when undecided). */
    public boolean consistent() {
        return unconserved.isEmpty();
    }

    /** True when the solver ran out of its budget before a verdict. */
    public boolean undecided() {
        return UNDECIDED.equals(verification);
    }

    /** The reactions of {@link #fluxes()}, sorted. */
    public List<String> causingReactions() {
        return List.copyOf(fluxes.keySet());
    }
}
