package io.github.atomledger.checker.bench;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;
import io.github.atomledger.checker.trace.LabelReach;
import io.github.atomledger.checker.trace.Pathway;
import io.github.atomledger.checker.trace.Position;
import io.github.atomledger.checker.trace.Reachability;
import io.github.atomledger.checker.trace.Step;
import io.github.atomledger.checker.trace.TraceInputs;
import io.github.atomledger.checker.trace.TraceResults;
import io.github.atomledger.checker.trace.Traces;
import io.github.atomledger.atommapper.mapping.MappingOptions;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Tracing is a walk over maps already computed (issue #14): 50 pathways and the reach of one source
 * carbon over yeast-GEM, warm. The maps come from the engine with the mapping cache (directory from
 * {@code -Datomledger.benchCache=...}, default {@code target/bench-trace-cache}: the first run maps
 * the model, later runs read the cache). The 50 pathways are random walks of up to 10 steps along
 * mapped reactions, each step taking a product that receives carbons of the species before it
 * (seed 14, so every run traces the same pathways). Prints the figures recorded in BENCHMARKS.md.
 * Run with {@code mvn -B -Pbench -pl atom-mapper,checker test -Dtest=TraceYeastBenchmarkTest
 * -Dsurefire.failIfNoSpecifiedTests=false}.
 */
@Tag("bench")
class TraceYeastBenchmarkTest {

    private static final int ROUNDS = 30;

    @Test
    void tracesFiftyPathwaysAndOneCarbonsReachWarm() {
        Path model = SharedData.require("yeast-GEM.xml.gz");
        Path table = SharedData.require("yeast-GEM.structures.tsv");
        Path cache = Path.of(System.getProperty("atomledger.benchCache", "target/bench-trace-cache")).toAbsolutePath();
        RunConfig config = RunConfig.defaults(model.getParent(), List.of(model.getFileName().toString()))
                .withMapping(new MappingConfig(true, table, MappingOptions.defaults(), 2, cache))
                .withPolicy(io.github.atomledger.checker.engine.SeverityPolicy.of(
                        Map.of("balance.mass-inconsistent", "off"), Map.of(),
                        io.github.atomledger.checker.check.StandardChecks.all()));
        ModelResult m = new Engine().run(config, RunListener.SILENT).models().get(0);
        List<Pathway> pathways = walks(m, 50, 10, new Random(14));
        assertThat(pathways).hasSize(50);
        TraceInputs inputs = new TraceInputs(pathways, List.of(), List.of());

        long[] trace = new long[ROUNDS];
        TraceResults r = null;
        for (int i = 0; i < ROUNDS; i++) {
            long t0 = System.nanoTime();
            r = Traces.run(m.model(), m.mapping(), inputs);
            trace[i] = System.nanoTime() - t0;
        }
        int carbons = r.pathways().stream().mapToInt(p -> p.carbons().size()).sum();
        long moved = r.pathways().stream().flatMap(p -> p.carbons().stream()).filter(c -> c.lastMove() > 0).count();

        Position source = glucoseC1(m);
        long[] build = new long[ROUNDS];
        long[] query = new long[ROUNDS];
        LabelReach reach = null;
        for (int i = 0; i < ROUNDS; i++) {
            long t0 = System.nanoTime();
            Reachability network = new Reachability(m.model(), m.mapping());
            long t1 = System.nanoTime();
            reach = network.from(source);
            long t2 = System.nanoTime();
            build[i] = t1 - t0;
            query[i] = t2 - t1;
        }
        long species = reach.reached().stream().map(x -> x.position().species()).distinct().count();
        int furthest = reach.reached().stream().mapToInt(x -> x.chain().size()).max().orElse(0);
        System.out.printf("yeast-GEM traces: 50 pathways (%d steps, %d carbons, %d moved): first %.1f ms, warm median %.2f ms%n",
                pathways.stream().mapToInt(p -> p.steps().size()).sum(), carbons, moved, trace[0] / 1e6, median(trace) / 1e6);
        System.out.printf("yeast-GEM reach from %s atom %d: %d positions in %d species, furthest %d steps;"
                        + " network first %.1f ms, warm median %.2f ms; query first %.1f ms, warm median %.2f ms%n",
                source.species(), source.atom(), reach.reached().size(), species, furthest, build[0] / 1e6,
                median(build) / 1e6, query[0] / 1e6, median(query) / 1e6);
        assertThat(reach.reached().size()).isGreaterThan(1);
    }

    private static double median(long[] values) {
        long[] v = values.clone();
        Arrays.sort(v);
        return v[v.length / 2];
    }

    /** Cytosolic D-glucose, its first carbon in SMILES order. */
    private static Position glucoseC1(ModelResult m) {
        for (SpeciesInfo s : m.model().species()) {
            if (s.name().toLowerCase(java.util.Locale.ROOT).startsWith("d-glucose") && !s.name().contains("phosphate")
                    && m.mapping().structures().get(s.id()).isPresent() && s.compartment().equals("c")) {
                var st = m.mapping().structures().get(s.id()).orElseThrow().structure();
                for (int a = 1; a <= st.heavyAtomCount(); a++) {
                    if (st.graph().element(a - 1).equals("C")) {
                        return new Position(s.id(), a);
                    }
                }
            }
        }
        throw new IllegalStateException("no cytosolic D-glucose with a structure");
    }

    /** Random walks along mapped reactions, each step to a product that receives carbons from the current species. */
    static List<Pathway> walks(ModelResult m, int count, int maxSteps, Random random) {
        List<ReactionInfo> mapped = new ArrayList<>();
        for (ReactionInfo r : m.model().reactions()) {
            ReactionMapping x = m.mapping().mappings().get(r.id());
            if (x != null && x.status() == MapStatus.MAPPED && !x.carbons().isEmpty()) {
                mapped.add(r);
            }
        }
        List<Pathway> out = new ArrayList<>();
        int attempts = 0;
        while (out.size() < count && attempts++ < count * 100) {
            ReactionInfo first = mapped.get(random.nextInt(mapped.size()));
            ReactionMapping fm = m.mapping().mappings().get(first.id());
            String source = fm.carbons().get(random.nextInt(fm.carbons().size())).from().species();
            List<Step> steps = new ArrayList<>();
            String current = source;
            Set<String> seen = new LinkedHashSet<>();
            for (int k = 0; k < maxSteps; k++) {
                List<Step> options = new ArrayList<>();
                List<String> targets = new ArrayList<>();
                for (ReactionInfo r : k == 0 ? List.of(first) : mapped) {
                    for (AtomTransition t : m.mapping().mappings().get(r.id()).carbons()) {
                        if (t.from().species().equals(current) && !seen.contains(r.id())) {
                            options.add(new Step(r.id(), false));
                            targets.add(t.to().species());
                        } else if (r.reversible() && t.to().species().equals(current) && !seen.contains(r.id())) {
                            options.add(new Step(r.id(), true));
                            targets.add(t.from().species());
                        }
                    }
                }
                if (options.isEmpty()) {
                    break;
                }
                int pick = random.nextInt(options.size());
                steps.add(options.get(pick));
                seen.add(options.get(pick).reactionId());
                current = targets.get(pick);
            }
            if (steps.size() >= 3) {
                out.add(new Pathway("walk" + out.size(), source, steps, "", "bench", out.size() + 1));
            }
        }
        return out;
    }
}
