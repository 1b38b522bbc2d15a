package io.github.atomledger.checker.bench;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.report.JsonReporter;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Whole-model mapping on yeast-GEM with the structure side table: a cold run (empty cache) and a
 * warm re-run of the unchanged model, in one JVM, all cores. Prints the figures recorded in
 * BENCHMARKS.md ("Model-level atom maps"). Run with {@code mvn -Pbench -pl checker -am test
 * -Dtest=MappingCacheBenchmarkTest -Dsurefire.failIfNoSpecifiedTests=false}.
 */
@Tag("bench")
class MappingCacheBenchmarkTest {

    @TempDir
    Path cache;

    @Test
    void warmRunOfAnUnchangedModelIsAtLeastTenTimesFaster() throws Exception {
        Path model = SharedData.require("yeast-GEM.xml.gz");
        Path table = SharedData.require("yeast-GEM.structures.tsv");
        int threads = Runtime.getRuntime().availableProcessors();
        RunConfig config = RunConfig.defaults(model.getParent(), List.of(model.getFileName().toString()))
                .withMapping(new MappingConfig(true, table, MappingOptions.defaults(), threads, cache))
                // The consistency test is not cached; it is measured in the balance benchmark.
                .withPolicy(io.github.atomledger.checker.engine.SeverityPolicy.of(
                        java.util.Map.of("balance.mass-inconsistent", "off"), java.util.Map.of(),
                        io.github.atomledger.checker.check.StandardChecks.all()));
        RunListener progress = new RunListener() {
            @Override
            public void info(String line) {
                System.out.println(line);
            }
        };
        long t0 = System.nanoTime();
        ModelResult cold = new Engine().run(config, progress).models().get(0);
        long t1 = System.nanoTime();
        ModelResult warm = new Engine().run(config, progress).models().get(0);
        long t2 = System.nanoTime();
        Map<String, Integer> statuses = new TreeMap<>();
        for (ReactionResult r : cold.reactions()) {
            statuses.merge(r.mapping().status().label(), 1, Integer::sum);
        }
        double coldS = (t1 - t0) / 1e9;
        double warmS = (t2 - t1) / 1e9;
        Runtime rt = Runtime.getRuntime();
        System.out.printf("yeast-GEM mapping: threads=%d cold=%.1f s warm=%.1f s ratio=%.1f statuses=%s heap-used=%d MB%n",
                threads, coldS, warmS, coldS / warmS, statuses, (rt.totalMemory() - rt.freeMemory()) >> 20);
        JsonReporter json = new JsonReporter();
        assertThat(json.toJson(new io.github.atomledger.checker.engine.RunResult(config, List.of(warm))))
                .isEqualTo(json.toJson(new io.github.atomledger.checker.engine.RunResult(config, List.of(cold))));
        assertThat(coldS / warmS).isGreaterThanOrEqualTo(10.0);
    }
}
