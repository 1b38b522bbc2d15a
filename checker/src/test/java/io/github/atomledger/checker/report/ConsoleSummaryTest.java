package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.engine.RunResult;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The console summary: levels per line, reasons in words, caps; plain by default, ANSI colour only
 * when asked, colour only on a terminal.
 */
class ConsoleSummaryTest {

    @Test
    void failingFindingsAreErrorsWithNameFileLineAndReasonInWords() {
        List<ConsoleSummary.Line> lines = ConsoleSummary.report(Fixtures.run("charge-gap.xml"), false);
        assertThat(lines.get(0)).isEqualTo(new ConsoleSummary.Line(ConsoleSummary.Level.INFO,
                "charge-gap.xml: 4 reactions (3 internal, 1 sink); 3 errors, 0 warnings, 1 info"));
        assertThat(lines).contains(
                new ConsoleSummary.Line(ConsoleSummary.Level.ERROR, "  3 errors fail the build:"),
                new ConsoleSummary.Line(ConsoleSummary.Level.ERROR, "    R_HEX (charge-gap.xml:20): charge -1: the"
                        + " products' total charge is one lower"),
                new ConsoleSummary.Line(ConsoleSummary.Level.ERROR, "    R_HEX (charge-gap.xml:20): H -1: the products"
                        + " have one hydrogen fewer; adding 1 H+ (h_c) to the products would balance it"));
        assertThat(String.join("\n", ConsoleSummary.lines(Fixtures.run("charge-gap.xml")))).doesNotContain("\u001b[")
                .doesNotContain("(s)").doesNotContain("?");
    }

    @Test
    void balanceLineSaysWhatWasNotCheckedAndWhy() {
        List<String> lines = ConsoleSummary.lines(Fixtures.run("charge-gap.xml"));
        assertThat(lines.get(1)).startsWith("  balance of 3 checked reactions (1 exchange, demand or sink reaction not checked):");
    }

    @Test
    void colouredLinesMarkErrorsAndReactionIds() {
        List<String> lines = ConsoleSummary.lines(Fixtures.run("charge-gap.xml"), true);
        assertThat(lines.get(0)).contains("\u001b[31m3 errors\u001b[0m");
        assertThat(lines).anySatisfy(l -> assertThat(l).startsWith("    \u001b[1mR_HEX\u001b[0m (charge-gap.xml:20)"));
    }

    @Test
    void eachCategoryIsCappedWithTheCountOfTheRest() {
        RunResult demo = DemoReports.run(java.nio.file.Path.of("target"));
        List<ConsoleSummary.Line> lines = ConsoleSummary.report(demo, false);
        // the demo passes: nothing at ERROR, info findings are counted, not listed
        assertThat(lines).noneMatch(l -> l.level() == ConsoleSummary.Level.ERROR);
        assertThat(lines).noneMatch(l -> l.text().contains("balance.exempt"));
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
