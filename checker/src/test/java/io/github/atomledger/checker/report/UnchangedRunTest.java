package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.SeverityPolicy;
import io.github.atomledger.checker.gate.FailScope;
import io.github.atomledger.checker.gate.GateConfig;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run whose inputs are all unchanged is shown again from its stored reports; any changed input,
 * parameter or missing stored file means a real run. The Maven goal's use of it is covered by the
 * integration test {@code unchanged-run-reused}.
 */
class UnchangedRunTest {

    @TempDir
    Path tmp;

    private Path base;
    private Path reports;
    private Path cache;

    @BeforeEach
    void files() throws Exception {
        base = tmp.resolve("repo");
        reports = base.resolve("target/atomledger");
        cache = tmp.resolve("cache");
        Files.createDirectories(base.resolve("models"));
        Files.writeString(base.resolve("models/m.xml"), "<sbml>one</sbml>\n");
        Files.writeString(base.resolve("structures.tsv"), "species\tsmiles\nM_a\tCCO\n");
    }

    private RunConfig config(Severity failOn, Set<ReportFormat> formats) {
        MappingConfig mapping = new MappingConfig(true, base.resolve("structures.tsv"), MappingOptions.defaults(), 1, cache);
        return new RunConfig(base, List.of("models/*.xml"), reports, failOn, formats, SeverityPolicy.defaults(),
                1L << 30, mapping);
    }

    private RunConfig config() {
        return config(Severity.ERROR, EnumSet.of(ReportFormat.JSON, ReportFormat.HTML));
    }

    private static final GateConfig GATE = new GateConfig(null, false, null, FailScope.FINDINGS);

    private UnchangedRun.Outcome storeOneRun() throws Exception {
        Files.createDirectories(reports.resolve("pictures"));
        Files.writeString(reports.resolve("report.json"), "{\"x\": 1}\n");
        Files.writeString(reports.resolve("report.html"), "<html>page</html>\n");
        Files.writeString(reports.resolve("pictures/0123.svg"), "<svg/>\n");
        UnchangedRun.Outcome outcome = new UnchangedRun.Outcome(List.of(
                new ConsoleSummary.Line(ConsoleSummary.Level.WARNING, "a warning\twith a tab"),
                new ConsoleSummary.Line(ConsoleSummary.Level.INFO, "report: target/atomledger/report.json")),
                "AtomLedger: 1 finding at or above 'error'\nsecond line");
        UnchangedRun.of(config(), GATE, "check").orElseThrow()
                .store(outcome, List.of(reports.resolve("report.json"), reports.resolve("report.html")));
        return outcome;
    }

    @Test
    void anUnchangedRunComesBackWithItsLinesVerdictAndFiles() throws Exception {
        UnchangedRun.Outcome stored = storeOneRun();
        // the report folder was removed (mvn clean) and a picture of another run left behind
        delete(reports);
        Files.createDirectories(reports.resolve("pictures"));
        Files.writeString(reports.resolve("pictures/ffff.svg"), "<svg>old</svg>\n");
        // the format set in another order is the same configuration
        Set<ReportFormat> reordered = new LinkedHashSet<>(List.of(ReportFormat.HTML, ReportFormat.JSON));
        Optional<UnchangedRun.Outcome> again = UnchangedRun.of(config(Severity.ERROR, reordered), GATE, "check")
                .orElseThrow().restore();
        assertThat(again).contains(stored);
        assertThat(Files.readString(reports.resolve("report.json"))).isEqualTo("{\"x\": 1}\n");
        assertThat(Files.readString(reports.resolve("report.html"))).isEqualTo("<html>page</html>\n");
        assertThat(Files.readString(reports.resolve("pictures/0123.svg"))).isEqualTo("<svg/>\n");
        assertThat(reports.resolve("pictures/ffff.svg")).doesNotExist();
    }

    @Test
    void aChangedModelStructureFileParameterOrVariantIsANewRun() throws Exception {
        storeOneRun();
        assertThat(UnchangedRun.of(config(), GATE, "check;colour=true").orElseThrow().restore()).isEmpty();
        // the caller's own code joins the key (the Maven goal passes its class)
        assertThat(UnchangedRun.of(config(), GATE, "check", UnchangedRunTest.class).orElseThrow().restore()).isEmpty();
        assertThat(UnchangedRun.of(config(Severity.WARNING, EnumSet.of(ReportFormat.JSON, ReportFormat.HTML)), GATE,
                "check").orElseThrow().restore()).isEmpty();
        Files.writeString(base.resolve("structures.tsv"), "species\tsmiles\nM_a\tCCC\n");
        assertThat(UnchangedRun.of(config(), GATE, "check").orElseThrow().restore()).isEmpty();
        Files.writeString(base.resolve("structures.tsv"), "species\tsmiles\nM_a\tCCO\n");
        assertThat(UnchangedRun.of(config(), GATE, "check").orElseThrow().restore()).isPresent();
        Files.writeString(base.resolve("models/m.xml"), "<sbml>two</sbml>\n");
        assertThat(UnchangedRun.of(config(), GATE, "check").orElseThrow().restore()).isEmpty();
        Files.writeString(base.resolve("models/m.xml"), "<sbml>one</sbml>\n");
        Files.writeString(base.resolve("models/n.xml"), "<sbml>new model</sbml>\n");
        assertThat(UnchangedRun.of(config(), GATE, "check").orElseThrow().restore()).isEmpty();
    }

    @Test
    void aMissingStoredFileMeansARealRunAndTouchesNothing() throws Exception {
        storeOneRun();
        try (var blobs = Files.walk(cache.resolve("runs/blobs"))) {
            for (Path p : blobs.filter(Files::isRegularFile).toList()) {
                if (Files.readString(p).equals("<svg/>\n")) {
                    Files.delete(p);
                }
            }
        }
        Files.writeString(reports.resolve("report.json"), "{\"x\": 2}\n");
        assertThat(UnchangedRun.of(config(), GATE, "check").orElseThrow().restore()).isEmpty();
        assertThat(Files.readString(reports.resolve("report.json"))).isEqualTo("{\"x\": 2}\n");
    }

    @Test
    void noReuseWithoutACacheOrWhenComparingWithPreviousModels() throws Exception {
        RunConfig noCache = config().withMapping(new MappingConfig(false, null, MappingOptions.defaults(), 1, null));
        assertThat(UnchangedRun.of(noCache, GATE, "check")).isEmpty();
        Files.createDirectories(base.resolve("previous"));
        GateConfig release = new GateConfig(null, false, base.resolve("previous"), FailScope.FINDINGS);
        assertThat(UnchangedRun.of(config(), release, "check")).isEmpty();
        assertThat(UnchangedRun.of(config().withMapping(new MappingConfig(false, null, MappingOptions.defaults(), 1,
                cache)), GATE, "check")).isPresent();
    }

    @Test
    void escapedTextRoundTrips() {
        String s = "tab\there, line\nbreak, back\\slash, cr\r";
        assertThat(UnchangedRun.unescape(UnchangedRun.escape(s))).isEqualTo(s);
        assertThat(UnchangedRun.escape(s)).doesNotContain("\t").doesNotContain("\n");
    }

    private static void delete(Path dir) throws Exception {
        try (var all = Files.walk(dir)) {
            for (Path p : all.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
