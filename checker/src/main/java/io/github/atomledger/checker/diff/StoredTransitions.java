package io.github.atomledger.checker.diff;

import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.transitions.AnnotationIndex;
import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.model.internal.CappedInputStream;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.zip.GZIPInputStream;

/**
 * Carbon transitions as annotated in the model file (AtomLedger's {@code atomTransitions}
 * reaction annotation, curated or inferred). Reactions whose annotation cannot be read are left
 * out; reading the file is bounded by the same byte cap as loading it.
 */
public final class StoredTransitions implements CarbonTransitions {

    private final long maxBytes;

    /** @param maxBytes the most bytes of XML read from one file, after gzip */
    public StoredTransitions(long maxBytes) {
        this.maxBytes = maxBytes;
    }

    @Override
    public Map<String, List<AtomTransition>> carbons(ModelResult result, Path file) {
        String text = text(file, result.file());
        AnnotationIndex index = AnnotationIndex.scan(text, result.file());
        Map<String, List<AtomTransition>> out = new TreeMap<>();
        index.reactions().forEach((id, spot) -> {
            TransitionAnnotation stored = spot.stored();
            if (stored != null && spot.storedError() == null && !stored.carbons().isEmpty()) {
                out.put(id, stored.carbons());
            }
        });
        return out;
    }

    private String text(Path file, String display) {
        try {
            byte[] bytes = Files.readAllBytes(file);
            boolean gzip = bytes.length > 1 && (bytes[0] & 0xff) == 0x1f && (bytes[1] & 0xff) == 0x8b;
            if (!gzip) {
                return new String(bytes, StandardCharsets.UTF_8);
            }
            try (InputStream in = new CappedInputStream(new GZIPInputStream(new ByteArrayInputStream(bytes)), maxBytes)) {
                return new String(in.readAllBytes(), StandardCharsets.UTF_8);
            }
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot read the model file for its carbon transitions: "
                    + e.getMessage(), e);
        }
    }
}
