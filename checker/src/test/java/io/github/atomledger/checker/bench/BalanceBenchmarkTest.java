package io.github.atomledger.checker.bench;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.SharedData;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Benchmark for issue 8 (run with {@code -Pbench}): on yeast-GEM, a bare StAX pass (the floor), JSBML's read
 * alone, our loader, the balance checks (everything but the consistency test) and the full engine, each in fresh
 * JVMs (cold, process wall time and in-process time) and warm (repeats in one JVM); medians and ratios to the
 * floor, measured in one run. Then a synthetic 15,000-reaction model checked with -Xmx1g. Prints a Markdown
 * table and writes it to target/bench/balance.md; BENCHMARKS.md records the figures. No timing assertion.
 */
@Tag("bench")
class BalanceBenchmarkTest {

    private static final int COLD_RUNS = 5;
    private static final int WARM_RUNS = 8;

    record Run(double processMs, double[] inProcessMs, double[] cpuMs, long heapMb, double processCpuMs) {
    }

    static Run fork(String mode, Path model, int repeats, String xmx, Path reports) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx" + xmx, "-cp", System.getProperty("java.class.path"), BalanceBenchMain.class.getName(), mode,
                model.toString(), Integer.toString(repeats), reports.toString()));
        long t0 = System.nanoTime();
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        double[] ms = null;
        double[] cpu = null;
        long heap = 0;
        double processCpu = 0;
        StringBuilder all = new StringBuilder();
        try (BufferedReader in = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            for (String line; (line = in.readLine()) != null; ) {
                all.append(line).append('\n');
                if (line.startsWith("ms ")) {
                    ms = numbers(line);
                } else if (line.startsWith("cpu ")) {
                    cpu = numbers(line);
                } else if (line.startsWith("heapUsedMb ")) {
                    heap = Long.parseLong(line.substring(11).strip());
                } else if (line.startsWith("processCpuMs ")) {
                    processCpu = Double.parseDouble(line.substring(13).strip());
                }
            }
        }
        int rc = p.waitFor();
        double wall = (System.nanoTime() - t0) / 1e6;
        assertThat(rc).as(all.toString()).isZero();
        return new Run(wall, ms, cpu, heap, processCpu);
    }

    private static double[] numbers(String line) {
        return Arrays.stream(line.substring(line.indexOf(' ') + 1).split(" ")).mapToDouble(Double::parseDouble).toArray();
    }

    static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
    }

    @Test
    void measuresYeastGemAndASynthetic15000ReactionModel() throws Exception {
        Path yeast = SharedData.require("yeast-GEM.xml.gz");
        Path out = Path.of("target", "bench");
        Files.createDirectories(out);
        StringBuilder md = new StringBuilder();
        md.append("| step | cold process wall (median of ").append(COLD_RUNS).append(") | cold process CPU, all threads | cold in-process"
                + " | warm in-process (median of last ").append(WARM_RUNS / 2)
                .append(") | warm CPU | ratio cold / floor | ratio cold CPU / floor | ratio warm / floor |\n|---|---|---|---|---|---|---|---|---|\n");
        double floorCold = 0;
        double floorCpu = 0;
        double floorWarm = 0;
        for (String mode : List.of("stax", "jsbml", "load", "balance", "engine")) {
            int cold = COLD_RUNS;
            double[] wall = new double[cold];
            double[] inProc = new double[cold];
            double[] cpu = new double[cold];
            for (int i = 0; i < cold; i++) {
                Run r = fork(mode, yeast, 1, "2g", out.resolve("reports-" + mode));
                wall[i] = r.processMs();
                inProc[i] = r.inProcessMs()[0];
                cpu[i] = r.processCpuMs();
            }
            int warmRuns = WARM_RUNS;
            Run warm = fork(mode, yeast, warmRuns, "2g", out.resolve("reports-" + mode));
            double[] lastHalf = Arrays.copyOfRange(warm.inProcessMs(), warmRuns / 2, warmRuns);
            double[] lastCpu = Arrays.copyOfRange(warm.cpuMs(), warmRuns / 2, warmRuns);
            double coldMedian = median(wall);
            double warmMedian = median(lastHalf);
            double cpuMedian = median(cpu);
            if (mode.equals("stax")) {
                floorCold = coldMedian;
                floorCpu = cpuMedian;
                floorWarm = warmMedian;
            }
            md.append(String.format(Locale.ROOT, "| %s | %.0f ms | %.0f ms | %.0f ms | %.0f ms | %.0f ms | %.2f | %.2f | %.2f |%n", mode,
                    coldMedian, cpuMedian, median(inProc), warmMedian, median(lastCpu), coldMedian / floorCold, cpuMedian / floorCpu,
                    warmMedian / floorWarm));
        }
        Path synthetic = out.resolve("synthetic-15000.xml");
        SyntheticModel.write(synthetic, 15_000);
        Run big = fork("balance", synthetic, 1, "1g", out.resolve("reports-synthetic"));
        md.append(String.format(Locale.ROOT, "%nSynthetic model, 15,000 reactions, %,d bytes, balance checks with -Xmx1g:"
                        + " process wall %.0f ms, in-process %.0f ms, heap in use after the run %d MB.%n",
                Files.size(synthetic), big.processMs(), big.inProcessMs()[0], big.heapMb()));
        md.append(String.format(Locale.ROOT, "Machine: %d processors, Java %s, %s %s; load average at the end: %s.%n",
                Runtime.getRuntime().availableProcessors(), System.getProperty("java.version"), System.getProperty("os.name"),
                System.getProperty("os.arch"), Files.readString(Path.of("/proc/loadavg")).strip()));
        System.out.println(md);
        try (Writer w = Files.newBufferedWriter(out.resolve("balance.md"), StandardCharsets.UTF_8)) {
            w.write(md.toString());
        }
    }
}
