package io.github.atomledger.checker.engine;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.BalanceCalculator;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.MapperFailure;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.check.mapping.MappingStatusCheck;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;
import io.github.atomledger.checker.model.ModelView;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue #12: the atom mapper (or CDK below it) throwing on one reaction of the demo model does
 * not end the run; that reaction is recorded as a mapper failure, named by
 * {@code mapping.mapper-failed} at error, kept out of the cache, and every other reaction keeps
 * its result. The mapper is replaced by a stand-in that throws on R_PPC only.
 */
class MappingStageFailureTest {

    @TempDir
    Path cache;

    @Test
    void aReactionTheMapperThrowsOnIsNamedAndTheOthersGoOn() throws IOException {
        Path demo = Path.of("..", "demo").toAbsolutePath().normalize();
        Path file = demo.resolve("models/ledgerella_central.xml");
        ModelView model = new ModelLoader(LoadOptions.defaults()).load(file, "models/ledgerella_central.xml");
        BalanceCalculator calc = new BalanceCalculator();
        Map<String, SpeciesChemistry> chemistry = calc.chemistry(model);
        Map<String, ReactionBalance> balances = calc.balances(model, chemistry);
        MappingConfig config = new MappingConfig(true, demo.resolve("structures.tsv"), MappingStageTest.OPTIONS, 2, cache);

        MappingData data = new MappingStage(config, demo, LoadOptions.defaults().maxDecompressedBytes(),
                RunListener.SILENT, input -> {
                    if (input.reactionId().equals("R_PPC")) {
                        throw new NullPointerException("Cannot read field \"x\" because \"a\" is null");
                    }
                    return MappingResult.unmappable(input.reactionId(), "stand-in");
                }).run(model, file, balances);

        ReactionMapping ppc = data.mappings().get("R_PPC");
        assertThat(ppc.status()).isEqualTo(MapStatus.SKIPPED);
        assertThat(MapperFailure.is(ppc)).isTrue();
        assertThat(ppc.reason()).isEqualTo("the atom mapper failed: NullPointerException in "
                + "MappingStageFailureTest.lambda$aReactionTheMapperThrowsOnIsNamedAndTheOthersGoOn$0: "
                + "Cannot read field \"x\" because \"a\" is null");
        assertThat(data.mappings().get("R_CS").status()).isEqualTo(MapStatus.UNMAPPABLE);

        List<Finding> found = new MappingStatusCheck(MappingStatusCheck.Kind.MAPPER_FAILED)
                .check(new CheckContext(model, chemistry, balances, data));
        assertThat(found).singleElement().satisfies(f -> {
            assertThat(f.ruleId()).isEqualTo("mapping.mapper-failed");
            assertThat(f.elementId()).isEqualTo("R_PPC");
            assertThat(f.severity()).isEqualTo(Severity.ERROR);
            assertThat(f.data()).containsEntry("species", "co2_c h2o_c h_c oaa_c pep_c pi_c")
                    .containsKey("error");
        });
        long mappedNow = data.mappings().values().stream().filter(m -> m.reason().equals("stand-in")).count();
        assertThat(mappedNow).isGreaterThan(20);
        try (Stream<Path> files = Files.walk(cache)) {
            long cached = files.filter(p -> p.toString().endsWith(".json")
                    && p.getParent().getFileName().toString().matches("[0-9a-f]{2}")).count();
            assertThat(cached).as("every reaction mapped now but the failed one").isEqualTo(mappedNow);
        }
    }
}
