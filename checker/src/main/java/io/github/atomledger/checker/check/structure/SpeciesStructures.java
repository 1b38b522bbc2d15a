package io.github.atomledger.checker.check.structure;

import io.github.atomledger.atommapper.structure.Structure;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The structure chosen for each species, with where it came from, and the problems met while
 * resolving them. Immutable.
 */
public record SpeciesStructures(Map<String, Resolved> bySpecies, List<Problem> problems) {

    public static final SpeciesStructures EMPTY = new SpeciesStructures(Map.of(), List.of());

    /** Sources in order of precedence. */
    public enum Source {
        TABLE("table"), MIRIAM_INCHI("miriam-inchi"), MODEL_ANNOTATION("model-annotation");

        private final String label;

        Source(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /** A species' structure: the parsed structure, its source and the text it came from. */
    public record Resolved(String species, Structure structure, Source source, String text) {
    }

    /**
     * A problem: {@code kind} is "invalid" (text does not parse), "conflict" (two sources give
     * different structures) or "unknown-species" (a table row names no species of the model).
     */
    public record Problem(String species, String kind, Source source, String text, String message, int tableLine) {
    }

    public SpeciesStructures {
        bySpecies = Map.copyOf(bySpecies);
        problems = List.copyOf(problems);
    }

    public Optional<Resolved> get(String species) {
        return Optional.ofNullable(bySpecies.get(species));
    }

    /**
     * The readable name of heavy atom {@code atom} (1-based) of a species: the label its
     * structure's atom class gives ({@code "C3"}), else the index as text. A species without a
     * structure, or an index outside it, gives the index.
     */
    public String label(String species, int atom) {
        Resolved r = bySpecies.get(species);
        if (r == null || atom < 1 || atom > r.structure().heavyAtomCount()) {
            return Integer.toString(atom);
        }
        return r.structure().atomLabel(atom);
    }

    /** An atom of a reaction side as messages name it: {@code species#copy:label}. */
    public String name(io.github.atomledger.atommapper.mapping.AtomRef ref) {
        return ref.species() + "#" + ref.copy() + ":" + label(ref.species(), ref.atom());
    }
}
