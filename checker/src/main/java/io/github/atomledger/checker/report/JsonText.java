package io.github.atomledger.checker.report;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import java.io.IOException;

/**
 * The one JSON text form of our reports: two-space indentation, '\n' line ends whatever the
 * platform, map keys in the order the report builds them, and a final newline. Thread-safe.
 */
final class JsonText {

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .configure(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS, false)
            .configure(JsonGenerator.Feature.AUTO_CLOSE_TARGET, false);

    private JsonText() {
    }

    static String of(Object tree) throws IOException {
        DefaultPrettyPrinter printer = new DefaultPrettyPrinter()
                .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                .withArrayIndenter(new DefaultIndenter("  ", "\n"));
        return MAPPER.writer(printer).writeValueAsString(tree) + "\n";
    }
}
