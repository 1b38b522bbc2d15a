package io.github.atomledger.checker.model;

import java.util.List;
import java.util.Objects;

/**
 * What the checks need to know about one reaction, read-only.
 *
 * @param id         the SBML id
 * @param name       the name, or the id when it has none
 * @param reversible the {@code reversible} flag
 * @param sboTerm    the SBO term as {@code "SBO:0000176"}, or "" when unset
 * @param reactants  reactant references in document order
 * @param products   product references in document order
 * @param modifiers  modifier species ids in document order
 * @param line       1-based line of the reaction start tag, 0 when unknown
 */
public record ReactionInfo(String id, String name, boolean reversible, String sboTerm,
                           List<Participant> reactants, List<Participant> products,
                           List<String> modifiers, int line) {

    public ReactionInfo {
        Objects.requireNonNull(id, "id");
        name = name == null || name.isBlank() ? id : name;
        sboTerm = sboTerm == null ? "" : sboTerm;
        reactants = List.copyOf(reactants);
        products = List.copyOf(products);
        modifiers = List.copyOf(modifiers);
    }

    /** True when one side has no species references at all. */
    public boolean isOneSided() {
        return reactants.isEmpty() || products.isEmpty();
    }

    /** Reactants and products, reactants first; unmodifiable. */
    public List<Participant> participants() {
        List<Participant> all = new java.util.ArrayList<>(reactants.size() + products.size());
        all.addAll(reactants);
        all.addAll(products);
        return java.util.Collections.unmodifiableList(all);
    }
}
