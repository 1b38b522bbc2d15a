package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.engine.RunResult;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The demo's traces (invented organism; routes as in models/pathways.tsv) in traces.json,
 * reachability.json and on the console (issue #14). The carbon counts are common practice
 * (textbook biochemistry): leucine gives 1 CO2, 2 acetyl-CoA and 3 acetoacetate.
 */
class TraceReportsTest {

    private static final Path OUT = Path.of("target", "trace-reports");
    private static RunResult result;
    private static List<Path> written;

    @BeforeAll
    static void write() throws Exception {
        result = DemoReports.runMapped();
        written = DemoReports.writeAll(result, OUT, MappingSource.FROM_ENGINE);
    }

    @Test
    void writesTracesAndReachBesideTheReportAndMatchesTheSchema() throws Exception {
        assertThat(written).contains(OUT.resolve("traces.json"), OUT.resolve("reachability.json"));
        String traces = Files.readString(OUT.resolve("traces.json"));
        String reach = Files.readString(OUT.resolve("reachability.json"));
        assertThat(JsonSchemas.errors(JsonSchemas.traces(), traces)).isEmpty();
        assertThat(JsonSchemas.errors(JsonSchemas.traces(), reach)).isEmpty();
        assertThat(JsonText.of(TracesReporter.tree(result))).isEqualTo(traces);
    }

    @Test
    void namesEachCarbonItsLabelStatusAndFate() throws Exception {
        JsonNode root = new ObjectMapper().readTree(OUT.resolve("traces.json").toFile());
        JsonNode leucine = null;
        for (JsonNode t : root.get("traces")) {
            if (t.get("pathway").asText().equals("leucine")) {
                leucine = t;
            }
        }
        assertThat(leucine).isNotNull();
        assertThat(leucine.get("source").asText()).isEqualTo("leu_c");
        JsonNode c1 = null;
        for (JsonNode c : leucine.get("carbons")) {
            if (c.get("label").asText().equals("C1")) {
                c1 = c;
            }
        }
        assertThat(c1.get("atom").asInt()).isEqualTo(7);
        assertThat(c1.get("status").asText()).isEqualTo("decided");
        assertThat(c1.get("fate").get("species").asText()).isEqualTo("co2_c");
        assertThat(c1.get("fate").get("label").asText()).isEqualTo("C1");
        assertThat(c1.get("fate").get("step").asText()).isEqualTo("R_BCKDH");
        assertThat(c1.get("path")).hasSize(2);
        assertThat(leucine.get("expectations").get(0).get("verdict").asText()).isEqualTo("holds");
    }

    @Test
    void printsOneLinePerPathwayWithItsFateCounts() {
        List<String> lines = ConsoleSummary.lines(result);
        assertThat(lines).contains("  pathway leucine: 6 carbons: 1 carbon dioxide, 2 acetyl-CoA, 3 acetoacetate"
                + " (2 split over equivalent positions); fates: 4 hold");
        assertThat(lines).anySatisfy(l -> assertThat(l).startsWith("  pathway phenylalanine: 9 carbons: 1 carbon dioxide,")
                .contains("4 acetoacetate").contains("4 fumarate"));
        assertThat(lines).anySatisfy(l -> assertThat(l).startsWith("  label from glc_e:C1 can reach "));
    }

    @Test
    void aRunWithoutTracesRemovesAnEarlierTracesFile() throws Exception {
        Path dir = Path.of("target", "trace-reports-none");
        Files.createDirectories(dir);
        Files.writeString(dir.resolve("traces.json"), "{}");
        List<Path> none = DemoReports.writeAll(DemoReports.run(dir), dir, MappingSource.FROM_ENGINE);
        assertThat(none).doesNotContain(dir.resolve("traces.json"));
        assertThat(dir.resolve("traces.json")).doesNotExist();
    }
}
