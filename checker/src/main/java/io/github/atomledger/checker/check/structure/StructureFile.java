package io.github.atomledger.checker.check.structure;

import java.util.Collection;
import java.util.List;
import java.util.Optional;

/**
 * One configured structure file or directory ({@code atomledger.structures}): it answers which
 * structure it holds for a species id or a cross-reference, and reads the texts on demand, so a
 * file of a hundred thousand records costs only the records a model needs.
 */
public sealed interface StructureFile permits StructureTable, MolfileDirectory, SdFile {

    /** The file as reports name it (relative to the project when inside it). */
    String display();

    /** The source a species-keyed entry of this file has. */
    SpeciesStructures.Source speciesSource();

    /** The entry keyed by this species id, if any. */
    Optional<Entry> species(String id);

    /** The entry keyed by this cross-reference, if any. */
    Optional<Entry> reference(CrossReference reference);

    /** Reads the texts of these entries together (one pass over a compressed file); optional. */
    default void prefetch(Collection<Entry> entries) {
    }

    /** The structure text of an entry of this file (SMILES, InChI or a molfile). */
    String text(Entry entry);

    /** Records of the file that cannot be used at all (SD records without an id, for one). */
    default List<SpeciesStructures.Problem> problems() {
        return List.of();
    }

    /**
     * A structure in a file, before its text is read.
     *
     * @param kind   "smiles", "inchi" or "molfile"
     * @param origin where it is, for people ({@code structures.tsv:12}, {@code chebi.sdf record 3 (line 41)})
     * @param line   1-based line where it starts in the file
     * @param key    the file's own handle for it (a row's text, a path, a record number)
     */
    record Entry(String kind, String origin, long line, String key) {
    }
}
