package io.github.atomledger.checker.engine;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.report.JsonReporter;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Mapping the demo model (invented organism; structures checked against their formulas by CDK). */
class MappingStageTest {

    /** A generous time budget: statuses must not depend on how busy the test machine is. */
    static final MappingOptions OPTIONS = MappingOptions.defaults().withTimeBudget(java.time.Duration.ofSeconds(60));

    @TempDir
    Path cache;

    private static Path demo() {
        Path dir = Path.of("").toAbsolutePath();
        while (dir != null && !Files.isDirectory(dir.resolve("demo/models"))) {
            dir = dir.getParent();
        }
        return dir.resolve("demo");
    }

    private RunConfig config(int threads, Path cacheDir) {
        Path demo = demo();
        return RunConfig.defaults(demo, List.of("models/ledgerella_central.xml"))
                .withMapping(new MappingConfig(true, demo.resolve("structures.tsv"), OPTIONS, threads, cacheDir));
    }

    @Test
    void mapsEveryConservingReactionAndSkipsExchangeAndBiomass() {
        ModelResult m = new Engine().run(config(2, null), RunListener.SILENT).models().get(0);
        Map<String, MapStatus> status = m.reactions().stream()
                .collect(Collectors.toMap(ReactionResult::id, r -> r.mapping().status()));
        assertThat(status).containsEntry("R_EX_glc", MapStatus.SKIPPED).containsEntry("R_GROWTH", MapStatus.SKIPPED)
                .containsEntry("R_PPC", MapStatus.MAPPED).containsEntry("R_CS", MapStatus.MAPPED)
                .containsEntry("R_ALAT", MapStatus.MAPPED);
        // Transamination keeps both carbon skeletons (common practice): alanine's three carbons
        // become pyruvate's, 2-oxoglutarate's five become glutamate's.
        ReactionMapping alat = m.reactions().stream().filter(r -> r.id().equals("R_ALAT")).findFirst().orElseThrow().mapping();
        assertThat(alat.carbons()).allSatisfy(t -> assertThat(t.to().species())
                .isEqualTo(t.from().species().equals("ala_c") ? "pyr_c" : "glu_c"));
        // Phosphoenolpyruvate carboxylase: PEP C1-C3 become OAA C1-C3 and CO2 becomes OAA C4
        // (textbook anaplerosis; from memory). Atom numbers are SMILES positions in structures.tsv.
        ReactionMapping ppc = m.reactions().stream().filter(r -> r.id().equals("R_PPC")).findFirst().orElseThrow().mapping();
        assertThat(ppc.carbons()).extracting(t -> t.from() + ">" + t.to())
                .containsExactly("co2_c#1:2>oaa_c#1:2", "pep_c#1:1>oaa_c#1:4", "pep_c#1:2>oaa_c#1:5", "pep_c#1:8>oaa_c#1:7");
    }

    @Test
    void warmRunReadsTheCacheAndGivesTheSameReportAsOneThreadWithoutCache() throws IOException {
        JsonReporter json = new JsonReporter();
        String cold = json.toJson(new Engine().run(config(2, cache), RunListener.SILENT));
        long entries;
        try (Stream<Path> files = Files.walk(cache)) {
            entries = files.filter(p -> p.toString().endsWith(".json")).count();
        }
        assertThat(entries).isEqualTo(53);
        String warm = json.toJson(new Engine().run(config(2, cache), RunListener.SILENT));
        String single = json.toJson(new Engine().run(config(1, null), RunListener.SILENT));
        assertThat(warm).isEqualTo(cold);
        assertThat(single).isEqualTo(cold);
    }

    @Test
    void damagedCacheEntriesAreMissesNotErrors() throws IOException {
        new Engine().run(config(2, cache), RunListener.SILENT);
        try (Stream<Path> files = Files.walk(cache)) {
            for (Path p : files.filter(x -> x.toString().endsWith(".json")).toList()) {
                Files.writeString(p, "{ not json");
            }
        }
        ModelResult m = new Engine().run(config(2, cache), RunListener.SILENT).models().get(0);
        assertThat(m.reactions().stream().filter(r -> r.mapping().status() == MapStatus.MAPPED).count()).isEqualTo(53);
    }
}
