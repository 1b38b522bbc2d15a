package io.github.atomledger.checker.check.mapping;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.groups.Tuple.tuple;

import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Issue #13: problems with rows of the structure table point at the table's file and line. */
class StructureSourceCheckTest {

    private static List<Finding> findings() {
        return TestModels.result("structure/unknown-species.xml", "structure/unknown-species.tsv").allFindings();
    }

    @Test
    void tableRowProblemsNameTheTableFileAndLine() {
        assertThat(findings()).filteredOn(f -> f.ruleId().startsWith("structure.") && !f.ruleId().equals("structure.formula-mismatch")
                        && !f.ruleId().equals("structure.protonation"))
                .extracting(Finding::ruleId, Finding::elementId, Finding::modelFile, Finding::line)
                .containsExactly(tuple("structure.unknown-species", "M_ghost_c", "unknown-species.tsv", 4),
                        tuple("structure.invalid", "M_bad_c", "unknown-species.tsv", 5));
    }

    @Test
    void unknownSpeciesMessageSaysItOnce() {
        assertThat(findings()).filteredOn(f -> f.ruleId().equals("structure.unknown-species")).singleElement()
                .satisfies(f -> assertThat(f.message()).isEqualTo("The structure table names species M_ghost_c, which"
                        + " unknown-species.xml does not define."));
    }

    @Test
    void speciesWithAnUnreadableStructureIsNotAlsoReportedAsMissing() {
        assertThat(findings()).filteredOn(f -> f.ruleId().equals("mapping.structure-missing")).singleElement()
                .satisfies(f -> assertThat(f.data()).containsEntry("species", "M_x_c"));
        assertThat(TestModels.result("structure/unknown-species.xml", "structure/unknown-species.tsv").reactions().get(0)
                .mapping().reason()).isEqualTo("no structure for M_x_c; unreadable structure for M_bad_c");
    }
}
