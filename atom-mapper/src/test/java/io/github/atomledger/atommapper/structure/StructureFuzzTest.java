package io.github.atomledger.atommapper.structure;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Tag;

/**
 * Coverage-guided fuzzing of structure ingestion, {@link Structure#fromSmiles(String)} (Jazzer).
 * The contract under test: any text either becomes a structure whose heavy-atom count matches its
 * graph, or is refused with a {@link StructureException} that quotes the text; no other exception
 * (CDK's runtime exceptions included) escapes and nothing hangs.
 *
 * <p>Regression mode (normal test command) replays
 * {@code src/test/resources/.../StructureFuzzTestInputs/fromSmilesRefusesOnlyWithStructureErrors/};
 * {@code mvn -Pfuzz test -Dtest=StructureFuzzTest} fuzzes for ten minutes (see BENCHMARKS.md).
 */
class StructureFuzzTest {

    /** Longer SMILES are legal but only slow the fuzzer down without reaching new code. */
    private static final int MAX_LENGTH = 400;

    @FuzzTest
    void fromSmilesRefusesOnlyWithStructureErrors(byte[] input) {
        check(input);
    }

    @Tag("fuzz-long")
    @FuzzTest(maxDuration = "10m")
    void fromSmilesRefusesOnlyWithStructureErrorsLong(byte[] input) {
        check(input);
    }

    private static void check(byte[] input) {
        String smiles = new String(input, StandardCharsets.UTF_8);
        if (smiles.length() > MAX_LENGTH) {
            return;
        }
        Structure structure;
        try {
            structure = Structure.fromSmiles(smiles);
        } catch (StructureException e) {
            assertThat(e.getMessage()).contains("'" + smiles + "'");
            return;
        }
        assertThat(structure.heavyAtomCount()).isEqualTo(structure.graph().atomCount());
        assertThat(structure.canonicalSmiles()).isNotNull();
        assertThat(structure.formula()).isNotNull();
    }
}
