package io.github.atomledger.checker.bench;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.structure.SdFile;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.check.structure.StructureLibrary;
import io.github.atomledger.checker.check.structure.StructureResolver;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;
import io.github.atomledger.checker.model.ModelView;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15: the cost of a large SD file as a structure source. A file of 100,000 records in the
 * ChEBI dump's layout is generated: the 45 records of {@code chebi-central.sdf} (the e_coli_core
 * compounds) spread evenly through it, the rest copies of them under unused ids. Measured in one
 * JVM, plain and gzip: the first run (index the file, store the index, resolve e_coli_core's
 * species, read their records) and a second run (index from the cache). Prints the figures
 * recorded in BENCHMARKS.md. Run with {@code mvn -B -Pbench -pl atom-mapper,checker -am test
 * -Dtest=SdIndexBenchmarkTest -Dsurefire.failIfNoSpecifiedTests=false}.
 */
@Tag("bench")
class SdIndexBenchmarkTest {

    static final int RECORDS = 100_000;

    @TempDir
    Path dir;

    @Test
    void aHundredThousandRecordSdFileIsIndexedOnceAndReadFromTheCacheAfterwards() throws Exception {
        Path model = SharedData.require("e_coli_core.original.xml");
        ModelView view = new ModelLoader(LoadOptions.defaults()).load(model, "e_coli_core.original.xml");
        List<String> real = records(Files.readString(TestModels.fixture("structure/sources/chebi-central.sdf")));
        Path plain = dir.resolve("big.sdf");
        Path gz = dir.resolve("big.sdf.gz");
        generate(real, plain, false);
        generate(real, gz, true);
        System.out.printf("generated %,d records: %,d bytes plain, %,d bytes gzip%n", RECORDS, Files.size(plain), Files.size(gz));
        for (Path file : List.of(plain, gz)) {
            Path cache = Files.createDirectories(dir.resolve("cache-" + file.getFileName()));
            long t0 = System.nanoTime();
            SdFile first = SdFile.load(file, file.getFileName().toString(), SdFile.DEFAULT_ID_FIELD, cache);
            long t1 = System.nanoTime();
            SpeciesStructures s1 = new StructureResolver().resolve(view, StructureLibrary.of(List.of(first)), Map.of());
            long t2 = System.nanoTime();
            SdFile second = SdFile.load(file, file.getFileName().toString(), SdFile.DEFAULT_ID_FIELD, cache);
            long t3 = System.nanoTime();
            SpeciesStructures s2 = new StructureResolver().resolve(view, StructureLibrary.of(List.of(second)), Map.of());
            long t4 = System.nanoTime();
            SdFile uncached = SdFile.load(file, file.getFileName().toString(), SdFile.DEFAULT_ID_FIELD, null);
            long t5 = System.nanoTime();
            assertThat(first.indexFromCache()).isFalse();
            assertThat(second.indexFromCache()).isTrue();
            assertThat(first.recordCount()).isEqualTo(RECORDS);
            assertThat(s1.bySpecies()).hasSize(59);
            assertThat(s2.bySpecies().keySet()).isEqualTo(s1.bySpecies().keySet());
            long indexBytes;
            try (var list = Files.walk(cache)) {
                indexBytes = list.filter(Files::isRegularFile).mapToLong(p -> p.toFile().length()).sum();
            }
            System.out.printf("%s: first run index %d ms + resolve %d ms; cached index %d ms + resolve %d ms;"
                            + " index again without cache %d ms; index file %,d bytes%n", file.getFileName(),
                    ms(t0, t1), ms(t1, t2), ms(t2, t3), ms(t3, t4), ms(t4, t5), indexBytes);
            assertThat(uncached.recordCount()).isEqualTo(RECORDS);
        }
        // What the index spares: reading every record's molecule (CDK) on every run. Measured on the
        // first 10,000 records of the plain file and scaled to 100,000.
        String text = Files.readString(plain);
        long p0 = System.nanoTime();
        int parsed = 0;
        int at = 0;
        while (parsed < 10_000) {
            int end = text.indexOf("$$$$\n", at);
            io.github.atomledger.atommapper.structure.Structure.fromMolfile(
                    io.github.atomledger.atommapper.ctfile.SdFileScanner.molfilePart(text.substring(at, end)));
            at = end + 5;
            parsed++;
        }
        long p1 = System.nanoTime();
        System.out.printf("reading the molecules of 10,000 records: %d ms (x10 for the file: about %d s)%n", ms(p0, p1),
                ms(p0, p1) * 10 / 1000);
    }

    private static long ms(long from, long to) {
        return (to - from) / 1_000_000;
    }

    private static List<String> records(String sd) {
        List<String> out = new ArrayList<>();
        for (String r : sd.split("\\$\\$\\$\\$\n")) {
            if (!r.isBlank()) {
                out.add(r + "$$$$\n");
            }
        }
        return out;
    }

    /** The real records at every (RECORDS / 45)-th place, copies under ids CHEBI:900000+ elsewhere. */
    private static void generate(List<String> real, Path file, boolean gzip) throws IOException {
        int step = RECORDS / real.size();
        try (Writer out = new BufferedWriter(new OutputStreamWriter(gzip
                ? new GZIPOutputStream(Files.newOutputStream(file), 1 << 16) : Files.newOutputStream(file),
                StandardCharsets.UTF_8), 1 << 16)) {
            int r = 0;
            for (int i = 0; i < RECORDS; i++) {
                String record = real.get(i % real.size());
                if (i % step == 0 && r < real.size()) {
                    record = real.get(r++);
                } else {
                    record = record.replaceFirst("CHEBI:\\d+", "CHEBI:" + (900_000 + i));
                }
                out.write(record);
            }
        }
    }
}
