package io.github.atomledger.checker.check.balance;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.List;
import org.junit.jupiter.api.Test;

/** balance.elements on reactions whose correct form is known (textbook biochemistry, common practice). */
class ElementBalanceCheckTest {

    @Test
    void reportsHexokinaseWithoutItsProductProtonAndNamesTheFix() {
        List<Finding> f = TestModels.findings("balance/hexokinase-missing-proton.xml", "balance.elements");
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.elementId()).isEqualTo("R_HEX1");
            assertThat(x.severity()).isEqualTo(Severity.ERROR);
            assertThat(x.data()).containsExactlyEntriesOf(new java.util.TreeMap<>(java.util.Map.of(
                    "class", "internal", "delta.H", "-1", "delta.charge", "-1",
                    "fix.protons", "1", "fix.protonSide", "products", "fix.protonSpecies", "M_h_c")));
        });
    }

    @Test
    void pinsTheMessageWording() {
        Finding f = TestModels.findings("balance/hexokinase-missing-proton.xml", "balance.elements").get(0);
        assertThat(f.message()).isEqualTo("Reaction R_HEX1 (internal) is not element-balanced: H -1 (products minus reactants);"
                + " add 1 H+ (M_h_c) to the products balances it.");
    }

    @Test
    void suggestsWaterForAHydrolysisWrittenWithoutIt() {
        List<Finding> f = TestModels.findings("balance/hydrolysis-missing-water.xml", "balance.elements");
        Finding atph = f.stream().filter(x -> x.elementId().equals("R_ATPH")).findFirst().orElseThrow();
        assertThat(atph.data()).containsEntry("delta.H", "2").containsEntry("delta.O", "1").containsEntry("delta.charge", "0")
                .containsEntry("fix.water", "1").containsEntry("fix.waterSide", "reactants")
                .containsEntry("fix.waterSpecies", "M_h2o_c").doesNotContainKey("fix.protons");
        Finding bare = f.stream().filter(x -> x.elementId().equals("R_ATPH_BARE")).findFirst().orElseThrow();
        assertThat(bare.data()).containsEntry("delta.H", "1").containsEntry("delta.O", "1").containsEntry("delta.charge", "-1")
                .containsEntry("fix.water", "1").containsEntry("fix.waterSide", "reactants")
                .containsEntry("fix.protons", "1").containsEntry("fix.protonSide", "products");
    }

    @Test
    void countsGenericSymbolsAsPseudoElements() {
        List<Finding> f = TestModels.findings("balance/generic-formula.xml", "balance.elements");
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.elementId()).isEqualTo("ACYLT_BAD");
            assertThat(x.data()).containsEntry("delta.C", "-1").containsEntry("delta.H", "1").containsEntry("delta.O", "-1")
                    .containsEntry("delta.R", "-1").doesNotContainKey("delta.X").doesNotContainKey("fix.protons");
        });
    }

    @Test
    void reportsAnUncomputableBiomassReactionAtInfoOnly() {
        assertThat(TestModels.findings("balance/classes.xml", "balance.elements")).isEmpty();
        List<Finding> f = TestModels.findings("balance/classes.xml", "balance.not-computable");
        assertThat(f).extracting(Finding::elementId).containsExactly("BIOMASS");
        assertThat(f.get(0).severity()).isEqualTo(Severity.INFO);
        assertThat(f.get(0).data()).containsEntry("class", "biomass").containsEntry("withoutFormula", "M_biomass_c");
    }
}
