package io.github.atomledger.checker.check.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Stored maps and atom classes (issue #14): adding readable positions to a structure changes
 * neither its map nor the meaning of a stored one; writing the molecule from another atom does.
 * The fixture's header gives the atom numbers (fumarase, common practice).
 */
class StaleMapCheckTest {

    private static ModelResult run(String table) throws URISyntaxException {
        Path dir = Path.of(StaleMapCheckTest.class.getResource("stale-classes.xml").toURI()).getParent();
        RunConfig config = RunConfig.defaults(dir, List.of("stale-classes.xml"))
                .withMapping(new MappingConfig(true, dir.resolve(table),
                        MappingOptions.defaults().withTimeBudget(java.time.Duration.ofSeconds(60)), 1, null));
        return new Engine().run(config, RunListener.SILENT).models().get(0);
    }

    private static List<Finding> stale(ModelResult m) {
        return m.allFindings().stream().filter(f -> f.ruleId().equals("mapping.stale")).toList();
    }

    @Test
    void atomClassesAloneLeaveAStoredMapCurrent() throws URISyntaxException {
        ModelResult plain = run("stale-classes-plain.tsv");
        ModelResult numbered = run("stale-classes-numbered.tsv");
        assertThat(stale(plain)).isEmpty();
        assertThat(stale(numbered)).isEmpty();
        ReactionMapping a = plain.mapping().mappings().get("R_FUM");
        ReactionMapping b = numbered.mapping().mappings().get("R_FUM");
        assertThat(b.carbons()).isEqualTo(a.carbons());
        assertThat(b.mappedSmiles()).isEqualTo(a.mappedSmiles()).doesNotContain(":1]C");
        assertThat(b.fingerprints()).isEqualTo(a.fingerprints());
        assertThat(numbered.mapping().structures().label("mal", 7)).isEqualTo("C1");
        assertThat(plain.mapping().structures().label("mal", 7)).isEqualTo("7");
    }

    @Test
    void anotherAtomOrderMakesTheStoredMapStale() throws URISyntaxException {
        List<Finding> f = stale(run("stale-classes-renumbered.tsv"));
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.elementId()).isEqualTo("R_FUM");
            assertThat(x.data()).containsEntry("reason", "renumbered").containsEntry("species", "mal");
        });
    }
}
