package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.engine.RunResult;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The console summary: plain by default, ANSI colour only when asked, colour only on a terminal. */
class ConsoleSummaryTest {

    @Test
    void plainLinesCarryNoEscapeCodes() {
        RunResult result = Fixtures.run("charge-gap.xml");
        List<String> lines = ConsoleSummary.lines(result);
        assertThat(lines.get(0)).startsWith("charge-gap.xml: 4 reactions").contains("3 errors");
        assertThat(lines).anySatisfy(l -> assertThat(l).startsWith("  R_HEX  H -1  charge -1"));
        assertThat(String.join("\n", lines)).doesNotContain("\u001b[");
    }

    @Test
    void colouredLinesMarkErrorsAndReactionIds() {
        List<String> lines = ConsoleSummary.lines(Fixtures.run("charge-gap.xml"), true);
        assertThat(lines.get(0)).contains("\u001b[31m3 errors\u001b[0m");
        assertThat(lines).anySatisfy(l -> assertThat(l).startsWith("  \u001b[1mR_HEX\u001b[0m  H -1"));
    }

    @Test
    void wantsColourOnlyOnAnInteractiveTerminalOutsideCi() {
        assertThat(ConsoleSummary.colourWanted(Map.of("TERM", "xterm-256color"), true)).isTrue();
        assertThat(ConsoleSummary.colourWanted(Map.of("TERM", "xterm-256color"), false)).isFalse();
        assertThat(ConsoleSummary.colourWanted(Map.of("CI", "true"), true)).isFalse();
        assertThat(ConsoleSummary.colourWanted(Map.of("NO_COLOR", "1"), true)).isFalse();
        assertThat(ConsoleSummary.colourWanted(Map.of("TERM", "dumb"), true)).isFalse();
    }
}
