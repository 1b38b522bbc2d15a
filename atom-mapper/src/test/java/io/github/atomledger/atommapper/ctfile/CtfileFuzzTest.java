package io.github.atomledger.atommapper.ctfile;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.FuzzTest;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Tag;

/**
 * Issue 15: coverage-guided fuzzing of MDL file reading (Jazzer). The contract: any text either
 * becomes a molecule (molfile) or a reaction (RXN) or is refused with a {@link StructureException};
 * no other exception, CDK's runtime exceptions included, escapes; an RXN file that reads can be
 * laid onto a reaction without throwing; the SD scanner never throws on any bytes. Seeds: a
 * pyruvate molfile (V2000 and V3000) and the carbonic acid RXN file of {@link RxnFileTest}.
 *
 * <p>Regression mode replays {@code src/test/resources/.../CtfileFuzzTestInputs/<method>/};
 * {@code mvn -Pfuzz -pl atom-mapper test -Dtest='CtfileFuzzTest#molfileRefusesOnlyWithStructureErrorsLong'}
 * fuzzes for ten minutes.
 */
class CtfileFuzzTest {

    private static final int MAX_LENGTH = 6000;

    @FuzzTest
    void molfileRefusesOnlyWithStructureErrors(byte[] input) {
        molfile(input);
    }

    @Tag("fuzz-long")
    @FuzzTest(maxDuration = "10m")
    void molfileRefusesOnlyWithStructureErrorsLong(byte[] input) {
        molfile(input);
    }

    @FuzzTest
    void rxnRefusesOnlyWithStructureErrors(byte[] input) {
        rxn(input);
    }

    @Tag("fuzz-long")
    @FuzzTest(maxDuration = "10m")
    void rxnRefusesOnlyWithStructureErrorsLong(byte[] input) {
        rxn(input);
    }

    private static void molfile(byte[] input) {
        if (input.length > MAX_LENGTH) {
            return;
        }
        String text = new String(input, StandardCharsets.UTF_8);
        try {
            Structure s = Structure.fromMolfile(text);
            assertThat(s.mapNumbers()).hasSize(s.heavyAtomCount());
            assertThat(s.formula()).isNotNull();
        } catch (StructureException e) {
            assertThat(e.line()).isGreaterThanOrEqualTo(0);
        }
        try {
            SdFileScanner.scan(new ByteArrayInputStream(input), "ChEBI ID", r -> assertThat(r.length()).isPositive());
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    private static void rxn(byte[] input) {
        if (input.length > MAX_LENGTH) {
            return;
        }
        RxnFile rxn;
        try {
            rxn = RxnFile.parse(new String(input, StandardCharsets.UTF_8));
        } catch (StructureException e) {
            return;
        }
        try {
            ReactionInput reaction = new ReactionInput("CA",
                    List.of(new Participant("co2", Structure.fromSmiles("O=C=O"), 1),
                            new Participant("h2o", Structure.fromSmiles("O"), 1)),
                    List.of(new Participant("h2co3", Structure.fromSmiles("OC(O)=O"), 1)));
            assertThat(RxnMaps.onto(rxn, reaction)).isNotNull();
        } catch (StructureException e) {
            throw new AssertionError(e);
        }
    }
}
