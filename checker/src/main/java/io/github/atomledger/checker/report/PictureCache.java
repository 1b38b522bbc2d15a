package io.github.atomledger.checker.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
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
        try {
            JsonNode o = JSON.readTree(json.toFile());
            List<String> notes = new ArrayList<>();
            o.get("notes").forEach(n -> notes.add(n.asText()));
            Path svg = null;
            if (o.get("drawn").asBoolean()) {
                svg = base(key).resolveSibling(key + ".svg");
                if (!Files.isRegularFile(svg)) {
                    return null;
                }
            }
            return new Entry(svg, o.get("width").asInt(), o.get("height").asInt(), notes);
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    void put(String key, byte[] svg, int width, int height, List<String> notes) {
        try {
            Path json = base(key).resolveSibling(key + ".json");
            Files.createDirectories(json.getParent());
            if (svg != null) {
                atomically(base(key).resolveSibling(key + ".svg"), svg);
            }
            ObjectNode o = JSON.createObjectNode();
            o.put("drawn", svg != null);
            o.put("width", width);
            o.put("height", height);
            ArrayNode list = o.putArray("notes");
            notes.forEach(list::add);
            atomically(json, JSON.writeValueAsBytes(o));
        } catch (IOException e) {
            // A cache that cannot be written only costs time; the run goes on.
        }
    }

    static void atomically(Path target, byte[] bytes) throws IOException {
        Path tmp = Files.createTempFile(target.getParent(), "." + target.getFileName(), ".tmp");
        try {
            Files.write(tmp, bytes);
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
