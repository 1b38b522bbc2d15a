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
import java.util.Map;
import java.util.TreeMap;
import javax.xml.XMLConstants;
import javax.xml.transform.stream.StreamSource;
import javax.xml.validation.SchemaFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Every format on yeast-GEM 9.0.2 (the consensus S. cerevisiae model, CC BY 4.0, read from
 * ../shared/data; skipped when absent): 4,131 reactions, as its provenance note states. SARIF and
 * JUnit XML validate against their schemas, the HTML is well-formed and holds one card per
 * reaction, and the sizes are printed for docs/reports.md.
 */
class YeastReportsTest {

    static final Path OUT = Path.of("target", "reports-yeast");
    static RunResult result;
    static Map<String, Long> sizes = new TreeMap<>();

    @BeforeAll
    static void run() throws Exception {
        Path file = SharedData.require("yeast-GEM.xml.gz");
        RunConfig config = RunConfig.defaults(file.getParent(), List.of(file.getFileName().toString()))
                .withFormats(EnumSet.allOf(ReportFormat.class));
        result = new Engine().run(config, RunListener.SILENT);
        for (Path p : Reporters.forFormats(EnumSet.allOf(ReportFormat.class)).write(result, OUT)) {
            sizes.put(OUT.relativize(p).toString(), Files.size(p));
        }
        System.out.println("yeast-GEM report sizes (bytes): " + sizes);
    }

    @Test
    void writesEveryFormatWithOneEntryPerReaction() throws Exception {
        assertThat(result.models().get(0).reactions()).hasSize(4131);
        assertThat(sizes).hasSize(5);
        String html = Files.readString(OUT.resolve("report.html"));
        assertThat(HtmlReporterTest.parse(html).getElementsByTagName("article").getLength()).isEqualTo(4131);
        assertThat(html).contains("No atom map for this reaction: balance only.");
    }

    @Test
    void sarifAndJunitValidateAgainstTheirSchemas() throws Exception {
        assertThat(JsonSchemas.errors(JsonSchemas.sarif(), Files.readString(OUT.resolve("report.sarif")))).isEmpty();
        assertThat(JsonSchemas.errors(JsonSchemas.report(), Files.readString(OUT.resolve("report.json")))).isEmpty();
        SchemaFactory f = SchemaFactory.newInstance(XMLConstants.W3C_XML_SCHEMA_NS_URI);
        f.newSchema(getClass().getResource("junit-ci.xsd")).newValidator()
                .validate(new StreamSource(OUT.resolve("junit/TEST-atomledger.xml").toFile()));
    }

    @Test
    void markdownStaysShort() throws Exception {
        List<String> lines = Files.readAllLines(OUT.resolve("summary.md"));
        assertThat(lines.size()).isLessThan(40);
    }
}
