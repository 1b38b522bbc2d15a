package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.engine.RunResult;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * JsonText writes with Jackson's streaming generator (issue 8, cold start); its text must stay byte for byte what
 * Jackson's object mapper wrote before, so that reports do not change.
 */
class JsonTextTest {

    /** The writer JsonText replaced: the object mapper with the same pretty printer. */
    private static String mapper(Object tree) throws Exception {
        ObjectMapper mapper = new ObjectMapper().configure(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS, false)
                .configure(JsonGenerator.Feature.AUTO_CLOSE_TARGET, false);
        DefaultPrettyPrinter printer = new DefaultPrettyPrinter().withObjectIndenter(new DefaultIndenter("  ", "\n"))
                .withArrayIndenter(new DefaultIndenter("  ", "\n"));
        return mapper.writer(printer).writeValueAsString(tree) + "\n";
    }

    @Test
    void writesEveryValueKindAsTheObjectMapperDid() throws Exception {
        Map<String, Object> tree = new LinkedHashMap<>();
        tree.put("text", "quote \" backslash \\ tab \t newline \n control \u0001 unicode é → 😀 </script>");
        tree.put("int", 7);
        tree.put("long", Long.MIN_VALUE);
        tree.put("negative", -3);
        tree.put("true", true);
        tree.put("false", false);
        tree.put("null", null);
        tree.put("emptyObject", new TreeMap<>());
        tree.put("emptyArray", List.of());
        tree.put("big", new BigInteger("123456789012345678901234567890"));
        tree.put("decimal", new BigDecimal("-0.633"));
        tree.put("double", 1.5);
        tree.put("nested", List.of(Map.of("a", List.of(1, 2, List.of())), "x"));
        tree.put("nulls", Arrays.asList(null, null));
        tree.put("sortedKeys", new TreeMap<>(Map.of("b", "2", "a", "1")));
        assertThat(JsonText.of(tree)).isEqualTo(mapper(tree));
    }

    @Test
    void writesFailingFixtureReportsAsTheObjectMapperDid() throws Exception {
        RunResult result = Fixtures.run("charge-gap.xml");
        assertThat(JsonText.of(JsonReporter.tree(result))).isEqualTo(mapper(JsonReporter.tree(result)));
        assertThat(JsonText.of(SarifReporter.tree(result))).isEqualTo(mapper(SarifReporter.tree(result)));
    }

    @Test
    void writesTheDemoReportAsTheObjectMapperDid() throws Exception {
        RunResult result = DemoReports.run(Path.of("target"));
        assertThat(JsonText.of(JsonReporter.tree(result))).isEqualTo(mapper(JsonReporter.tree(result)));
    }

    @Test
    void refusesValuesWithoutAJsonForm() {
        assertThatThrownBy(() -> JsonText.of(List.of(new ArrayList<>(), new Object())))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("java.lang.Object");
    }
}
