package io.github.atomledger.checker.report;

import java.util.List;
import java.util.Objects;

/**
 * A drawn reaction picture as the HTML report refers to it.
 *
 * @param file   the SVG file's name in the report's {@code pictures/} folder (content-addressed),
 *               or "" when nothing could be drawn
 * @param width  its width in px
 * @param height its height in px
 * @param notes  sentences on fallbacks the drawing took or why it failed (empty when CDK drew
 *               everything), in a stable order
 */
public record PictureFile(String file, int width, int height, List<String> notes) {

    public PictureFile {
        Objects.requireNonNull(file, "file");
        notes = List.copyOf(notes);
    }

    /** True when there is a picture. */
    public boolean drawn() {
        return !file.isEmpty();
    }
}
