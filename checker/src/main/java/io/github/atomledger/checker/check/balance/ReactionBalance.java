package io.github.atomledger.checker.check.balance;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * The net element vector and net charge of one reaction, products minus reactants, each
 * species weighted by its stoichiometric coefficient, in exact arithmetic.
 *
 * @param reactionId            the reaction
 * @param classification        its class
 * @param elements              non-zero net counts by symbol (pseudo-elements included); empty
 *                              when balanced; meaningful only when {@link #elementsComputable()}
 * @param elementsComputable    false when a participant lacks a usable formula or coefficient,
 *                              or has a {@code (...)n} polymer formula
 * @param charge                the net charge, or null when not computable
 * @param withoutFormula        participants with no formula, sorted
 * @param invalidFormula        participants whose formula text does not parse, sorted
 * @param polymer               participants with a {@code (...)n} formula, sorted
 * @param withoutCharge         participants with no usable charge, sorted
 * @param missingSpecies        referenced species that do not exist in the model, sorted
 * @param badCoefficients       participants whose stoichiometry is unset, non-finite or negative
 *                              (species id to the text as written), sorted
 */
public record ReactionBalance(String reactionId, Classification classification,
                              SortedMap<String, Rational> elements, boolean elementsComputable,
                              Rational charge, List<String> withoutFormula, List<String> invalidFormula,
                              List<String> polymer, List<String> withoutCharge, List<String> missingSpecies,
                              SortedMap<String, String> badCoefficients) {

    public ReactionBalance {
        Objects.requireNonNull(reactionId, "reactionId");
        Objects.requireNonNull(classification, "classification");
        elements = Collections.unmodifiableSortedMap(new TreeMap<>(elements));
        withoutFormula = List.copyOf(withoutFormula);
        invalidFormula = List.copyOf(invalidFormula);
        polymer = List.copyOf(polymer);
        withoutCharge = List.copyOf(withoutCharge);
        missingSpecies = List.copyOf(missingSpecies);
        badCoefficients = Collections.unmodifiableSortedMap(new TreeMap<>(badCoefficients));
    }

    public ReactionClass reactionClass() {
        return classification.reactionClass();
    }

    /** True when the element vector is known and not zero. */
    public boolean elementImbalanced() {
        return elementsComputable && !elements.isEmpty();
    }

    /** True when the charge is known and not zero. */
    public boolean chargeImbalanced() {
        return charge != null && !charge.isZero();
    }
}
