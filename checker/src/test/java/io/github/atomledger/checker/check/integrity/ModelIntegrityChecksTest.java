package io.github.atomledger.checker.check.integrity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.groups.Tuple.tuple;

import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The model-level findings curators expect (issue 8), all from one fixture: reference problems,
 * reaction shape, duplicate ids, and the formula and charge findings on species.
 */
class ModelIntegrityChecksTest {

    private static final String FIXTURE = "integrity/data-problems.xml";

    @Test
    void reportsUnknownSpeciesAndUnusableCoefficients() {
        assertThat(TestModels.findings(FIXTURE, "model.reference-invalid"))
                .extracting(Finding::elementId, f -> f.data().get("species"), f -> f.data().get("problem"), Finding::severity)
                .containsExactlyInAnyOrder(tuple("R_A", "M_ghost_c", "unknown-species", Severity.ERROR),
                        tuple("R_B", "M_nof_c", "not-a-number", Severity.ERROR),
                        tuple("R_B", "M_ok_c", "negative", Severity.ERROR));
    }

    @Test
    void reportsEmptyAndDuplicateReactions() {
        assertThat(TestModels.findings(FIXTURE, "model.reaction-shape"))
                .extracting(Finding::elementId, f -> f.data().get("problem"), f -> f.data().getOrDefault("duplicateOf", ""))
                .containsExactlyInAnyOrder(tuple("R_EMPTY", "empty", ""), tuple("R_DUP", "duplicate", "R_C"),
                        tuple("R_REV", "reverse-duplicate", "R_C"));
    }

    @Test
    void reportsAnIdUsedTwice() {
        assertThat(TestModels.findings(FIXTURE, "model.duplicate-id")).singleElement()
                .satisfies(f -> assertThat(f.data()).containsEntry("id", "M_twice_c"));
    }

    @Test
    void listsTheReactionsASpeciesWithoutFormulaOrChargeBlocks() {
        List<Finding> formula = TestModels.findings(FIXTURE, "model.formula-missing");
        assertThat(formula).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("M_nof_c");
            assertThat(f.severity()).isEqualTo(Severity.WARNING);
            assertThat(f.data()).containsEntry("reactions", "R_A,R_B").containsEntry("reactionCount", "2");
        });
        assertThat(TestModels.findings(FIXTURE, "model.charge-missing")).extracting(Finding::elementId, Finding::severity)
                .containsExactly(tuple("M_nof_c", Severity.INFO));
    }

    @Test
    void namesTheOffendingFormulaTextAndPosition() {
        assertThat(TestModels.findings(FIXTURE, "model.formula-invalid")).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("M_bad_c");
            assertThat(f.data()).containsEntry("formula", "C6h12").containsEntry("position", "3").containsEntry("source", "fbc");
        });
    }

    @Test
    void rejectsADecimalChargeInFbcVersion2() {
        assertThat(TestModels.findings(FIXTURE, "model.charge-invalid")).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("M_half_c");
            assertThat(f.data()).containsEntry("charge", "1.5")
                    .containsEntry("reason", "charge '1.5' is not an integer, which fbc version 2 requires");
        });
    }

    @Test
    void marksReactionsWithUnknownPartsNotComputable() {
        assertThat(TestModels.findings(FIXTURE, "balance.not-computable"))
                .extracting(Finding::elementId, f -> f.data().getOrDefault("missingSpecies", ""),
                        f -> f.data().getOrDefault("badCoefficients", ""))
                .containsExactlyInAnyOrder(tuple("R_A", "M_ghost_c", ""), tuple("R_B", "", "M_nof_c=NaN,M_ok_c=-1"));
    }

    @Test
    void reportsUnknownSymbolsButNotRAndX() {
        assertThat(TestModels.findings("balance/generic-formula.xml", "model.unknown-symbol")).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("M_prot_c");
            assertThat(f.data()).containsEntry("symbols", "Protein");
        });
    }
}
