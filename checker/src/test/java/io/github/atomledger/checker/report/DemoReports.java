package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.trace.TraceConfig;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;

/** Runs the bundled demo repository (invented organism) for the report tests. */
final class DemoReports {

    static final Path DEMO = Path.of("..", "demo").toAbsolutePath().normalize();

    private DemoReports() {
    }

    static RunResult run(Path reportDirectory) {
        if (!Files.isDirectory(DEMO.resolve("models"))) {
            throw new IllegalStateException("the demo repository is missing: " + DEMO);
        }
        RunConfig config = RunConfig.defaults(DEMO, RunConfig.DEFAULT_MODELS)
                .withFormats(EnumSet.allOf(ReportFormat.class));
        config = new RunConfig(config.baseDirectory(), config.models(), reportDirectory, config.failOn(),
                config.formats(), config.policy(), config.maxModelBytes(), config.mapping());
        return new Engine().run(config, RunListener.SILENT);
    }

    /** A node budget, not the default time budget, so the maps do not depend on how busy the machine is. */
    static final long NODE_LIMIT = 300_000;

    private static RunResult mapped;

    /**
     * The demo with atom mapping on (structures.tsv, two threads, no cache), run once per JVM:
     * mapping the demo takes half a minute.
     */
    static synchronized RunResult runMapped() {
        if (mapped == null) {
            RunResult plain = run(Path.of("target", "demo-mapped"));
            MappingConfig mapping = new MappingConfig(true, DEMO.resolve("structures.tsv"), MappingOptions.defaults()
                    .withTimeBudget(java.time.Duration.ofMinutes(2)).withNodeLimit(NODE_LIMIT), 2, null);
            // The demo's pathways, declared fates and label source, as its pom has them (issue #14).
            TraceConfig traces = new TraceConfig(DEMO.resolve("models/pathways.tsv"), DEMO.resolve("models/fates.tsv"),
                    List.of("glc_e:C1"));
            mapped = new Engine().run(plain.config().withMapping(mapping).withTraces(traces), RunListener.SILENT);
        }
        return mapped;
    }

    static List<Path> writeAll(RunResult result, Path dir, MappingSource mappings) throws java.io.IOException {
        return Reporters.forFormats(EnumSet.allOf(ReportFormat.class), mappings).write(result, dir);
    }
}
