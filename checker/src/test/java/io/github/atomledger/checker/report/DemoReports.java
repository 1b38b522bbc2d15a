package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;

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
                config.formats(), config.policy(), config.maxModelBytes());
        return new Engine().run(config, RunListener.SILENT);
    }

    static List<Path> writeAll(RunResult result, Path dir, MappingSource mappings) throws java.io.IOException {
        return Reporters.forFormats(EnumSet.allOf(ReportFormat.class), mappings).write(result, dir);
    }
}
