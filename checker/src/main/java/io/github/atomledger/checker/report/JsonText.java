package io.github.atomledger.checker.report;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.json.JsonWriteFeature;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Collection;
import java.util.Map;

/**
 * The one JSON text form of our reports: two-space indentation, '\n' line ends whatever the
 * platform, map keys in the order the report builds them, and a final newline. Thread-safe.
 *
 * <p>The tree is written with Jackson's streaming generator (jackson-core), not its object mapper:
 * a report tree holds only maps, collections, strings, numbers, booleans and nulls, and the mapper's
 * start-up (some 300 classes, serializer introspection) was a tenth of a cold balance run.
 */
final class JsonText {

    /** Characters outside the BMP as UTF-8, not as escaped surrogate pairs (as the text writer did). */
    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(JsonWriteFeature.COMBINE_UNICODE_SURROGATES_IN_UTF8).build();

    private JsonText() {
    }

    /**
     * The tree as JSON text.
     *
     * @param tree maps (keys as strings), collections, strings, numbers, booleans, enums and nulls
     * @throws IllegalArgumentException for a value of any other type
     */
    static String of(Object tree) throws IOException {
        return new String(utf8(tree), StandardCharsets.UTF_8);
    }

    /**
     * The same text as UTF-8 bytes, written straight into a byte buffer: for yeast-GEM's 18 MB
     * report, going through a {@code StringWriter} and encoding afterwards cost twice as long.
     */
    static byte[] utf8(Object tree) throws IOException {
        DefaultPrettyPrinter printer = new DefaultPrettyPrinter()
                .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                .withArrayIndenter(new DefaultIndenter("  ", "\n"));
        ByteArrayOutputStream out = new ByteArrayOutputStream(1 << 16);
        try (JsonGenerator g = FACTORY.createGenerator(out, JsonEncoding.UTF8)) {
            g.setPrettyPrinter(printer);
            write(g, tree);
        }
        out.write('\n');
        return out.toByteArray();
    }

    private static void write(JsonGenerator g, Object value) throws IOException {
        if (value == null) {
            g.writeNull();
        } else if (value instanceof CharSequence s) {
            g.writeString(s.toString());
        } else if (value instanceof Map<?, ?> map) {
            g.writeStartObject();
            for (Map.Entry<?, ?> e : map.entrySet()) {
                g.writeFieldName(String.valueOf(e.getKey()));
                write(g, e.getValue());
            }
            g.writeEndObject();
        } else if (value instanceof Collection<?> list) {
            g.writeStartArray();
            for (Object item : list) {
                write(g, item);
            }
            g.writeEndArray();
        } else if (value instanceof Boolean b) {
            g.writeBoolean(b);
        } else if (value instanceof Integer || value instanceof Short || value instanceof Byte) {
            g.writeNumber(((Number) value).intValue());
        } else if (value instanceof Long l) {
            g.writeNumber(l);
        } else if (value instanceof Double d) {
            g.writeNumber(d);
        } else if (value instanceof Float f) {
            g.writeNumber(f);
        } else if (value instanceof BigInteger i) {
            g.writeNumber(i);
        } else if (value instanceof BigDecimal d) {
            g.writeNumber(d);
        } else if (value instanceof Enum<?> e) {
            g.writeString(e.name());
        } else {
            throw new IllegalArgumentException("no JSON form for " + value.getClass().getName());
        }
    }
}
