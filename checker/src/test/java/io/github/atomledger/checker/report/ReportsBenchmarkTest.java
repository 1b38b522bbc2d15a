package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Benchmark (issue 5): time and size of each report format for the demo (with atom-map pictures)
 * and for yeast-GEM (balance only), printed for BENCHMARKS.md and docs/reports.md. Each format is
 * written five times after one warm-up; the median is printed. Run with {@code -Pbench}.
 */
@Tag("bench")
class ReportsBenchmarkTest {

    @Test
    void demoWithPictures() throws Exception {
        long t0 = System.nanoTime();
        RunResult result = DemoReports.runMapped();
        System.out.printf("demo: engine run with mapping %.0f ms%n", (System.nanoTime() - t0) / 1e6);
        t0 = System.nanoTime();
        new HtmlReporter().toHtml(result);
        System.out.printf("demo: first HTML with drawings %.0f ms%n", (System.nanoTime() - t0) / 1e6);
        measure("demo", result, MappingSource.FROM_ENGINE, Path.of("target", "bench-demo"));
    }

    @Test
    void yeastGemBalanceOnly() throws Exception {
        Path file = SharedData.require("yeast-GEM.xml.gz");
        RunConfig config = RunConfig.defaults(file.getParent(), List.of(file.getFileName().toString()));
        long t0 = System.nanoTime();
        RunResult result = new Engine().run(config, RunListener.SILENT);
        System.out.printf("yeast-GEM: engine run %.0f ms%n", (System.nanoTime() - t0) / 1e6);
        measure("yeast-GEM", result, MappingSource.NONE, Path.of("target", "bench-yeast"));
    }

    private static void measure(String name, RunResult result, MappingSource maps, Path dir) throws Exception {
        for (ReportFormat f : EnumSet.allOf(ReportFormat.class)) {
            Reporters one = Reporters.forFormats(EnumSet.of(f), maps);
            Path written = one.write(result, dir).get(0);
            long[] ms = new long[5];
            for (int i = 0; i < ms.length; i++) {
                long t = System.nanoTime();
                one.write(result, dir);
                ms[i] = (System.nanoTime() - t) / 1_000_000;
            }
            java.util.Arrays.sort(ms);
            System.out.printf("%s: %-8s %,12d bytes  median %5d ms%n", name, f.label(), Files.size(written), ms[2]);
            assertThat(Files.size(written)).isPositive();
        }
    }
}
