package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.engine.RunResult;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Every format is registered, written into the report directory, and byte-identical across runs. */
class ReportersTest {

    @TempDir
    Path tmp;

    @Test
    void writesEveryFormatForTheDemo() throws Exception {
        RunResult result = DemoReports.run(tmp);
        List<Path> written = DemoReports.writeAll(result, tmp, MappingSource.NONE);
        assertThat(written).extracting(p -> tmp.relativize(p).toString().replace('\\', '/'))
                .containsExactly("report.json", "report.html", "junit/TEST-atomledger.xml", "report.sarif", "summary.md");
        for (Path p : written) {
            assertThat(Files.size(p)).as(p.toString()).isGreaterThan(100);
        }
        assertThat(Reporters.available()).isEqualTo(EnumSet.allOf(ReportFormat.class));
    }

    @Test
    void twoRunsGiveTheSameBytesInEveryFormat() throws Exception {
        Path a = tmp.resolve("a");
        Path b = tmp.resolve("b");
        List<Path> first = DemoReports.writeAll(DemoReports.run(a), a, MappingSource.NONE);
        List<Path> second = DemoReports.writeAll(DemoReports.run(b), b, MappingSource.NONE);
        for (int i = 0; i < first.size(); i++) {
            assertThat(Files.readAllBytes(second.get(i))).as(second.get(i).toString())
                    .isEqualTo(Files.readAllBytes(first.get(i)));
        }
    }

    @Test
    void reportsCarryNoAbsolutePathsOrDates() throws Exception {
        RunResult result = DemoReports.run(tmp);
        String base = DemoReports.DEMO.toString();
        for (Path p : DemoReports.writeAll(result, tmp, MappingSource.NONE)) {
            String text = Files.readString(p);
            assertThat(text).as(p.toString()).doesNotContain(base).doesNotContain(tmp.toString())
                    .doesNotContainPattern("20[0-9]{2}-[01][0-9]-[0-3][0-9]T");
            assertThat(text).doesNotContain("\r");
        }
    }

    @Test
    void parsesTheFormatListOfTheUserProperty() {
        assertThat(ReportFormat.parseList("json, sarif")).containsExactlyInAnyOrder(ReportFormat.JSON, ReportFormat.SARIF);
        assertThat(ReportFormat.parseList("all")).isEqualTo(EnumSet.allOf(ReportFormat.class));
        assertThat(Reporters.forFormats(Set.of(ReportFormat.MARKDOWN))).isNotNull();
        assertThatThrownBy(() -> ReportFormat.parseList("json,pdf")).hasMessageContaining("'pdf'")
                .hasMessageContaining("json, html, junit, sarif, markdown");
    }
}
