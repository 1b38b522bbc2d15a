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
        // Issue #13: one finding per model lists every protonation-only species.
        assertThat(findings("structure.protonation")).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("structures");
            assertThat(f.line()).isZero();
            assertThat(f.severity()).isEqualTo(Severity.WARNING);
            assertThat(f.data()).containsExactlyEntriesOf(new java.util.TreeMap<>(java.util.Map.of(
                    "species", "M_pyr_c", "protons", "+1", "count", "1")));
            assertThat(f.message()).isEqualTo("1 species has a structure that differs from the declared formula and"
                    + " charge only by protons, a protonation-state difference (structure minus declared: M_pyr_c +1);"
                    + " the reports list every one.");
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
            // Issue #13: a bad table row is reported at the table's file and line, and only once.
            assertThat(f.modelFile()).isEqualTo("formula-vs-structure.tsv");
            assertThat(f.line()).isEqualTo(7);
        });
        assertThat(TestModels.result("structure/formula-vs-structure.xml", "structure/formula-vs-structure.tsv").allFindings())
                .filteredOn(f -> f.ruleId().equals("mapping.structure-missing")).extracting(Finding::elementId)
                .doesNotContain("M_bad_c");
    }

    @Test
    void leavesAgreeingAndPolymerSpeciesAlone() {
        assertThat(TestModels.result("structure/formula-vs-structure.xml", "structure/formula-vs-structure.tsv").allFindings())
                .extracting(Finding::elementId).doesNotContain("M_glc_c", "M_poly_c");
    }
}
