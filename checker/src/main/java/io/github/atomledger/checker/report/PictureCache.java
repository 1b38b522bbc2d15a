package io.github.atomledger.checker.report;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Drawn pictures on disk, beside the mapping cache: {@code <cacheDirectory>/pictures/ab/<key>.svg}
 * holds the drawing and {@code <key>.json} its size and notes (written last, so a present JSON
 * means a complete entry; a failed drawing has a JSON and no SVG, so it is not retried on every
 * run). Keys are {@link PictureRequest#key()}. A damaged or unreadable entry is a miss; a write
 * that fails only costs time. Writes are atomic. Thread-safe.
 */
final class PictureCache {

    private static final ObjectMapper JSON = new ObjectMapper();

    /** A cached picture: the SVG file (null when the drawing failed), size and notes. */
    record Entry(Path svg, int width, int height, List<String> notes) {
    }

    private final Path dir;

    PictureCache(Path mappingCacheDirectory) {
        this.dir = mappingCacheDirectory.resolve("pictures");
    }

    private Path base(String key) {
        return dir.resolve(key.substring(0, 2)).resolve(key);
    }

    Entry get(String key) {
        Path json = base(key).resolveSibling(key + ".json");
        if (!Files.isRegularFile(json)) {
            return null;
        }
        // Read with the streaming parser: the object mapper's start-up is a visible part of a warm run.
        try (JsonParser p = JSON.getFactory().createParser(json.toFile())) {
            boolean drawn = false;
            int width = -1;
            int height = -1;
            List<String> notes = null;
            if (p.nextToken() != JsonToken.START_OBJECT) {
                return null;
            }
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String field = p.currentName();
                JsonToken value = p.nextToken();
                switch (field) {
                    case "drawn" -> drawn = value == JsonToken.VALUE_TRUE;
                    case "width" -> width = p.getIntValue();
                    case "height" -> height = p.getIntValue();
                    case "notes" -> {
                        notes = new ArrayList<>();
                        while (p.nextToken() == JsonToken.VALUE_STRING) {
                            notes.add(p.getText());
                        }
                    }
                    default -> p.skipChildren();
                }
            }
            if (notes == null || width < 0 || height < 0) {
                return null;
            }
            Path svg = null;
            if (drawn) {
                svg = base(key).resolveSibling(key + ".svg");
                if (!Files.isRegularFile(svg)) {
                    return null;
                }
            }
            return new Entry(svg, width, height, notes);
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    void put(String key, byte[] svg, int width, int height, List<String> notes) {
        try {
            Path json = base(key).resolveSibling(key + ".json");
            Files.createDirectories(json.getParent());
            if (svg != null) {
                ReportFiles.write(base(key).resolveSibling(key + ".svg"), svg);
            }
            ObjectNode o = JSON.createObjectNode();
            o.put("drawn", svg != null);
            o.put("width", width);
            o.put("height", height);
            ArrayNode list = o.putArray("notes");
            notes.forEach(list::add);
            ReportFiles.write(json, JSON.writeValueAsBytes(o));
        } catch (IOException e) {
            // A cache that cannot be written only costs time; the run goes on.
        }
    }
}
