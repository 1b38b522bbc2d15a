package io.github.atomledger.checker.engine;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

/**
 * The BiGG e_coli_core model (Orth, Fleming &amp; Palsson 2010, EcoSal Plus; BiGG Models), read from
 * {@code ../shared/data}. Expected verdicts come from the data's provenance note: the original
 * export has only the biomass reaction element-imbalanced; the planted copy changes ATP's formula
 * from C10H12N5O13P3 to C30H12N5O13P3, so exactly the twelve two-sided reactions that use ATP are
 * off by carbon ±20, plus the biomass reaction. The export has no fbc:charge at all.
 */
class EcoliCoreBalanceTest {

    private static RunResult run(String name) {
        Path file = SharedData.require(name);
        RunConfig config = RunConfig.defaults(file.getParent(), List.of(file.getFileName().toString()));
        return new Engine().run(config, RunListener.SILENT);
    }

    private static Set<String> elementImbalanced(RunResult r) {
        Set<String> ids = new TreeSet<>();
        for (ReactionResult rr : r.models().get(0).reactions()) {
            if (rr.findings().stream().anyMatch(f -> f.ruleId().equals("balance.elements"))) {
                ids.add(rr.id());
            }
        }
        return ids;
    }

    @Test
    void originalModelHasOnlyTheBiomassReactionElementImbalanced() {
        RunResult r = run("e_coli_core.original.xml");
        assertThat(elementImbalanced(r)).containsExactly("R_Biomass_Ecoli_core_w_GAM");
        Finding biomass = r.models().get(0).reactions().stream()
                .filter(x -> x.id().equals("R_Biomass_Ecoli_core_w_GAM")).findFirst().orElseThrow()
                .findings().stream().filter(f -> f.ruleId().equals("balance.elements")).findFirst().orElseThrow();
        assertThat(biomass.severity()).isEqualTo(Severity.INFO);
        assertThat(biomass.data()).containsEntry("class", "biomass");
        assertThat(r.failing()).isEmpty();
    }

    @Test
    void plantedAtpFormulaMakesExactlyTheAtpReactionsOffByTwentyCarbons() {
        RunResult r = run("e_coli_core.xml");
        Set<String> expected = new TreeSet<>(List.of("R_ACKr", "R_ADK1", "R_ATPM", "R_ATPS4r", "R_GLNS", "R_GLNabc",
                "R_PFK", "R_PGK", "R_PPCK", "R_PPS", "R_PYK", "R_SUCOAS"));
        Set<String> withBiomass = new TreeSet<>(expected);
        withBiomass.add("R_Biomass_Ecoli_core_w_GAM");
        assertThat(elementImbalanced(r)).isEqualTo(withBiomass);
        for (ReactionResult rr : r.models().get(0).reactions()) {
            if (expected.contains(rr.id())) {
                assertThat(rr.balance().elements()).as(rr.id()).containsOnlyKeys("C");
                assertThat(rr.balance().elements().get("C").abs().toString()).as(rr.id()).isEqualTo("20");
                assertThat(rr.balance().charge()).as("no charges in this export").isNull();
            }
        }
        assertThat(r.failing()).extracting(Finding::elementId).containsExactlyInAnyOrderElementsOf(expected);
    }

    @Test
    void classifiesTheTwentyOneSidedReactionsAsExchange() {
        RunResult r = run("e_coli_core.original.xml");
        long exchanges = r.models().get(0).reactions().stream()
                .filter(x -> x.reactionClass().label().equals("exchange")).count();
        assertThat(exchanges).isEqualTo(20);
    }
}
