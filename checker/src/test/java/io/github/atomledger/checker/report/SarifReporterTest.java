package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.StandardChecks;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunResult;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * SARIF 2.1.0 output, validated against the published SARIF 2.1.0 JSON schema (OASIS SARIF
 * Version 2.1.0; the rtm.5 schema file, see SCHEMAS.md). Levels follow SARIF §3.27.10.
 */
class SarifReporterTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    @Test
    void failingFixtureValidatesAndPointsAtTheReactionLine() throws Exception {
        RunResult result = Fixtures.run("charge-gap.xml");
        String sarif = new SarifReporter().toSarif(result);
        assertThat(JsonSchemas.errors(JsonSchemas.sarif(), sarif)).isEmpty();
        JsonNode run = MAPPER.readTree(sarif).path("runs").path(0);
        JsonNode hex = null;
        for (JsonNode r : run.path("results")) {
            if (r.path("ruleId").asText().equals("balance.charge")) {
                hex = r;
            }
        }
        assertThat(hex).isNotNull();
        assertThat(hex.path("level").asText()).isEqualTo("error");
        JsonNode loc = hex.path("locations").path(0).path("physicalLocation");
        assertThat(loc.path("artifactLocation").path("uri").asText()).isEqualTo("charge-gap.xml");
        assertThat(loc.path("artifactLocation").path("uriBaseId").asText()).isEqualTo("%SRCROOT%");
        assertThat(loc.path("region").path("startLine").asInt()).isEqualTo(20);
        assertThat(hex.path("locations").path(0).path("logicalLocations").path(0).path("name").asText()).isEqualTo("R_HEX");
        int index = hex.path("ruleIndex").asInt();
        assertThat(run.path("tool").path("driver").path("rules").path(index).path("id").asText()).isEqualTo("balance.charge");
    }

    @Test
    void listsEveryStandardRuleWithItsDescription() throws Exception {
        JsonNode rules = MAPPER.readTree(new SarifReporter().toSarif(DemoReports.run(java.nio.file.Path.of("target"))))
                .path("runs").path(0).path("tool").path("driver").path("rules");
        Map<String, String> byId = new TreeMap<>();
        List<String> order = new java.util.ArrayList<>();
        rules.forEach(r -> {
            byId.put(r.path("id").asText(), r.path("shortDescription").path("text").asText());
            order.add(r.path("id").asText());
        });
        for (ModelCheck c : StandardChecks.all()) {
            assertThat(byId).containsEntry(c.ruleId(), c.description());
        }
        assertThat(order).isSorted();
    }

    @Test
    void leavesTheRegionOutWhenTheLineIsUnknownAndMapsInfoToNote() throws Exception {
        RunResult demo = DemoReports.run(java.nio.file.Path.of("target"));
        ModelResult m = demo.models().get(0);
        Finding noLine = new Finding("model.formula-missing", Severity.INFO, "models/with space.xml", "glc_c", 0,
                "Species glc_c has no formula.", new TreeMap<>());
        RunResult result = new RunResult(demo.config(), List.of(new ModelResult(m.model(), List.of(), List.of(noLine), m.mapping())));
        String sarif = new SarifReporter().toSarif(result);
        assertThat(JsonSchemas.errors(JsonSchemas.sarif(), sarif)).isEmpty();
        JsonNode r = MAPPER.readTree(sarif).path("runs").path(0).path("results").path(0);
        assertThat(r.path("level").asText()).isEqualTo("note");
        JsonNode loc = r.path("locations").path(0).path("physicalLocation");
        assertThat(loc.has("region")).isFalse();
        assertThat(loc.path("artifactLocation").path("uri").asText()).isEqualTo("models/with%20space.xml");
    }

    @Test
    void schemaRejectsALevelSarifDoesNotKnow() throws Exception {
        String sarif = new SarifReporter().toSarif(Fixtures.run("charge-gap.xml"))
                .replace("\"level\" : \"error\"", "\"level\" : \"fatal\"");
        assertThat(sarif).contains("fatal");
        assertThat(JsonSchemas.errors(JsonSchemas.sarif(), sarif)).isNotEmpty();
    }

    @Test
    void mapsSeveritiesToSarifLevels() {
        assertThat(SarifReporter.level(Severity.ERROR)).isEqualTo("error");
        assertThat(SarifReporter.level(Severity.WARNING)).isEqualTo("warning");
        assertThat(SarifReporter.level(Severity.INFO)).isEqualTo("note");
    }
}
