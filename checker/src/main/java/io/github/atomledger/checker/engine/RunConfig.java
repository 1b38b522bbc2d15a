package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.trace.TraceConfig;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * Everything one run needs, validated on construction. Front ends (the Maven plugin, tests)
 * build it directly; the engine never reads system properties or the environment.
 *
 * @param baseDirectory   the project directory; model patterns and report paths are relative to it
 * @param models          model files or glob patterns ({@code models/**.xml}), relative to the base
 *                        directory or absolute; at least one
 * @param reportDirectory where reports go
 * @param failOn          the lowest severity that fails the run, or null to never fail
 * @param formats         report formats to write
 * @param policy          severity overrides
 * @param maxModelBytes   the most bytes of XML read from one model file (after decompression)
 * @param mapping         atom mapping settings ({@link MappingConfig#OFF} to skip mapping)
 * @param traces          pathways, declared fates and label sources to trace ({@link TraceConfig#NONE}
 *                        for none; tracing needs mapping)
 */
public record RunConfig(Path baseDirectory, List<String> models, Path reportDirectory, Severity failOn,
                        Set<ReportFormat> formats, SeverityPolicy policy, long maxModelBytes,
                        MappingConfig mapping, TraceConfig traces) {

    /** The default model patterns: every .xml and .xml.gz file below {@code models/}. */
    public static final List<String> DEFAULT_MODELS = List.of("models/**.{xml,xml.gz}");

    public RunConfig {
        Objects.requireNonNull(baseDirectory, "baseDirectory");
        Objects.requireNonNull(reportDirectory, "reportDirectory");
        models = List.copyOf(models);
        if (models.isEmpty() || models.stream().allMatch(String::isBlank)) {
            throw new IllegalArgumentException("models: at least one model file or pattern is needed");
        }
        // in the enum's order, whatever order they came in (Set.copyOf's order changes per JVM)
        formats = formats.isEmpty() ? Set.of()
                : java.util.Collections.unmodifiableSet(java.util.EnumSet.copyOf(formats));
        Objects.requireNonNull(policy, "policy");
        Objects.requireNonNull(mapping, "mapping");
        traces = traces == null ? TraceConfig.NONE : traces;
        if (maxModelBytes <= 0) {
            throw new IllegalArgumentException("maxModelBytes must be positive, was " + maxModelBytes);
        }
    }

    /** A configuration without traces. */
    public RunConfig(Path baseDirectory, List<String> models, Path reportDirectory, Severity failOn,
                     Set<ReportFormat> formats, SeverityPolicy policy, long maxModelBytes, MappingConfig mapping) {
        this(baseDirectory, models, reportDirectory, failOn, formats, policy, maxModelBytes, mapping, TraceConfig.NONE);
    }

    /** A configuration with defaults for everything but the base directory and models. */
    public static RunConfig defaults(Path baseDirectory, List<String> models) {
        return new RunConfig(baseDirectory, models, baseDirectory.resolve("target/atomledger"), Severity.ERROR,
                Set.of(ReportFormat.JSON), SeverityPolicy.defaults(), io.github.atomledger.checker.model.LoadOptions.DEFAULT_MAX_BYTES, MappingConfig.OFF);
    }

    public RunConfig withFormats(Set<ReportFormat> newFormats) {
        return new RunConfig(baseDirectory, models, reportDirectory, failOn, newFormats, policy, maxModelBytes, mapping, traces);
    }

    public RunConfig withPolicy(SeverityPolicy newPolicy) {
        return new RunConfig(baseDirectory, models, reportDirectory, failOn, formats, newPolicy, maxModelBytes, mapping, traces);
    }

    public RunConfig withMapping(MappingConfig newMapping) {
        return new RunConfig(baseDirectory, models, reportDirectory, failOn, formats, policy, maxModelBytes, newMapping, traces);
    }

    public RunConfig withTraces(TraceConfig newTraces) {
        return new RunConfig(baseDirectory, models, reportDirectory, failOn, formats, policy, maxModelBytes, mapping, newTraces);
    }
}
