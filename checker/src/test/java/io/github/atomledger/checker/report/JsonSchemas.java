package io.github.atomledger.checker.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.Error;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** JSON Schema validation with networknt's validator (a general-purpose library from Maven Central). */
final class JsonSchemas {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private JsonSchemas() {
    }

    /** The published SARIF 2.1.0 schema (JSON Schema draft 4); see SCHEMAS.md. */
    static Schema sarif() throws IOException {
        try (InputStream in = JsonSchemas.class.getResourceAsStream("sarif-2.1.0-rtm.5.json")) {
            return SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_4).getSchema(in);
        }
    }

    /** The project's docs/report-schema.json (JSON Schema 2020-12). */
    static Schema report() throws IOException {
        try (InputStream in = Files.newInputStream(Path.of("..", "docs", "report-schema.json"))) {
            return SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12).getSchema(in);
        }
    }

    /** The project's docs/traces-schema.json for traces.json and reachability.json (JSON Schema 2020-12). */
    static Schema traces() throws IOException {
        try (InputStream in = Files.newInputStream(Path.of("..", "docs", "traces-schema.json"))) {
            return SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12).getSchema(in);
        }
    }

    static List<String> errors(Schema schema, String json) throws IOException {
        JsonNode node = MAPPER.readTree(json);
        return schema.validate(node).stream().map(Error::toString).toList();
    }
}
