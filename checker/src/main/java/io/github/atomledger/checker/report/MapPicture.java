package io.github.atomledger.checker.report;

import java.util.List;
import java.util.Objects;

/**
 * What the HTML report shows of one reaction's atom map: a status, a one-line summary, notes, and
 * the drawing: first as a request ({@link PictureRequest}), then, once the report has drawn it,
 * as a file of the report ({@link PictureFile}). Built by {@link MapPictures}; the report only
 * places it. (The engine's own record of a map is {@code check.mapping.ReactionMapping}; this is
 * its view for people.)
 *
 * @param status  the mapping status label (the engine's labels: "mapped", "ambiguous",
 *                "best-found", "unmappable", "no-structure", "skipped"; the atom mapper's
 *                own "too-large" too), used for the status filter
 * @param summary one sentence for people, e.g. "6 carbons mapped, 4 bond edits (proven minimum)"
 * @param drawing what to draw, or null when there is nothing to draw
 * @param picture the drawn picture, or null until drawn (and when there is nothing to draw)
 * @param notes   further sentences (stereo pins, reasons), in a stable order
 */
public record MapPicture(String status, String summary, PictureRequest drawing, PictureFile picture,
                         List<String> notes) {

    public MapPicture {
        Objects.requireNonNull(status, "status");
        summary = summary == null ? "" : summary;
        notes = List.copyOf(notes);
    }

    /** The same view with its drawing done. */
    public MapPicture withPicture(PictureFile drawn) {
        return new MapPicture(status, summary, drawing, drawn, notes);
    }

    /** True when a picture was drawn for it. */
    public boolean drawn() {
        return picture != null && picture.drawn();
    }
}
