package io.github.atomledger.checker.model;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.transitions.AnnotationIndex;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Tag;

/**
 * Coverage-guided fuzzing of SBML loading (Jazzer) on mutated bytes: {@link ModelLoader} and the
 * {@link AnnotationIndex} scan read the same file. The contract under test: either reader returns
 * or throws {@link AtomLedgerException} whose message starts with the file name and is one line;
 * nothing else escapes (no NullPointerException from JSBML, no raw XMLStreamException) and
 * nothing hangs. A 1 MiB cap keeps gzip inputs small.
 *
 * <p>Regression mode (normal test command) replays the kept inputs in
 * {@code src/test/resources/.../ModelLoaderFuzzTestInputs/loadRefusesOnlyWithAtomLedgerException/}
 * (small SBML models, hostile ones and any crasher found);
 * {@code mvn -Pfuzz test -pl checker -Dtest=ModelLoaderFuzzTest} fuzzes for ten minutes.
 */
class ModelLoaderFuzzTest {

    private static final long CAP = 1 << 20;
    private static final String DISPLAY = "models/fuzz.xml";
    private static final Path FILE = tempFile();

    @FuzzTest
    void loadRefusesOnlyWithAtomLedgerException(byte[] input) {
        check(input);
    }

    @Tag("fuzz-long")
    @FuzzTest(maxDuration = "10m")
    void loadRefusesOnlyWithAtomLedgerExceptionLong(byte[] input) {
        check(input);
    }

    private static void check(byte[] input) {
        try {
            Files.write(FILE, input);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        try {
            ModelView model = new ModelLoader(new LoadOptions(CAP)).load(FILE, DISPLAY);
            assertThat(model.file()).isEqualTo(DISPLAY);
        } catch (AtomLedgerException e) {
            assertDocumented(e);
        }
        try {
            AnnotationIndex.read(FILE, DISPLAY, CAP);
        } catch (AtomLedgerException e) {
            assertDocumented(e);
        }
    }

    private static void assertDocumented(AtomLedgerException e) {
        assertThat(e.getMessage()).startsWith(DISPLAY + ":").doesNotContain("\n");
    }

    private static Path tempFile() {
        try {
            Path dir = Files.createTempDirectory("atomledger-fuzz");
            dir.toFile().deleteOnExit();
            Path file = dir.resolve("fuzz.xml");
            file.toFile().deleteOnExit();
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
