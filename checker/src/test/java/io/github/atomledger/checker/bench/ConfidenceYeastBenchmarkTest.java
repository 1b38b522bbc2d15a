package io.github.atomledger.checker.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import io.github.atomledger.atommapper.mapping.AtomMapper;
import io.github.atomledger.atommapper.mapping.MapConfidence;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.mapping.Rearrangement;
import io.github.atomledger.atommapper.mapping.WeightCheck;
import io.github.atomledger.atommapper.structure.Structure;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Benchmark (issue 16): the confidence analysis over yeast-GEM. Maps every reaction whose species
 * all have SMILES (as {@link MapperYeastBenchmarkTest}) with the analysis off and on, alternating,
 * in one JVM on two threads, and prints the time ratio, the margins, the rearrangement patterns and
 * the alternative weightings. Skips when the shared data folder is absent. Run with {@code -Pbench}.
 */
@Tag("bench")
class ConfidenceYeastBenchmarkTest {

    @Test
    void measuresTheConfidenceAnalysisOnYeast() throws Exception {
        Path data = MapperYeastBenchmarkTest.dataDir();
        assumeTrue(data != null && Files.isRegularFile(data.resolve("yeast-GEM.structures.tsv")),
                "shared data folder with yeast-GEM is absent");
        List<ReactionInput> inputs = inputs(data);
        int rounds = Integer.getInteger("atomledger.bench.rounds", 1);
        MappingOptions on = MappingOptions.defaults();
        MappingOptions off = on.withConfidenceBudget(Duration.ZERO);
        StringBuilder report = new StringBuilder("confidence analysis on yeast-GEM: " + inputs.size() + " reactions\n");
        List<MappingResult> last = null;
        List<MappingResult> lastOff = null;
        for (int round = 0; round < rounds; round++) {
            long t0 = System.nanoTime();
            long c0 = cpu();
            lastOff = new AtomMapper(off).mapAll(inputs, 2);
            long t1 = System.nanoTime();
            long c1 = cpu();
            last = new AtomMapper(on).mapAll(inputs, 2);
            long t2 = System.nanoTime();
            long c2 = cpu();
            report.append(String.format("round %d: off %.1f s wall / %.1f s CPU, on %.1f s / %.1f s, ratio wall %.2f, CPU %.2f%n",
                    round + 1, (t1 - t0) / 1e9, (c1 - c0) / 1e9, (t2 - t1) / 1e9, (c2 - c1) / 1e9,
                    (double) (t2 - t1) / (t1 - t0), (double) (c2 - c1) / (c1 - c0)));
        }
        Map<String, Integer> margins = new TreeMap<>();
        Map<String, Integer> kinds = new TreeMap<>();
        Map<String, Integer> weights = new TreeMap<>();
        Map<String, Integer> reasons = new TreeMap<>();
        int flagged = 0;
        int analysed = 0;
        List<String> examples = new ArrayList<>();
        for (MappingResult r : last) {
            MapConfidence c = r.confidence();
            if (!c.computed()) {
                continue;
            }
            analysed++;
            String m = !c.hasMargin() ? "none" : (c.marginProven() ? "" : ">=") + c.margin();
            margins.merge(m, 1, Integer::sum);
            for (Rearrangement x : c.rearrangements()) {
                kinds.merge(x.kind().label(), 1, Integer::sum);
            }
            for (WeightCheck w : c.weights()) {
                weights.merge(w.carbonCarbonWeight() + ":" + w.outcome().label(), 1, Integer::sum);
            }
            List<MapConfidence.Reason> why = c.reviewReasons(MapConfidence.DEFAULT_REVIEW_MARGIN);
            if (!why.isEmpty()) {
                flagged++;
                why.forEach(x -> reasons.merge(x.label(), 1, Integer::sum));
                if (examples.size() < 40) {
                    examples.add(r.reactionId() + " (" + why + "): " + c.rearrangements().stream()
                            .map(Rearrangement::description).toList());
                }
            }
        }
        report.append("analysed ").append(analysed).append('\n');
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < last.size(); i++) {
            idx.add(i);
        }
        final List<MappingResult> a = last;
        final List<MappingResult> b = lastOff;
        idx.sort((x, y) -> Long.compare(a.get(y).elapsed().toMillis() - b.get(y).elapsed().toMillis(),
                a.get(x).elapsed().toMillis() - b.get(x).elapsed().toMillis()));
        long sumDiff = 0;
        for (int i : idx) {
            sumDiff += a.get(i).elapsed().toMillis() - b.get(i).elapsed().toMillis();
        }
        report.append("sum of extra ms ").append(sumDiff).append('\n');
        for (int i : idx.subList(0, 40)) {
            MapConfidence c = a.get(i).confidence();
            report.append(String.format("  +%d ms (off %d) %s margin %s%d weights %s atoms %d%n",
                    a.get(i).elapsed().toMillis() - b.get(i).elapsed().toMillis(), b.get(i).elapsed().toMillis(),
                    a.get(i), c.marginProven() ? "" : ">=", c.margin(),
                    c.weights().stream().map(w -> w.outcome().label()).toList(), a.get(i).atomMap().size()));
        }
        report.append("margins ").append(margins).append('\n');
        report.append("patterns in the optimum ").append(kinds).append('\n');
        report.append("weights ").append(weights).append('\n');
        report.append(String.format("flagged for review at the default margin: %d of %d analysed (%.1f%%), by reason %s%n",
                flagged, analysed, 100.0 * flagged / analysed, reasons));
        examples.forEach(e -> report.append("  ").append(e).append('\n'));
        System.out.print(report);
        Files.createDirectories(Path.of("target"));
        Files.writeString(Path.of("target", "confidence-yeast-benchmark.txt"), report.toString());
        assertThat(analysed).isPositive();
    }

    /** CPU time of the whole process (all threads, JIT and GC included), in nanoseconds. */
    private static long cpu() {
        return ((com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory
                .getOperatingSystemMXBean()).getProcessCpuTime();
    }

    static List<ReactionInput> inputs(Path data) throws Exception {
        Map<String, Structure> structures = MapperYeastBenchmarkTest.structures(data, new int[1]);
        List<ReactionInput> inputs = new ArrayList<>();
        for (MapperYeastBenchmarkTest.Raw raw : MapperYeastBenchmarkTest.readReactions(data.resolve("yeast-GEM.xml.gz"))) {
            if (raw.reactants().isEmpty() || raw.products().isEmpty()
                    || !structures.keySet().containsAll(raw.reactants().keySet())
                    || !structures.keySet().containsAll(raw.products().keySet())
                    || MapperYeastBenchmarkTest.fractional(raw) != null) {
                continue;
            }
            inputs.add(new ReactionInput(raw.id(), MapperYeastBenchmarkTest.side(raw.reactants(), structures),
                    MapperYeastBenchmarkTest.side(raw.products(), structures)));
        }
        return inputs;
    }
}
