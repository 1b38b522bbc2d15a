package io.github.atomledger.checker.model.internal;

import java.util.ArrayList;
import java.util.List;

/** Species references of one reaction as written, with their lines and the reaction's SBO term. */
public final class RawReaction {

    /**
     * One speciesReference.
     *
     * @param species           the species attribute ("" when absent)
     * @param stoichiometry     the stoichiometry attribute text, null when absent
     * @param line              1-based line of the start tag
     * @param stoichiometryMath true when the reference has a Level 2 {@code <stoichiometryMath>} child
     */
    public record Ref(String species, String stoichiometry, int line, boolean stoichiometryMath) {

        Ref withStoichiometryMath() {
            return new Ref(species, stoichiometry, line, true);
        }
    }

    private final String id;
    private final int line;
    private final String sboTerm;
    private final List<Ref> reactants = new ArrayList<>();
    private final List<Ref> products = new ArrayList<>();
    private final List<String> modifiers = new ArrayList<>();

    RawReaction(String id, int line, String sboTerm) {
        this.id = id;
        this.line = line;
        this.sboTerm = sboTerm;
    }

    public String id() {
        return id;
    }

    public int line() {
        return line;
    }

    /** The SBO term as {@code "SBO:0000176"}, or "" when unset or not of that form. */
    public String sboTerm() {
        return sboTerm;
    }

    public List<Ref> reactants() {
        return reactants;
    }

    public List<Ref> products() {
        return products;
    }

    public List<String> modifiers() {
        return modifiers;
    }
}
