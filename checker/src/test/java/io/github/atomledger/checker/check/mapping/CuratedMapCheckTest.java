package io.github.atomledger.checker.check.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Curated aldolase maps; the fixture's header gives the published carbon fates and atom numbers. */
class CuratedMapCheckTest {

    private static final MappingOptions OPTIONS = MappingOptions.defaults().withTimeBudget(java.time.Duration.ofSeconds(60));

    private static ModelResult result;

    @BeforeAll
    static void run() throws URISyntaxException {
        Path dir = Path.of(CuratedMapCheckTest.class.getResource("fba-curated.xml").toURI()).getParent();
        RunConfig config = RunConfig.defaults(dir, List.of("fba-curated.xml"))
                .withMapping(new MappingConfig(true, dir.resolve("fba-structures.tsv"), OPTIONS, 2, null));
        result = new Engine().run(config, RunListener.SILENT).models().get(0);
    }

    private static List<Finding> findings(String reaction) {
        return result.reactions().stream().filter(r -> r.id().equals(reaction)).findFirst().orElseThrow().findings()
                .stream().filter(f -> f.ruleId().startsWith("mapping.")).toList();
    }

    @Test
    void acceptsTheTextbookAldolaseMap() {
        assertThat(findings("R_FBA_CURATED")).isEmpty();
        assertThat(result.mapping().curated().get("R_FBA_CURATED").agrees()).isTrue();
    }

    @Test
    void reportsSwappedCarbonsWithTheExtraBondEdits() {
        List<Finding> f = findings("R_FBA_SWAPPED");
        assertThat(f).extracting(Finding::ruleId).containsExactly("mapping.curated-differs");
        Finding d = f.get(0);
        assertThat(d.severity()).isEqualTo(Severity.ERROR);
        assertThat(d.data().get("differing")).isEqualTo("fdp#1:6->dhap#1:2,fdp#1:19->dhap#1:5");
        assertThat(Integer.parseInt(d.data().get("extraCost"))).isPositive();
        assertThat(d.message()).contains("R_FBA_SWAPPED").contains("2 carbons go elsewhere");
    }

    @Test
    void rejectsAMapThatSendsAnOxygenAsACarbon() {
        List<Finding> f = findings("R_FBA_INVALID");
        assertThat(f).extracting(Finding::ruleId).containsExactly("mapping.curated-invalid");
        assertThat(f.get(0).data().get("problems")).contains("fdp#1:8 is O, not a carbon");
    }
}
