package io.github.atomledger.checker.report;

import java.util.List;
import java.util.Objects;

/**
 * What the HTML report shows of one reaction's atom map: a status, a one-line summary, notes, and
 * the drawing as SVG (with and without atom indices). Built from an atom-mapper result by
 * {@link MapPictures}; the report only places it. (The engine's own record of a map is
 * {@code check.mapping.ReactionMapping}; this is its view for people.)
 *
 * @param status         the mapping status label (the engine's labels: "mapped", "ambiguous",
 *                       "best-found", "unmappable", "no-structure", "skipped"; the atom mapper's
 *                       own "too-large" too), used for the status filter
 * @param summary        one sentence for people, e.g. "6 carbons mapped, 4 bond edits (proven minimum)"
 * @param svg            a self-contained SVG document, or "" when there is no drawing; atom indices
 *                       are drawn as elements of class {@code annotation}, which the report shows
 *                       only on request
 * @param notes          further sentences (stereo pins, reasons), in a stable order
 */
public record MapPicture(String status, String summary, String svg, List<String> notes) {

    public MapPicture {
        Objects.requireNonNull(status, "status");
        summary = summary == null ? "" : summary;
        svg = svg == null ? "" : svg;
        notes = List.copyOf(notes);
    }
}
