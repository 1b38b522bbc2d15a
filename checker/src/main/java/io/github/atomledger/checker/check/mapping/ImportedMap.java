package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.atommapper.mapping.AtomTransition;

import java.util.List;
import java.util.Objects;

/**
 * A curated map brought in from an MDL RXN file ({@code atomledger.curatedMaps}, file name =
 * reaction id): the carbon transitions read onto the reaction's structures, or why they could not
 * be read. Valid readings are judged exactly like curated maps stored in the model, and
 * {@code annotate} writes them into the model as curated annotations.
 *
 * @param reactionId the reaction the file is named after
 * @param file       the file as reports name it
 * @param carbons    carbon transitions read from the file, sorted (empty when unreadable)
 * @param problems   why the file's molecules do not fit the reaction (each names a line); the map
 *                   is then invalid
 * @param unreadable why the file could not be used at all (unreadable, no such reaction, nothing
 *                   to check it against), "" when it could
 * @param line       the line of the file the {@code unreadable} reason is about, 0 when none
 */
public record ImportedMap(String reactionId, String file, List<AtomTransition> carbons, List<String> problems,
                          String unreadable, int line) {

    public ImportedMap {
        Objects.requireNonNull(reactionId, "reactionId");
        Objects.requireNonNull(file, "file");
        carbons = carbons.stream().sorted().toList();
        problems = List.copyOf(problems);
        unreadable = unreadable == null ? "" : unreadable;
    }

    /** True when the file was read onto the reaction (its map may still be invalid). */
    public boolean read() {
        return unreadable.isEmpty();
    }
}
