package io.github.atomledger.checker.annotate;

import io.github.atomledger.checker.transitions.StoredStructure;
import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.checker.transitions.AnnotationIndex;
import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.SharedData;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.zip.GZIPInputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.xmlunit.builder.DiffBuilder;
import org.xmlunit.builder.Input;
import org.xmlunit.diff.Diff;

/**
 * Round trip on yeast-GEM 9.0.2 (gzip, 12 MB of SBML, 4,131 reactions; CC BY 4.0): annotating
 * every reaction changes nothing but our elements (compared with XMLUnit), the file stays gzip,
 * and a second run writes the same bytes.
 */
class YeastRoundTripTest {

    @TempDir
    Path dir;

    @Test
    void annotatingEveryYeastReactionChangesOnlyOurElements() throws IOException {
        Path source = SharedData.require("yeast-GEM.xml.gz");
        Path file = dir.resolve("yeast-GEM.xml.gz");
        Files.copy(source, file);
        AnnotationIndex index = AnnotationIndex.read(file, "yeast-GEM.xml.gz", 1L << 30);
        assertThat(index.reactions()).hasSize(4131);
        Map<String, TransitionAnnotation> all = new LinkedHashMap<>();
        for (String id : index.reactions().keySet()) {
            all.put(id, new TransitionAnnotation(TransitionAnnotation.INFERRED, "mapped", 1, "1",
                    List.of(new AtomTransition(new AtomRef("s_a", 1, 1), new AtomRef("s_b", 1, 1), "C")), "",
                    List.of(new StoredStructure("s_a", "sha256:01", "C"))));
        }
        ModelAnnotator annotator = new ModelAnnotator(false, false, 1L << 30);
        assertThat(annotator.annotate(file, "yeast-GEM.xml.gz", all).written()).isTrue();
        byte[] once = Files.readAllBytes(file);
        assertThat(once[0] & 0xff).isEqualTo(0x1f);
        Diff diff = DiffBuilder.compare(Input.fromByteArray(gunzip(Files.readAllBytes(source))))
                .withTest(Input.fromByteArray(gunzip(once)))
                .withNodeFilter(ModelAnnotatorTest::notOurs).ignoreWhitespace().checkForSimilar().build();
        assertThat(diff.hasDifferences()).as(diff.toString()).isFalse();
        assertThat(annotator.annotate(file, "yeast-GEM.xml.gz", all).wouldChange()).isFalse();
        assertThat(Files.readAllBytes(file)).isEqualTo(once);
    }

    private static byte[] gunzip(byte[] gz) throws IOException {
        try (InputStream in = new GZIPInputStream(new ByteArrayInputStream(gz))) {
            return in.readAllBytes();
        }
    }
}
