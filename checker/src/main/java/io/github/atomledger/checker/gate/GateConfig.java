package io.github.atomledger.checker.gate;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;

/**
 * How the release gate runs on top of the checks. Validated on construction.
 *
 * @param baseline         the baseline file, or null for none
 * @param baselineRequired true when the baseline file was named explicitly and so must exist;
 *                         false for the default location, used only when the file exists
 * @param previousModels   the previous release's models: a directory that holds them under the
 *                         same relative paths as the current models, or one file when one model
 *                         is checked; null for no release diff
 * @param failOn           which findings may fail the build
 */
public record GateConfig(Path baseline, boolean baselineRequired, Path previousModels, FailScope failOn) {

    /** The baseline file name used when none is configured: {@code models/atomledger-baseline.tsv}. */
    public static final String DEFAULT_BASELINE = "models/atomledger-baseline.tsv";

    public GateConfig {
        Objects.requireNonNull(failOn, "failOn");
        if (failOn == FailScope.REGRESSIONS && previousModels == null) {
            throw new IllegalArgumentException("failOn=regressions needs previousModels (the previous release's model"
                    + " files, e.g. -Datomledger.previousModels=target/previous)");
        }
        if (previousModels != null && !Files.exists(previousModels)) {
            throw new IllegalArgumentException("previousModels: " + previousModels + " does not exist");
        }
    }

    /** No baseline, no diff, fail on every finding. */
    public static GateConfig none() {
        return new GateConfig(null, false, null, FailScope.FINDINGS);
    }

    /** True when the baseline applies: configured, and present or required. */
    public boolean usesBaseline() {
        return baseline != null && (baselineRequired || Files.isRegularFile(baseline));
    }
}
