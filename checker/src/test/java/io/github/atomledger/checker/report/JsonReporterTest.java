package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** report.json validates against docs/report-schema.json, so the documented schema keeps up with the code. */
class JsonReporterTest {

    @Test
    void demoReportMatchesTheDocumentedSchema() throws Exception {
        String json = new JsonReporter().toJson(DemoReports.run(Path.of("target")));
        assertThat(JsonSchemas.errors(JsonSchemas.report(), json)).isEmpty();
    }

    @Test
    void failingFixtureMatchesTheDocumentedSchema() throws Exception {
        String json = new JsonReporter().toJson(Fixtures.run("charge-gap.xml"));
        assertThat(JsonSchemas.errors(JsonSchemas.report(), json)).isEmpty();
    }

    @Test
    void schemaRejectsAReportWithoutSchemaVersion() throws Exception {
        String json = new JsonReporter().toJson(Fixtures.run("charge-gap.xml")).replace("\"schemaVersion\"", "\"version\"");
        assertThat(JsonSchemas.errors(JsonSchemas.report(), json)).isNotEmpty();
    }
}
