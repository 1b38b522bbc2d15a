package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamReader;
import org.junit.jupiter.api.Test;

/**
 * The real-data sweep of issue #12: every reaction of yeast-GEM 9.0.2 whose species all have a
 * structure in its structure table is mapped and drawn, every report format is written, and
 * nothing throws; the same run on e_coli_core (no structures: mapping on, every reaction without
 * one). Both models are public (CC BY 4.0) and read from ../shared/data; the tests skip when it is
 * absent. Statuses are not asserted (the mapper runs on a short time budget here to keep the
 * test suite fast); what is asserted is that no item takes the run down and that every map has
 * a picture or a note saying why not. The mapped yeast-GEM run happens once per JVM
 * ({@link #yeastMapped()}); a second test class may reuse it.
 */
class RealModelSweepTest {

    private static RunResult yeast;

    /**
     * yeast-GEM mapped with its structure table on two threads, a 300 ms budget per reaction and
     * no cache (a clean clone has none), once per JVM.
     */
    static synchronized RunResult yeastMapped() {
        if (yeast == null) {
            Path file = SharedData.require("yeast-GEM.xml.gz");
            Path structures = SharedData.require("yeast-GEM.structures.tsv");
            MappingConfig mapping = new MappingConfig(true, structures,
                    MappingOptions.defaults().withTimeBudget(Duration.ofMillis(300)), 2, null);
            RunConfig config = RunConfig.defaults(file.getParent(), List.of(file.getFileName().toString()))
                    .withFormats(EnumSet.allOf(ReportFormat.class)).withMapping(mapping);
            yeast = new Engine().run(config, RunListener.SILENT);
        }
        return yeast;
    }

    @Test
    void yeastGemEveryMappedReactionIsDrawnAndEveryReportWritten() throws Exception {
        RunResult result = yeastMapped();
        Path out = Path.of("target", "sweep-yeast");
        Reporters.Outcome written = Reporters.forFormats(EnumSet.allOf(ReportFormat.class)).writeAll(result, out);
        assertThat(written.failures()).isEmpty();
        assertThat(written.written()).hasSize(ReportFormat.values().length);

        ModelResult model = result.models().get(0);
        List<String> withMap = new ArrayList<>();
        for (ReactionResult r : model.reactions()) {
            if (r.mapping() != null && r.mapping().hasMap()) {
                withMap.add(r.id());
            }
        }
        // yeast-GEM 9.0.2 with its table: about 1,850 reactions get a map (see BENCHMARKS.md).
        assertThat(withMap.size()).isGreaterThan(1500);

        String html = Files.readString(out.resolve("report.html"));
        HtmlReporterTest.parse(html);
        long drawn = count(html, "<div class=\"pic\" role=\"img\"");
        long failed = count(html, "<li>No drawing: ");
        assertThat(drawn + failed).as("a picture or a note for every map").isEqualTo(withMap.size());
        List<Path> svgs;
        try (var files = Files.list(out.resolve(PictureFiles.FOLDER))) {
            svgs = files.toList();
        }
        assertThat((long) svgs.size()).isPositive().isLessThanOrEqualTo(drawn);
        XMLInputFactory f = XMLInputFactory.newDefaultFactory();
        f.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        for (Path svg : svgs) {
            XMLStreamReader r = f.createXMLStreamReader(new StringReader(Files.readString(svg)));
            while (r.hasNext()) {
                r.next();
            }
        }
        System.out.println("yeast-GEM sweep: " + withMap.size() + " maps, " + drawn + " drawn, " + failed
                + " not drawn, " + count(html, "<li>Drawing: ") + " drawing notes (fallbacks), " + svgs.size()
                + " SVG files");
        assertThat(mapperFailures(model)).isEmpty();
    }

    @Test
    void eColiCoreWithMappingOnWritesEveryReport() throws Exception {
        Path file = SharedData.require("e_coli_core.xml");
        MappingConfig mapping = new MappingConfig(true, null, MappingOptions.defaults(), 2, null);
        RunConfig config = RunConfig.defaults(file.getParent(), List.of(file.getFileName().toString()))
                .withFormats(EnumSet.allOf(ReportFormat.class)).withMapping(mapping);
        RunResult result = new Engine().run(config, RunListener.SILENT);
        Reporters.Outcome written = Reporters.forFormats(EnumSet.allOf(ReportFormat.class))
                .writeAll(result, Path.of("target", "sweep-ecoli"));
        assertThat(written.failures()).isEmpty();
        assertThat(written.written()).hasSize(ReportFormat.values().length);
        assertThat(result.models().get(0).reactions()).hasSize(95)
                .allSatisfy(r -> assertThat(Optional.ofNullable(r.mapping()).map(m -> m.hasMap()).orElse(false)).isFalse());
        assertThat(mapperFailures(result.models().get(0))).isEmpty();
    }

    private static List<Finding> mapperFailures(ModelResult model) {
        return model.allFindings().stream().filter(f -> f.ruleId().equals("mapping.mapper-failed")).toList();
    }

    private static long count(String text, String needle) {
        long n = 0;
        for (int i = text.indexOf(needle); i >= 0; i = text.indexOf(needle, i + needle.length())) {
            n++;
        }
        return n;
    }
}
