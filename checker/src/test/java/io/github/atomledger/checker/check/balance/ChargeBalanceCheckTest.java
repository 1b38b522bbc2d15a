package io.github.atomledger.checker.check.balance;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** balance.charge, exact, with integer (fbc v2) and decimal (fbc v3) charges. */
class ChargeBalanceCheckTest {

    @Test
    void reportsTheMissingProtonAsAChargeGap() {
        List<Finding> f = TestModels.findings("balance/hexokinase-missing-proton.xml", "balance.charge");
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.elementId()).isEqualTo("R_HEX1");
            assertThat(x.severity()).isEqualTo(Severity.ERROR);
            assertThat(x.data()).isEqualTo(new java.util.TreeMap<>(Map.of("class", "internal", "delta.charge", "-1")));
        });
    }

    @Test
    void comparesFractionalChargesExactly() {
        List<Finding> f = TestModels.findings("model/fbc3-decimal.xml", "balance.charge");
        // R_POOL: 2 x -0.5 + 1 = 0 balances; R_FRAC: 0.5 - 0.633 = -0.133 exactly.
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.elementId()).isEqualTo("R_FRAC");
            assertThat(x.data()).containsEntry("delta.charge", "-133/1000");
            assertThat(x.message()).contains("charge -0.133");
        });
    }

    @Test
    void leavesBalancedAndExemptReactionsAlone() {
        assertThat(TestModels.findings("balance/classes.xml", "balance.charge")).extracting(Finding::elementId)
                .doesNotContain("EX_glc_e", "DM_atp_c", "SK_h2o_c", "ATPM", "GLCt");
    }
}
