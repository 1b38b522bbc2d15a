package io.github.atomledger.checker.trace;

import java.util.Objects;

/**
 * A declared fate: in this pathway, this source carbon ends in this species (and, when given, at
 * this position).
 *
 * @param pathway  the pathway's name
 * @param carbon   the source carbon as reports name it ("C1", or a heavy-atom index "7")
 * @param species  the species it should end in
 * @param position the position in that species as reports name it, or "" for anywhere in it
 * @param file     the file it was read from, as reports show it
 * @param line     its 1-based line there
 */
public record FateExpectation(String pathway, String carbon, String species, String position, String file, int line) {

    public FateExpectation {
        Objects.requireNonNull(pathway, "pathway");
        Objects.requireNonNull(carbon, "carbon");
        Objects.requireNonNull(species, "species");
        position = position == null ? "" : position;
        file = file == null ? "" : file;
    }

    /** The fate as written: {@code co2_c} or {@code acac_c:C4}. */
    public String fateText() {
        return position.isEmpty() ? species : species + ":" + position;
    }

    /** Where it is written, {@code models/fates.tsv:3}. */
    public String where() {
        return file + ":" + line;
    }
}
