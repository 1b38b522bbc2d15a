package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** The CI job summary: verdict, counts, the worst findings first, the path of the HTML report. */
class MarkdownReporterTest {

    @Test
    void failingFixtureListsErrorsFirstAndLinksTheHtmlReport() {
        String md = new MarkdownReporter().toMarkdown(Fixtures.run("charge-gap.xml"));
        assertThat(md).startsWith("## AtomLedger: failed\n");
        assertThat(md).contains("| charge-gap.xml | 4 | 1 | 1 | 3 | 0 | 1 |");
        int firstError = md.indexOf("| error | `balance.charge` | `R_HEX` | charge-gap.xml:20 |");
        int firstInfo = md.indexOf("\n| info |");
        assertThat(firstError).isPositive();
        assertThat(firstInfo < 0 || firstInfo > firstError).isTrue();
        assertThat(md).contains("Full report: [target/atomledger/report.html](report.html) (beside this summary).");
        assertThat(md).doesNotContain("\r").endsWith("\n");
    }

    @Test
    void demoPassesAndCountsItsModel() {
        String md = new MarkdownReporter().toMarkdown(DemoReports.run(Path.of("target")));
        assertThat(md).startsWith("## AtomLedger: passed\n").contains("| models/ledgerella\\_central.xml | 64 |");
    }

    @Test
    void escapesTableCells() {
        assertThat(MarkdownReporter.cell("a|b <i>*x*</i>")).isEqualTo("a\\|b \\<i\\>\\*x\\*\\</i\\>");
    }
}
