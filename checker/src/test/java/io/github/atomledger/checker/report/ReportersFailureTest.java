package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.engine.RunResult;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * One report failing does not cost the others (issue #12): the HTML reporter is given a mapping
 * source that throws for one reaction, as a bug of ours would; JSON, JUnit, SARIF and Markdown
 * are still written and the failure names the report and the reaction.
 */
class ReportersFailureTest {

    @TempDir
    Path tmp;

    @Test
    void aFailingReportIsNamedAndTheOthersAreWritten() {
        RunResult result = DemoReports.run(tmp);
        MappingSource broken = (model, reaction) -> {
            if (reaction.id().equals("R_FBA")) {
                throw new IllegalStateException("drawing the picture of reaction R_FBA failed: a bug");
            }
            return java.util.Optional.empty();
        };
        Reporters.Outcome out = Reporters.forFormats(EnumSet.allOf(ReportFormat.class), broken).writeAll(result, tmp);
        assertThat(out.written()).hasSize(4).noneMatch(p -> p.getFileName().toString().equals("report.html"));
        assertThat(out.written()).allMatch(Files::isRegularFile);
        assertThat(out.failures()).singleElement().satisfies(f -> {
            assertThat(f.format()).isEqualTo(ReportFormat.HTML);
            assertThat(f.message()).isEqualTo("the html report could not be written: IllegalStateException: "
                    + "drawing the picture of reaction R_FBA failed: a bug");
        });
        assertThat(tmp.resolve("report.html")).doesNotExist();
    }
}
