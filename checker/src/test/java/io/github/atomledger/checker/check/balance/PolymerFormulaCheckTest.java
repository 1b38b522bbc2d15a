package io.github.atomledger.checker.check.balance;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import org.junit.jupiter.api.Test;

/** fbc version 3 (...)n formulas: "cannot be balanced exactly", never guessed. */
class PolymerFormulaCheckTest {

    @Test
    void reportsPolymerReactionsInsteadOfGuessingN() {
        assertThat(TestModels.findings("model/fbc3-decimal.xml", "balance.polymer")).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("R_GLYC");
            assertThat(f.severity()).isEqualTo(Severity.WARNING);
            assertThat(f.data()).containsEntry("polymerSpecies", "M_glycogen_c").containsEntry("class", "internal");
        });
        assertThat(TestModels.findings("model/fbc3-decimal.xml", "balance.elements")).extracting(Finding::elementId)
                .doesNotContain("R_GLYC");
    }
}
