package io.github.atomledger.atommapper.formula;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Tag;

/**
 * Coverage-guided fuzzing of {@link FormulaParser} (Jazzer). The contract under test: any text
 * either parses to a formula that survives a round trip through its Hill string, or is refused
 * with a {@link FormulaSyntaxException} whose position lies inside the text; nothing else is
 * thrown and nothing hangs.
 *
 * <p>In the normal test command Jazzer runs in regression mode: it replays every input kept in
 * {@code src/test/resources/.../FormulaParserFuzzTestInputs/parseRefusesOnlyWithSyntaxErrors/}
 * (seeds, the corpus of the long runs and any crasher found). {@code mvn -Pfuzz test
 * -Dtest=FormulaParserFuzzTest} fuzzes for ten minutes (see BENCHMARKS.md).
 */
class FormulaParserFuzzTest {

    @FuzzTest
    void parseRefusesOnlyWithSyntaxErrors(byte[] input) {
        check(input);
    }

    @Tag("fuzz-long")
    @FuzzTest(maxDuration = "10m")
    void parseRefusesOnlyWithSyntaxErrorsLong(byte[] input) {
        check(input);
    }

    private static void check(byte[] input) {
        String text = new String(input, StandardCharsets.UTF_8);
        Formula formula;
        try {
            formula = FormulaParser.parse(text);
        } catch (FormulaSyntaxException e) {
            assertThat(e.position()).isBetween(0, Math.max(0, text.length()));
            assertThat(e.getMessage()).isNotBlank();
            return;
        }
        // A parsed formula writes a Hill string that parses back to the same formula, unless summing
        // repeated symbols went past the parser's cap on one count (10^12).
        boolean withinCap = formula.counts().values().stream().allMatch(n -> n <= 1_000_000_000_000L)
                && formula.repeatUnit().values().stream().allMatch(n -> n <= 1_000_000_000_000L);
        if (withinCap && !(formula.counts().isEmpty() && !formula.isPolymer())) {
            try {
                assertThat(FormulaParser.parse(formula.toHillString())).isEqualTo(formula);
            } catch (FormulaSyntaxException e) {
                throw new AssertionError("Hill string of '" + text + "' does not parse back: " + e.getMessage(), e);
            }
        }
    }
}
