package io.github.atomledger.checker.model.internal;

import java.util.ArrayList;
import java.util.List;

/** Species references of one reaction as written, with their lines. */
public final class RawReaction {

    /** One speciesReference: species id, stoichiometry text (null when absent), line. */
    public record Ref(String species, String stoichiometry, int line) {
    }

    private final String id;
    private final int line;
    private final List<Ref> reactants = new ArrayList<>();
    private final List<Ref> products = new ArrayList<>();
    private final List<String> modifiers = new ArrayList<>();

    RawReaction(String id, int line) {
        this.id = id;
        this.line = line;
    }

    public String id() {
        return id;
    }

    public int line() {
        return line;
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
