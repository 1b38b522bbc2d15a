package io.github.atomledger.checker.check.structure;

import io.github.atomledger.atommapper.structure.Structure;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The structure chosen for each species, with where it came from, and the problems met while
 * resolving them. Immutable.
 *
 * @param tableFile the structure table as reports name it (relative to the project directory), or
 *                  "" when there is none; findings about a table row point at this file
 */
public record SpeciesStructures(Map<String, Resolved> bySpecies, List<Problem> problems, String tableFile) {

    public static final SpeciesStructures EMPTY = new SpeciesStructures(Map.of(), List.of());

    /** Without a structure table. */
    public SpeciesStructures(Map<String, Resolved> bySpecies, List<Problem> problems) {
        this(bySpecies, problems, "");
    }

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
        tableFile = tableFile == null ? "" : tableFile;
    }

    /** Species whose structure text cannot be read (from any source): they have a structure, a broken one. */
    public java.util.Set<String> unreadable() {
        java.util.Set<String> out = new java.util.TreeSet<>();
        problems.stream().filter(p -> p.kind().equals("invalid")).forEach(p -> out.add(p.species()));
        return out;
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
