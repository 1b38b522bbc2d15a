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

    /**
     * Where a structure came from. The order of precedence is {@link StructureResolver}'s:
     * structure files keyed by species id ({@link #TABLE}, {@link #MOLFILE}, {@link #SD_FILE}, in
     * the order the files are configured), then the species' notes, its MIRIAM InChI, structure
     * files keyed by cross-reference, and last the structures AtomLedger stored in the model.
     */
    public enum Source {
        TABLE("table"), MOLFILE("molfile"), SD_FILE("sd-file"), NOTES("notes"), MIRIAM_INCHI("miriam-inchi"),
        CROSS_REFERENCE("cross-reference"), MODEL_ANNOTATION("model-annotation");

        private final String label;

        Source(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /**
     * A species' structure: the parsed structure, its source and the text it came from.
     *
     * @param text   the SMILES or InChI as written; for a molfile, where it is (as {@code origin})
     * @param origin where the structure was found, for people: {@code structures.tsv:12},
     *               {@code chebi.sdf.gz record 17 (line 2301), chebi:CHEBI:15361}, {@code notes},
     *               {@code annotation}; "" when not recorded
     */
    public record Resolved(String species, Structure structure, Source source, String text, String origin) {

        public Resolved(String species, Structure structure, Source source, String text) {
            this(species, structure, source, text, "");
        }

        public Resolved {
            origin = origin == null ? "" : origin;
        }
    }

    /**
     * A problem: {@code kind} is "invalid" (text does not parse), "conflict" (two sources give
     * different structures), "unknown-species" (a table row names no species of the model) or
     * "unusable-record" (a record of a structure file cannot be used at all; {@code species} is "").
     *
     * @param tableLine the 1-based line in the file the problem is about, 0 when none
     * @param origin    the file (and record) the problem is about, "" when none
     */
    public record Problem(String species, String kind, Source source, String text, String message, int tableLine,
                          String origin) {

        public Problem(String species, String kind, Source source, String text, String message, int tableLine) {
            this(species, kind, source, text, message, tableLine, "");
        }

        public Problem {
            origin = origin == null ? "" : origin;
        }
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
