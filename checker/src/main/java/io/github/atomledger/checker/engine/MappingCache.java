package io.github.atomledger.checker.engine;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.ReactionMapping;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.TreeMap;

/**
 * Mapping results on disk, keyed by a SHA-256 of the canonical reaction (participants sorted by
 * species id with their coefficients and structure texts), the mapper version and the options.
 * One small JSON file per reaction. A damaged or unreadable entry counts as a miss; writes are
 * atomic, so concurrent runs never see half a file. Thread-safe.
 */
final class MappingCache {

    private static final ObjectMapper JSON = new ObjectMapper();
    private final Path dir;

    MappingCache(Path dir) {
        this.dir = dir;
    }

    static String key(String canonicalReaction) {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(canonicalReaction.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private Path file(String key) {
        return dir.resolve(key.substring(0, 2)).resolve(key + ".json");
    }

    ReactionMapping get(String key, String reactionId) {
        Path f = file(key);
        if (!Files.isRegularFile(f)) {
            return null;
        }
        try {
            return fromJson(JSON.readTree(f.toFile()), reactionId);
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    void put(String key, ReactionMapping m) {
        Path f = file(key);
        try {
            Files.createDirectories(f.getParent());
            Path tmp = Files.createTempFile(f.getParent(), key, ".tmp");
            Files.write(tmp, JSON.writeValueAsBytes(toJson(m)));
            try {
                Files.move(tmp, f, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, f, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException e) {
            // A cache that cannot be written only costs time; the run goes on.
        }
    }

    static ObjectNode toJson(ReactionMapping m) {
        ObjectNode o = JSON.createObjectNode();
        o.put("status", m.status().label());
        o.set("carbons", transitions(m.carbons()));
        ArrayNode alts = o.putArray("alternatives");
        m.alternatives().forEach(a -> alts.add(transitions(a)));
        o.put("cost", m.cost());
        o.put("lowerBound", m.lowerBound());
        o.put("mappedSmiles", m.mappedSmiles());
        ArrayNode notes = o.putArray("stereoNotes");
        m.stereoNotes().forEach(notes::add);
        o.put("reason", m.reason());
        ObjectNode diff = o.putObject("elementDifference");
        m.elementDifference().forEach(diff::put);
        ArrayNode missing = o.putArray("missingStructures");
        m.missingStructures().forEach(missing::add);
        ObjectNode fp = o.putObject("fingerprints");
        m.fingerprints().forEach(fp::put);
        o.set("confidence", ConfidenceJson.write(m.confidence()));
        return o;
    }

    static ArrayNode transitions(List<AtomTransition> list) {
        ArrayNode a = JSON.createArrayNode();
        for (AtomTransition t : list) {
            ArrayNode row = a.addArray();
            row.add(t.from().species()).add(t.from().copy()).add(t.from().atom())
                    .add(t.to().species()).add(t.to().copy()).add(t.to().atom()).add(t.element());
        }
        return a;
    }

    static ReactionMapping fromJson(JsonNode o, String reactionId) {
        List<List<AtomTransition>> alts = new ArrayList<>();
        o.get("alternatives").forEach(a -> alts.add(transitions(a)));
        List<String> notes = new ArrayList<>();
        o.get("stereoNotes").forEach(n -> notes.add(n.asText()));
        TreeMap<String, Long> diff = new TreeMap<>();
        o.get("elementDifference").fields().forEachRemaining(e -> diff.put(e.getKey(), e.getValue().asLong()));
        List<String> missing = new ArrayList<>();
        o.get("missingStructures").forEach(n -> missing.add(n.asText()));
        TreeMap<String, String> fp = new TreeMap<>();
        o.get("fingerprints").fields().forEachRemaining(e -> fp.put(e.getKey(), e.getValue().asText()));
        return new ReactionMapping(reactionId, MapStatus.fromLabel(o.get("status").asText()), transitions(o.get("carbons")),
                alts, o.get("cost").asInt(), o.get("lowerBound").asInt(), o.get("mappedSmiles").asText(), notes,
                o.get("reason").asText(), diff, missing, fp, ConfidenceJson.read(o.get("confidence")));
    }

    static List<AtomTransition> transitions(JsonNode a) {
        List<AtomTransition> out = new ArrayList<>();
        for (JsonNode r : a) {
            out.add(new AtomTransition(new AtomRef(r.get(0).asText(), r.get(1).asInt(), r.get(2).asInt()),
                    new AtomRef(r.get(3).asText(), r.get(4).asInt(), r.get(5).asInt()), r.get(6).asText()));
        }
        return out;
    }
}
