package io.github.atomledger.checker.engine;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.report.Reporters;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 7, content: every kind of broken model content becomes a finding on the element, never
 * an exception or a hang (fixture {@code hostile-content.xml}, its header lists the expected
 * findings; structure table {@code hostile-structures.tsv} with an invalid SMILES, an unknown
 * element and an invalid InChI). Reports are written too, to show that they cope.
 */
class HostileContentTest {

    private static final Path RESOURCES = Path.of("src/test/resources/io/github/atomledger/checker/engine");

    @TempDir
    Path dir;

    private RunResult run(boolean mapping) throws Exception {
        Files.createDirectories(dir.resolve("models"));
        Files.copy(RESOURCES.resolve("hostile-content.xml"), dir.resolve("models/hostile-content.xml"));
        Files.copy(RESOURCES.resolve("hostile-structures.tsv"), dir.resolve("structures.tsv"));
        RunConfig config = RunConfig.defaults(dir, RunConfig.DEFAULT_MODELS);
        if (mapping) {
            config = config.withMapping(new MappingConfig(true, dir.resolve("structures.tsv"),
                    MappingOptions.defaults(), 1, null));
        }
        RunResult result = new Engine().run(config, RunListener.SILENT);
        Reporters.forFormats(Reporters.available()).write(result, config.reportDirectory());
        return result;
    }

    private static Set<String> rulesOn(RunResult result, String elementId) {
        return result.allFindings().stream().filter(f -> elementId.equals(f.elementId()))
                .map(Finding::ruleId).collect(Collectors.toSet());
    }

    @Test
    @Timeout(value = 5, unit = TimeUnit.MINUTES)
    void brokenContentBecomesFindingsOnTheElements() throws Exception {
        RunResult result = run(false);
        assertThat(rulesOn(result, "s_dot")).contains("model.formula-invalid");
        assertThat(rulesOn(result, "s_charge_text")).contains("model.formula-invalid");
        assertThat(rulesOn(result, "s_huge")).contains("model.formula-invalid");
        assertThat(rulesOn(result, "s_unknown")).contains("model.unknown-symbol");
        assertThat(rulesOn(result, "s_badcharge")).contains("model.charge-invalid");
        for (String r : List.of("R_GHOST", "R_NAN", "R_INF", "R_NEG", "R_TEXT")) {
            assertThat(rulesOn(result, r)).as(r).contains("model.reference-invalid");
        }
        assertThat(rulesOn(result, "dup")).contains("model.duplicate-id");
        assertThat(rulesOn(result, "R_EMPTY")).contains("model.reaction-shape");
        assertThat(result.allFindings()).allSatisfy(f -> {
            assertThat(f.message()).doesNotContain("Exception").doesNotContain("\n");
            assertThat(f.modelFile()).isEqualTo("models/hostile-content.xml");
        });
        assertThat(Files.readString(dir.resolve("target/atomledger/report.json"))).contains("model.reference-invalid");
    }

    @Test
    @Timeout(value = 5, unit = TimeUnit.MINUTES)
    void invalidStructuresBecomeFindingsAndMappingGoesOn() throws Exception {
        RunResult result = run(true);
        assertThat(rulesOn(result, "s_dot")).contains("structure.invalid");
        assertThat(rulesOn(result, "s_huge")).contains("structure.invalid");
        assertThat(result.allFindings()).filteredOn(f -> f.ruleId().equals("structure.invalid"))
                .allSatisfy(f -> assertThat(f.message()).doesNotContain("Exception"));
    }

    @Test
    void emptyModelIsAFindingNotAnError() throws Exception {
        Files.createDirectories(dir.resolve("models"));
        // An SBML model with no species and no reactions at all.
        Files.writeString(dir.resolve("models/empty.xml"), "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<sbml xmlns=\"http://www.sbml.org/sbml/level3/version1/core\" level=\"3\" version=\"1\">\n"
                + "  <model id=\"bw7_empty\"/>\n</sbml>\n");
        RunResult result = new Engine().run(RunConfig.defaults(dir, RunConfig.DEFAULT_MODELS), RunListener.SILENT);
        assertThat(result.allFindings()).extracting(Finding::ruleId).contains("model.reaction-shape");
    }
}
