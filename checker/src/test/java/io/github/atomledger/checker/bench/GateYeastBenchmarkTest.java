package io.github.atomledger.checker.bench;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.baseline.Baseline;
import io.github.atomledger.checker.baseline.BaselineMatch;
import io.github.atomledger.checker.baseline.BaselineUpdate;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.diff.CarbonTransitions;
import io.github.atomledger.checker.diff.ReleaseDiff;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.SeverityPolicy;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Benchmark (issue 6): what the release gate costs on a genome-scale model, as a ratio to the
 * check itself, measured in one run on yeast-GEM (4,131 reactions): a baseline of every finding
 * written, parsed and matched, and the release diff of the model against itself. Prints the
 * figures recorded in BENCHMARKS.md; run with {@code -Pbench}. Skips without ../shared/data.
 */
@Tag("bench")
class GateYeastBenchmarkTest {

    private static final int ROUNDS = 5;

    @Test
    void gateCostsLittleNextToTheCheck() {
        Path file = SharedData.require("yeast-GEM.xml.gz");
        ModelLoader loader = new ModelLoader(new LoadOptions(LoadOptions.DEFAULT_MAX_BYTES));
        Engine engine = new Engine();
        ModelResult result = null;
        ModelResult previous = null;
        long check = Long.MAX_VALUE;
        long baseline = Long.MAX_VALUE;
        long diff = Long.MAX_VALUE;
        int entries = 0;
        int diffFindings = -1;
        for (int i = 0; i < ROUNDS; i++) {
            long t0 = System.nanoTime();
            result = engine.check(loader.load(file, "models/yeast-GEM.xml.gz"), SeverityPolicy.defaults());
            long t1 = System.nanoTime();
            List<Finding> all = result.allFindings();
            List<String> files = List.of(result.file());
            Baseline written = BaselineUpdate.of(Baseline.empty(), all, files, Severity.INFO, "bench").baseline();
            Baseline read = Baseline.parse(written.format(), "b.tsv");
            BaselineMatch match = BaselineMatch.of(read, "b.tsv", all, files);
            long t2 = System.nanoTime();
            if (previous != null) {
                diffFindings = ReleaseDiff.compare(previous, result, CarbonTransitions.NONE.carbons(previous, file),
                        CarbonTransitions.NONE.carbons(result, file)).size();
            }
            long t3 = System.nanoTime();
            check = Math.min(check, t1 - t0);
            baseline = Math.min(baseline, t2 - t1);
            if (previous != null) {
                diff = Math.min(diff, t3 - t2);
            }
            entries = read.entries().size();
            assertThat(match.stale()).isEmpty();
            assertThat(match.count(io.github.atomledger.checker.engine.BaselineStatus.NEW)).isZero();
            previous = result;
        }
        assertThat(diffFindings).isZero();
        System.out.printf("gate bench yeast-GEM: %d reactions, %d findings, %d baseline entries%n",
                result.reactions().size(), result.allFindings().size(), entries);
        System.out.printf("gate bench best of %d: check %.1f ms, baseline write+parse+match %.1f ms (%.3f of check),"
                + " release diff %.1f ms (%.3f of check)%n", ROUNDS, check / 1e6, baseline / 1e6, (double) baseline / check,
                diff / 1e6, (double) diff / check);
    }
}
