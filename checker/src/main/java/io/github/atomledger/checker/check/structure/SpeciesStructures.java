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
}
