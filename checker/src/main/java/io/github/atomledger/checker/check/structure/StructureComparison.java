package io.github.atomledger.checker.check.structure;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.atommapper.structure.Structure;

import java.util.SortedMap;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The difference between a species' declared formula and charge and those derived from its
 * structure: declared minus derived, per symbol, and for the charge.
 *
 * @param elements non-zero differences by symbol (declared − derived), sorted
 * @param charge   declared − derived charge, or null when the species declares no charge
 */
record StructureComparison(SortedMap<String, Long> elements, Rational charge) {

    static StructureComparison of(Formula declared, Rational declaredCharge, Structure structure) {
        SortedMap<String, Long> d = new TreeMap<>();
        TreeSet<String> symbols = new TreeSet<>(declared.counts().keySet());
        symbols.addAll(structure.formula().counts().keySet());
        for (String s : symbols) {
            long diff = declared.count(s) - structure.formula().count(s);
            if (diff != 0) {
                d.put(s, diff);
            }
        }
        Rational q = declaredCharge == null ? null : declaredCharge.subtract(Rational.of(structure.charge()));
        return new StructureComparison(d, q);
    }

    /** True when a symbol other than H differs. */
    boolean heavyAtomsDiffer() {
        return elements.keySet().stream().anyMatch(s -> !s.equals("H"));
    }

    long hydrogenDifference() {
        return elements.getOrDefault("H", 0L);
    }

    /**
     * True when only H and the charge differ, by the same amount (k protons more or fewer), or
     * only H differs and the species declares no charge.
     */
    boolean protonationOnly() {
        if (heavyAtomsDiffer() || hydrogenDifference() == 0) {
            return false;
        }
        return charge == null || charge.equals(Rational.of(hydrogenDifference()));
    }

    boolean identical() {
        return elements.isEmpty() && (charge == null || charge.isZero());
    }
}
