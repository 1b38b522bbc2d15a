package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;

/** Runs the engine on a fixture of this package (src/test/resources/.../checker/report/). */
final class Fixtures {

    private Fixtures() {
    }

    static RunResult run(String name) {
        try {
            Path file = Path.of(Fixtures.class.getResource(name).toURI());
            RunConfig config = RunConfig.defaults(file.getParent(), List.of(name))
                    .withFormats(EnumSet.allOf(ReportFormat.class));
            return new Engine().run(config, RunListener.SILENT);
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }
}
