package io.github.atomledger.atommapper.structure.internal;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.structure.HostileStructures;
import io.github.atomledger.atommapper.structure.Structure;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.openscience.cdk.interfaces.IAtomContainer;

/**
 * Benchmark (issue 7): time per molecule of our orbits ({@link Orbits}, on the graph arrays) and
 * of CDK's automorphism partition, on yeast-GEM's distinct SMILES and on the hostile structures.
 * Prints the figures for BENCHMARKS.md; asserts nothing about time. CDK runs on a hostile
 * structure in a child JVM that is stopped after {@link #CDK_CAP_SECONDS}. Run with -Pbench.
 */
@Tag("bench")
class OrbitsBenchmarkTest {

    private static final int CDK_CAP_SECONDS = 10;

    @Test
    void timesOrbitsOnYeastStructures() throws Exception {
        List<GraphArrays> graphs = new ArrayList<>();
        List<IAtomContainer> containers = new ArrayList<>();
        for (String s : YeastStructures.smiles()) {
            var g = Structure.fromSmiles(s).graph();
            graphs.add(GraphArrays.of(g));
            containers.add(CdkOrbits.container(g));
        }
        // One untimed pass of each, so that both are compiled before they are timed.
        for (int i = 0; i < graphs.size(); i++) {
            graphs.get(i).orbits(new StepBudget(Long.MAX_VALUE));
            CdkOrbits.orbits(containers.get(i));
        }
        long[] ours = new long[graphs.size()];
        long[] cdk = new long[graphs.size()];
        long[] steps = new long[graphs.size()];
        for (int i = 0; i < graphs.size(); i++) {
            StepBudget budget = new StepBudget(Long.MAX_VALUE);
            long t0 = System.nanoTime();
            graphs.get(i).orbits(budget);
            long t1 = System.nanoTime();
            CdkOrbits.orbits(containers.get(i));
            long t2 = System.nanoTime();
            ours[i] = t1 - t0;
            cdk[i] = t2 - t1;
            steps[i] = budget.used();
        }
        System.out.printf("yeast-GEM, %d distinct SMILES, per molecule:%n", graphs.size());
        System.out.println("  ours:  " + summary(ours) + "; steps mean " + mean(steps) + ", max " + max(steps));
        System.out.println("  CDK:   " + summary(cdk));
        assertThat(graphs).isNotEmpty();
    }

    @Test
    void timesOrbitsOnHostileStructures() throws Exception {
        System.out.println("hostile structures (ours best of 3 in this JVM; CDK one run in a fresh JVM):");
        for (HostileStructures.Case c : HostileStructures.all()) {
            GraphArrays g = GraphArrays.of(Structure.fromSmiles(c.smiles()).graph());
            long best = Long.MAX_VALUE;
            long steps = 0;
            for (int run = 0; run < 3; run++) {
                StepBudget budget = new StepBudget(Long.MAX_VALUE);
                long t0 = System.nanoTime();
                g.orbits(budget);
                best = Math.min(best, System.nanoTime() - t0);
                steps = budget.used();
            }
            System.out.printf("  %-42s %5d atoms  ours %8.2f ms (%,d steps)  CDK %s%n", c.name(),
                    g.elements().length, best / 1e6, steps, cdkInChild(c.smiles()));
        }
    }

    private static String cdkInChild(String smiles) throws IOException, InterruptedException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-Xmx1g", "-cp", System.getProperty("java.class.path"),
                CdkOrbitsTimer.class.getName(), smiles).redirectErrorStream(true).start();
        if (!child.waitFor(CDK_CAP_SECONDS, TimeUnit.SECONDS)) {
            child.destroyForcibly().waitFor();
            return "> " + CDK_CAP_SECONDS + " s (stopped)";
        }
        String out = new String(child.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        int at = out.lastIndexOf("ms=");
        return at < 0 ? "failed: " + out.strip() : String.format("%8.2f ms", Double.parseDouble(out.substring(at + 3).strip()));
    }

    private static String summary(long[] nanos) {
        long[] sorted = nanos.clone();
        java.util.Arrays.sort(sorted);
        return String.format("mean %.3f ms, median %.3f ms, max %.3f ms, total %.1f ms", mean(nanos) / 1e6,
                sorted[sorted.length / 2] / 1e6, sorted[sorted.length - 1] / 1e6, java.util.Arrays.stream(nanos).sum() / 1e6);
    }

    private static long mean(long[] values) {
        return java.util.Arrays.stream(values).sum() / values.length;
    }

    private static long max(long[] values) {
        return java.util.Arrays.stream(values).max().orElse(0);
    }
}
