package io.github.atomledger.checker.check.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.groups.Tuple.tuple;

import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Formula and charge versus the CDK-derived ones (structure fixture and table; expected values in its header). */
class StructureFormulaCheckTest {

    private static List<Finding> findings(String rule) {
        return TestModels.result("structure/formula-vs-structure.xml", "structure/formula-vs-structure.tsv").allFindings().stream()
                .filter(f -> f.ruleId().equals(rule)).toList();
    }

    @Test
    void reportsAProtonationOnlyDifferenceAsItsOwnMilderFinding() {
        assertThat(findings("structure.protonation")).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("M_pyr_c");
            assertThat(f.severity()).isEqualTo(Severity.WARNING);
            assertThat(f.data()).containsEntry("declared", "C3H3O3").containsEntry("derived", "C3H4O3")
                    .containsEntry("delta.H", "-1").containsEntry("delta.charge", "-1")
                    .containsEntry("declaredCharge", "-1").containsEntry("derivedCharge", "0").containsEntry("source", "table");
            assertThat(f.message()).isEqualTo("Species M_pyr_c is declared as C3H3O3 (charge -1) but its structure is C3H4O3"
                    + " (charge 0): the structure has 1 proton(s) more, a protonation-state difference only.");
        });
    }

    @Test
    void reportsHeavyAtomAndChargeOnlyDifferencesAsErrors() {
        assertThat(findings("structure.formula-mismatch"))
                .extracting(Finding::elementId, Finding::severity, f -> f.data().getOrDefault("delta.O", ""),
                        f -> f.data().getOrDefault("delta.charge", ""))
                .containsExactlyInAnyOrder(tuple("M_ac_c", Severity.ERROR, "1", "-1"), tuple("M_pyr2_c", Severity.ERROR, "", "1"));
    }

    @Test
    void reportsUnreadableStructures() {
        assertThat(findings("structure.invalid")).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("M_bad_c");
            assertThat(f.data()).containsEntry("text", "C1CC").containsEntry("source", "table");
        });
    }

    @Test
    void leavesAgreeingAndPolymerSpeciesAlone() {
        assertThat(TestModels.result("structure/formula-vs-structure.xml", "structure/formula-vs-structure.tsv").allFindings())
                .extracting(Finding::elementId).doesNotContain("M_glc_c", "M_poly_c");
    }
}
