package io.github.atomledger.checker.check.balance;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/** model.charges-absent and model.formulas-absent (issue 13): a model that cannot be charge checked says so once. */
class AbsentChemistryCheckTest {

    @Test
    void warnsOnceWhenNoSpeciesHasACharge() {
        assertThat(TestModels.findings("balance/no-charges.xml", "model.charges-absent")).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("no_charges");
            assertThat(f.severity()).isEqualTo(Severity.WARNING);
            assertThat(f.data()).isEqualTo(new TreeMap<>(Map.of("checkedReactions", "6", "species", "11")));
            assertThat(f.message()).isEqualTo("No species of the model declares a charge (11 species), so the charge"
                    + " balance of none of its 6 checked reactions could be computed; add fbc:charge attributes (or"
                    + " CHARGE: notes) to check it.");
        });
        assertThat(TestModels.findings("balance/no-charges.xml", "model.charge-missing")).isEmpty();
        assertThat(TestModels.findings("balance/no-charges.xml", "model.formulas-absent")).isEmpty();
    }

    @Test
    void staysQuietWhenChargesArePresent() {
        assertThat(TestModels.findings("balance/common-cause.xml", "model.charges-absent")).extracting(Finding::elementId)
                .isEmpty();
    }
}
