package io.github.atomledger.checker.check.balance;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** balance.common-cause (issue 13): one wrong formula named once, with the reactions it explains. */
class CommonCauseCheckTest {

    @Test
    void namesTheSpeciesWhoseFormulaExplainsSeveralImbalances() {
        List<Finding> f = TestModels.findings("balance/common-cause.xml", "balance.common-cause");
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.elementId()).isEqualTo("M_atp_c");
            assertThat(x.severity()).isEqualTo(Severity.WARNING);
            assertThat(x.line()).isPositive();
            assertThat(x.data()).containsEntry("reactions", "R_ADK,R_HEX,R_PFK,R_PYK").containsEntry("reactionCount", "4")
                    .containsEntry("delta.C", "20").containsEntry("declared", "C30H12N5O13P3")
                    .containsEntry("suggested", "C10H12N5O13P3").containsEntry("contradicting", "");
            assertThat(x.message()).isEqualTo("The formula of ATP (M_atp_c), declared as C30H12N5O13P3, is the likely"
                    + " common cause of 4 imbalanced reactions (R_ADK, R_HEX, R_PFK and R_PYK): each imbalance is the"
                    + " reaction's coefficient of ATP times C +20, so C10H12N5O13P3 would balance all of them.");
        });
    }

    @Test
    void leavesAnImbalanceOfItsOwnAndABalancedModelAlone() {
        assertThat(TestModels.findings("balance/common-cause.xml", "balance.elements")).extracting(Finding::elementId)
                .containsExactlyInAnyOrder("R_ADK", "R_HEX", "R_PFK", "R_PYK", "R_G6PP");
        assertThat(TestModels.findings("balance/no-charges.xml", "balance.common-cause")).isEmpty();
    }

    @Test
    void namesAtpInThePlantedEcoliCore() {
        // e_coli_core HEAD carries one deliberate error, ATP written C30H12N5O13P3 instead of BiGG's
        // C10H12N5O13P3 (../shared/data/e_coli_core.SOURCE.md): 12 two-sided reactions are off by C ±20.
        Path file = SharedData.require("e_coli_core.xml");
        List<Finding> found = new Engine().run(RunConfig.defaults(file.getParent(), List.of(file.getFileName().toString())),
                RunListener.SILENT).allFindings().stream().filter(x -> x.ruleId().equals("balance.common-cause")).toList();
        assertThat(found).singleElement().satisfies(x -> {
            assertThat(x.elementId()).isEqualTo("M_atp_c");
            assertThat(x.data()).containsEntry("reactionCount", "12").containsEntry("delta.C", "20")
                    .containsEntry("suggested", "C10H12N5O13P3").containsEntry("contradicting", "");
        });
    }

    @Test
    void findsNoCommonCauseInTheOriginalEcoliCore() {
        Path file = SharedData.require("e_coli_core.original.xml");
        assertThat(new Engine().run(RunConfig.defaults(file.getParent(), List.of(file.getFileName().toString())),
                RunListener.SILENT).allFindings()).noneMatch(x -> x.ruleId().equals("balance.common-cause"));
    }
}
