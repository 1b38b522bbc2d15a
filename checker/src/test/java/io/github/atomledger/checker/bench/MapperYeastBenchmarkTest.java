package io.github.atomledger.checker.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import io.github.atomledger.atommapper.mapping.AtomMapper;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.MappingStatus;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.zip.GZIPInputStream;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Benchmark (issue 3): maps every yeast-GEM reaction whose species all have SMILES, on two threads,
 * and prints the figures recorded in BENCHMARKS.md. Reads only reaction ids, species references and
 * stoichiometry, with a StAX reader that refuses DTDs and external entities. Skips when the shared
 * data folder is absent. Run with {@code -Pbench}.
 */
@Tag("bench")
class MapperYeastBenchmarkTest {

    record Raw(String id, Map<String, Double> reactants, Map<String, Double> products) {
    }

    static Path dataDir() {
        Path here = Path.of("").toAbsolutePath();
        for (Path p = here; p != null; p = p.getParent()) {
            Path candidate = p.resolveSibling("shared").resolve("data");
            if (Files.isRegularFile(candidate.resolve("yeast-GEM.xml.gz"))) {
                return candidate;
            }
            Path inside = p.resolve("shared").resolve("data");
            if (Files.isRegularFile(inside.resolve("yeast-GEM.xml.gz"))) {
                return inside;
            }
        }
        return null;
    }

    static List<Raw> readReactions(Path gz) throws IOException, XMLStreamException {
        XMLInputFactory factory = XMLInputFactory.newDefaultFactory();
        factory.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        factory.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        List<Raw> out = new ArrayList<>();
        try (InputStream in = new GZIPInputStream(Files.newInputStream(gz))) {
            XMLStreamReader x = factory.createXMLStreamReader(in);
            Raw current = null;
            Map<String, Double> side = null;
            while (x.hasNext()) {
                int event = x.next();
                if (event == XMLStreamConstants.START_ELEMENT) {
                    switch (x.getLocalName()) {
                        case "reaction" -> current = new Raw(x.getAttributeValue(null, "id"), new LinkedHashMap<>(),
                                new LinkedHashMap<>());
                        case "listOfReactants" -> side = current == null ? null : current.reactants();
                        case "listOfProducts" -> side = current == null ? null : current.products();
                        case "speciesReference" -> {
                            if (side != null) {
                                String s = x.getAttributeValue(null, "stoichiometry");
                                side.merge(x.getAttributeValue(null, "species"), s == null ? 1.0 : Double.parseDouble(s),
                                        Double::sum);
                            }
                        }
                        default -> { }
                    }
                } else if (event == XMLStreamConstants.END_ELEMENT) {
                    switch (x.getLocalName()) {
                        case "reaction" -> {
                            out.add(current);
                            current = null;
                        }
                        case "listOfReactants", "listOfProducts" -> side = null;
                        default -> { }
                    }
                }
            }
        }
        return out;
    }

    @Test
    void mapsYeastReactionsWithAllStructures() throws Exception {
        Path data = dataDir();
        assumeTrue(data != null && Files.isRegularFile(data.resolve("yeast-GEM.structures.tsv")),
                "shared data folder with yeast-GEM is absent");
        StringBuilder report = new StringBuilder();
        int[] bad = new int[1];
        Map<String, Structure> structures = structures(data, bad);
        int badSmiles = bad[0];
        List<ReactionInput> inputs = new ArrayList<>();
        List<MappingResult> rejected = new ArrayList<>();
        int oneSided = 0;
        int missing = 0;
        for (Raw raw : readReactions(data.resolve("yeast-GEM.xml.gz"))) {
            if (raw.reactants().isEmpty() || raw.products().isEmpty()) {
                oneSided++;
                continue;
            }
            if (!structures.keySet().containsAll(raw.reactants().keySet())
                    || !structures.keySet().containsAll(raw.products().keySet())) {
                missing++;
                continue;
            }
            String fractional = fractional(raw);
            if (fractional != null) {
                rejected.add(MappingResult.unmappable(raw.id(), "coefficient of " + fractional + " is not an integer"));
                continue;
            }
            inputs.add(new ReactionInput(raw.id(), side(raw.reactants(), structures), side(raw.products(), structures)));
        }
        // Optional overrides for comparing versions under a deterministic budget.
        MappingOptions options = MappingOptions.defaults();
        String nodes = System.getProperty("atomledger.bench.nodeLimit");
        if (nodes != null) {
            options = options.withNodeLimit(Long.parseLong(nodes)).withTimeBudget(java.time.Duration.ofMinutes(5));
        }
        AtomMapper mapper = new AtomMapper(options);
        report.append("options: ").append(options.fingerprint()).append('\n');
        long start = System.nanoTime();
        List<MappingResult> results = mapper.mapAll(inputs, 2);
        long wallMs = (System.nanoTime() - start) / 1_000_000;
        results = new ArrayList<>(results);
        Map<MappingStatus, Integer> counts = new EnumMap<>(MappingStatus.class);
        List<Long> ms = new ArrayList<>();
        int balanced = 0;
        int proven = 0;
        for (MappingResult r : results) {
            counts.merge(r.status(), 1, Integer::sum);
            ms.add(r.elapsed().toMillis());
            if (r.status() != MappingStatus.UNMAPPABLE && r.status() != MappingStatus.TOO_LARGE) {
                balanced++;
                if (r.status() == MappingStatus.MAPPED || r.status() == MappingStatus.AMBIGUOUS) {
                    proven++;
                }
            }
            assertThat(r.status() == MappingStatus.UNMAPPABLE || r.cost() >= r.lowerBound()).isTrue();
        }
        counts.merge(MappingStatus.UNMAPPABLE, rejected.size(), Integer::sum);
        ms.sort(null);
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP && pool.getPeakUsage() != null) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        report.append("yeast-GEM mapper benchmark\n");
        report.append("structures parsed: ").append(structures.size()).append(", unparsable SMILES: ").append(badSmiles).append('\n');
        report.append("reactions skipped: one-sided ").append(oneSided).append(", species without SMILES ").append(missing).append('\n');
        report.append("reactions mapped: ").append(results.size()).append(" (+ ").append(rejected.size())
                .append(" with fractional coefficients)\n");
        report.append("status counts: ").append(counts).append('\n');
        report.append(String.format("proven optimal within budget: %d of %d balanced (%.2f%%)%n", proven, balanced,
                balanced == 0 ? 0.0 : 100.0 * proven / balanced));
        if (!ms.isEmpty()) {
            report.append("per reaction ms: median ").append(ms.get(ms.size() / 2)).append(", p95 ")
                    .append(ms.get((int) Math.min(ms.size() - 1, Math.round(ms.size() * 0.95)))).append(", max ")
                    .append(ms.get(ms.size() - 1)).append('\n');
        }
        report.append("wall time on 2 threads: ").append(wallMs).append(" ms; peak heap (sum of pool peaks): ")
                .append(peak / (1024 * 1024)).append(" MiB\n");
        results.sort((a, b) -> b.elapsed().compareTo(a.elapsed()));
        report.append("slowest:\n");
        for (MappingResult r : results.subList(0, Math.min(15, results.size()))) {
            report.append("  ").append(r.elapsed().toMillis()).append(" ms ").append(r).append('\n');
        }
        System.out.print(report);
        Files.createDirectories(Path.of("target"));
        Files.writeString(Path.of("target", "mapper-yeast-benchmark.txt"), report.toString());
        assertThat(results).isNotEmpty();
    }

    /** The parsed SMILES of yeast-GEM.structures.tsv by species; {@code bad[0]} counts those that do not parse. */
    static Map<String, Structure> structures(Path data, int[] bad) throws IOException {
        Map<String, Structure> structures = new HashMap<>();
        try (BufferedReader in = Files.newBufferedReader(data.resolve("yeast-GEM.structures.tsv"), StandardCharsets.UTF_8)) {
            in.readLine();
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                String[] cols = line.split("\t");
                try {
                    structures.put(cols[0], Structure.fromSmiles(cols[1]));
                } catch (StructureException e) {
                    bad[0]++;
                }
            }
        }
        return structures;
    }

    static String fractional(Raw raw) {
        for (Map<String, Double> side : List.of(raw.reactants(), raw.products())) {
            for (Map.Entry<String, Double> e : side.entrySet()) {
                if (e.getValue() != Math.rint(e.getValue()) || e.getValue() < 1) {
                    return e.getKey() + " (" + e.getValue() + ")";
                }
            }
        }
        return null;
    }

    static List<Participant> side(Map<String, Double> side, Map<String, Structure> structures) {
        List<Participant> out = new ArrayList<>();
        side.forEach((species, coefficient) -> out.add(new Participant(species, structures.get(species),
                (int) Math.round(coefficient))));
        return out;
    }
}
