package io.github.atomledger.checker.engine;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.annotate.AnnotationPlan;
import io.github.atomledger.checker.annotate.ModelAnnotator;
import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.report.Reporters;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 7, determinism: two runs over the same files give byte-identical report.json and
 * annotated models, whatever the thread count (1 or 2) and the order of the model patterns.
 * Models: the demo model (invented organism, mapped with its structure table) and the
 * broken-content fixture (many findings, so that finding order matters). The time budget is
 * raised far above what any demo reaction needs, so that no status depends on machine speed.
 */
class DeterminismTest {

    @TempDir
    Path dir;

    private Path project(String name) throws Exception {
        Path base = Files.createDirectories(dir.resolve(name));
        Files.createDirectories(base.resolve("models"));
        Files.copy(Path.of("..", "demo", "models", "ledgerella_central.xml"), base.resolve("models/a_central.xml"));
        Files.copy(Path.of("src/test/resources/io/github/atomledger/checker/engine/hostile-content.xml"),
                base.resolve("models/b_broken.xml"));
        Files.copy(Path.of("..", "demo", "structures.tsv"), base.resolve("structures.tsv"));
        return base;
    }

    private static RunResult run(Path base, List<String> patterns, int threads) throws Exception {
        MappingOptions options = MappingOptions.defaults().withTimeBudget(Duration.ofSeconds(120));
        RunConfig config = RunConfig.defaults(base, patterns).withFormats(Set.of(ReportFormat.JSON))
                .withMapping(new MappingConfig(true, base.resolve("structures.tsv"), options, threads, null));
        RunResult result = new Engine().run(config, RunListener.SILENT);
        Reporters.forFormats(config.formats()).write(result, config.reportDirectory());
        return result;
    }

    @Test
    @Timeout(value = 10, unit = TimeUnit.MINUTES)
    void reportsAndAnnotationsAreByteIdenticalAcrossThreadCountsAndPatternOrder() throws Exception {
        Path one = project("one");
        Path two = project("two");
        RunResult first = run(one, List.of("models/a_central.xml", "models/b_broken.xml"), 1);
        RunResult second = run(two, List.of("models/b_broken.xml", "models/**.xml"), 2);

        byte[] reportOne = Files.readAllBytes(one.resolve("target/atomledger/report.json"));
        byte[] reportTwo = Files.readAllBytes(two.resolve("target/atomledger/report.json"));
        assertThat(new String(reportTwo, java.nio.charset.StandardCharsets.UTF_8))
                .isEqualTo(new String(reportOne, java.nio.charset.StandardCharsets.UTF_8));
        assertThat(new String(reportOne, java.nio.charset.StandardCharsets.UTF_8))
                .contains("\"mapped\"").doesNotContain(dir.toString());

        ModelAnnotator annotator = new ModelAnnotator(false, false, 1L << 30);
        for (int i = 0; i < first.models().size(); i++) {
            ModelResult a = first.models().get(i);
            ModelResult b = second.models().get(i);
            assertThat(b.file()).isEqualTo(a.file());
            annotator.annotate(one.resolve(a.file()), a.file(), AnnotationPlan.of(a));
            annotator.annotate(two.resolve(b.file()), b.file(), AnnotationPlan.of(b));
            assertThat(Files.readAllBytes(two.resolve(b.file()))).isEqualTo(Files.readAllBytes(one.resolve(a.file())));
        }
        assertThat(Files.readString(one.resolve("models/a_central.xml"))).contains("<atl:atomTransitions");
    }
}
