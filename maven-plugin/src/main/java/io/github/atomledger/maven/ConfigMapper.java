package io.github.atomledger.maven;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.StandardChecks;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.engine.SeverityPolicy;
import io.github.atomledger.checker.gate.FailScope;
import io.github.atomledger.checker.gate.Gate;
import io.github.atomledger.checker.gate.GateConfig;
import io.github.atomledger.checker.trace.FateCheck;
import io.github.atomledger.checker.trace.TraceConfig;
import io.github.atomledger.checker.engine.ReportFormat;

import io.github.atomledger.checker.export.MapExport;

import java.io.File;
import java.io.IOException;
import java.time.Duration;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.apache.maven.execution.MavenSession;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.descriptor.PluginDescriptor;
import org.apache.maven.plugin.logging.Log;

/** Turns Mojo parameters into a {@link RunConfig}; shared by the goals. */
final class ConfigMapper {

    private ConfigMapper() {
    }

    static RunConfig toConfig(File baseDir, List<String> models, File reportDirectory, String failOnSeverity,
                              String formats, Map<String, String> severities, Map<String, String> classSeverities,
                              long maxModelBytes) throws MojoExecutionException {
        try {
            List<String> patterns = new ArrayList<>();
            if (models != null) {
                for (String m : models) {
                    for (String part : m.split(",")) {
                        if (!part.isBlank()) {
                            patterns.add(part.strip());
                        }
                    }
                }
            }
            if (patterns.isEmpty()) {
                patterns.addAll(RunConfig.DEFAULT_MODELS);
            }
            Path base = baseDir.toPath().toAbsolutePath().normalize();
            Set<ReportFormat> fmt = ReportFormat.parseList(formats);
            SeverityPolicy policy = SeverityPolicy.of(severities == null ? Map.of() : severities,
                    classSeverities == null ? Map.of() : classSeverities, knownRuleIds());
            return new RunConfig(base, patterns, reportDirectory.toPath().toAbsolutePath().normalize(),
                    failOn(failOnSeverity), fmt, policy, maxModelBytes, MappingConfig.OFF);
        } catch (IllegalArgumentException e) {
            throw ConfigMapper.failure("AtomLedger configuration: " + e.getMessage(), e);
        }
    }

    /**
     * The pom's {@code severities} and {@code classSeverities} with the one-line
     * {@code atomledger.severity} laid over them (see {@link SeverityPolicy#parse}).
     */
    static SeverityPolicy.Overrides severityOverrides(Map<String, String> severities, Map<String, String> classSeverities,
                                                      String line) throws MojoExecutionException {
        try {
            return SeverityPolicy.parse(line, "atomledger.severity", knownRuleIds()).over(severities, classSeverities);
        } catch (IllegalArgumentException e) {
            throw ConfigMapper.failure("AtomLedger configuration: " + e.getMessage(), e);
        }
    }

    /**
     * The exception that stops the build with this message. The cause is kept as a suppressed
     * exception, not as the cause: Maven's one-line error appends every cause's own message, and a
     * library's message (with its Java class names) would follow ours.
     */
    static MojoExecutionException failure(String message, Throwable cause) {
        MojoExecutionException e = new MojoExecutionException(message);
        e.addSuppressed(cause);
        return e;
    }

    /** Logs a warning for every {@code atomledger.*} user property no goal of the plugin reads. */
    static void warnUnknownProperties(Log log, MavenSession session, PluginDescriptor plugin) {
        if (session == null) {
            return;
        }
        UnknownProperties.warnings(session.getUserProperties(), UnknownProperties.known(plugin)).forEach(log::warn);
    }

    /** Every rule id a severity may be set for: the checks', the release gate's and the traces'. */
    static Set<String> knownRuleIds() {
        Set<String> ids = new TreeSet<>(Gate.ruleIds());
        ids.addAll(FateCheck.RULES.keySet());
        StandardChecks.all().forEach(c -> ids.add(c.ruleId()));
        return ids;
    }

    /**
     * The release gate's configuration. A baseline named explicitly must exist; without one,
     * {@value GateConfig#DEFAULT_BASELINE} is used when it exists.
     */
    static GateConfig toGate(File baseDir, File baseline, File previousModels, String failOn)
            throws MojoExecutionException {
        try {
            Path base = baseDir.toPath().toAbsolutePath().normalize();
            Path file = baseline == null ? base.resolve(GateConfig.DEFAULT_BASELINE) : base.resolve(baseline.toPath());
            Path previous = previousModels == null ? null : base.resolve(previousModels.toPath()).normalize();
            return new GateConfig(file.normalize(), baseline != null, previous, FailScope.parse(failOn));
        } catch (IllegalArgumentException e) {
            throw ConfigMapper.failure("AtomLedger configuration: " + e.getMessage(), e);
        }
    }

    /**
     * The mapping settings.
     *
     * @param mode       "auto" (map when structure files are given), "on" or "off"
     * @param structures structure files and directories, a comma list (tables, SD files, molfiles,
     *                   molfile directories) relative to the base directory, or null
     * @param threads    worker threads; 0 or less means one per core
     * @param cache      the cache directory, or null for the default; "none" switches the cache off
     * @param budgetMs   time budget per reaction in milliseconds
     * @param maxHeavy   size cap per molecule in heavy atoms
     */
    static MappingConfig mapping(String mode, File baseDir, String structures, int threads, String cache, long budgetMs,
                                 int maxHeavy) throws MojoExecutionException {
        String m = mode == null ? "auto" : mode.strip().toLowerCase(Locale.ROOT);
        if (!m.equals("auto") && !m.equals("on") && !m.equals("off")) {
            throw new MojoExecutionException("AtomLedger configuration: mapping: unknown value '" + mode
                    + "'; allowed: auto, on, off");
        }
        List<Path> sources = structureSources(baseDir, structures);
        boolean enabled = m.equals("on") || (m.equals("auto") && !sources.isEmpty());
        if (budgetMs <= 0 || maxHeavy <= 0) {
            throw new MojoExecutionException("AtomLedger configuration: mappingTimeBudget and maxHeavyAtoms must be positive, were "
                    + budgetMs + " and " + maxHeavy);
        }
        Path cacheDir;
        if (cache == null || cache.isBlank()) {
            cacheDir = MappingConfig.defaultCacheDirectory();
        } else if (cache.strip().equalsIgnoreCase("none")) {
            cacheDir = null;
        } else {
            Path p = Path.of(cache.strip());
            cacheDir = p.isAbsolute() ? p : baseDir.toPath().resolve(p);
        }
        int n = threads > 0 ? threads : Runtime.getRuntime().availableProcessors();
        MappingOptions options = MappingOptions.defaults().withTimeBudget(Duration.ofMillis(budgetMs)).withMaxHeavyAtoms(maxHeavy);
        return new MappingConfig(enabled, null, options, n, cacheDir, sources, null, null);
    }

    /** The files of {@code atomledger.structures}, each of which must exist. */
    static List<Path> structureSources(File baseDir, String structures) throws MojoExecutionException {
        List<Path> out = new ArrayList<>();
        if (structures == null) {
            return out;
        }
        for (String part : structures.split(",")) {
            if (part.isBlank()) {
                continue;
            }
            Path p = Path.of(part.strip());
            Path abs = (p.isAbsolute() ? p : baseDir.toPath().resolve(p)).toAbsolutePath().normalize();
            if (!java.nio.file.Files.exists(abs)) {
                throw new MojoExecutionException("AtomLedger configuration: structures: file not found: " + part.strip());
            }
            out.add(abs);
        }
        return out;
    }

    /** Writes the run's maps as RXN files and a transition table; returns what to log (warnings prefixed "!"). */
    static List<String> exportMaps(RunResult result, Path directory) throws IOException {
        if (result.models().stream().noneMatch(m -> m.mapping().enabled())) {
            return List.of("!exportMaps is set but mapping is off (set structures or mapping=on): no maps to export");
        }
        MapExport.Written w = MapExport.write(result, directory);
        List<String> lines = new ArrayList<>();
        lines.add("maps: " + w.inferred() + " inferred and " + w.curated() + " curated map(s) written as RXN files to "
                + display(result.config().baseDirectory(), directory));
        w.failed().forEach(f -> lines.add("!maps: not exported: " + f));
        return lines;
    }

    /** The directory of curated RXN maps, which must exist, or null. */
    static Path curatedMaps(File baseDir, File directory) throws MojoExecutionException {
        if (directory == null) {
            return null;
        }
        Path p = (directory.isAbsolute() ? directory.toPath() : baseDir.toPath().resolve(directory.toPath()))
                .toAbsolutePath().normalize();
        if (!java.nio.file.Files.isDirectory(p)) {
            throw new MojoExecutionException("AtomLedger configuration: curatedMaps: not a directory: " + directory);
        }
        return p;
    }

    /** The default pathways file, used when it exists. */
    static final String DEFAULT_PATHWAYS = "models/pathways.tsv";
    /** The default declared-fates file, used when it exists. */
    static final String DEFAULT_FATES = "models/fates.tsv";

    /**
     * What to trace: the pathways and fates files (named ones must exist; the defaults are used
     * when they exist) and the label sources (comma lists allowed in each entry).
     */
    static TraceConfig traces(File baseDir, File pathways, File fates, List<String> tracers) throws MojoExecutionException {
        Path base = baseDir.toPath().toAbsolutePath().normalize();
        Path p = existing(base, pathways, DEFAULT_PATHWAYS, "pathways");
        Path f = existing(base, fates, DEFAULT_FATES, "fates");
        List<String> sources = new ArrayList<>();
        if (tracers != null) {
            for (String t : tracers) {
                for (String part : t.split(",")) {
                    if (!part.isBlank()) {
                        sources.add(part.strip());
                    }
                }
            }
        }
        try {
            return new TraceConfig(p, f, sources);
        } catch (IllegalArgumentException e) {
            throw new MojoExecutionException("AtomLedger configuration: " + e.getMessage(), e);
        }
    }

    private static Path existing(Path base, File named, String fallback, String parameter) throws MojoExecutionException {
        if (named == null) {
            Path d = base.resolve(fallback);
            return java.nio.file.Files.isRegularFile(d) ? d : null;
        }
        Path p = base.resolve(named.toPath()).normalize();
        if (!java.nio.file.Files.isRegularFile(p)) {
            throw new MojoExecutionException("AtomLedger configuration: " + parameter + ": file not found: " + named);
        }
        return p;
    }

    /**
     * The confidence settings on top of {@link #mapping}: the analysis budget per reaction in
     * milliseconds (0 switches it off) and the review margin in weighted bond edits.
     */
    static MappingConfig confidence(MappingConfig mapping, long budgetMs, int reviewMargin) throws MojoExecutionException {
        if (budgetMs < 0 || reviewMargin < 0) {
            throw new MojoExecutionException("AtomLedger configuration: mappingConfidenceBudget and reviewMargin must not be "
                    + "negative, were " + budgetMs + " and " + reviewMargin);
        }
        return mapping.withOptions(mapping.options().withConfidenceBudget(Duration.ofMillis(budgetMs)))
                .withReviewMargin(reviewMargin);
    }

    /**
     * The report directory: the configured one, else {@code <build directory>/atomledger}. Without
     * a pom Maven leaves {@code ${project.build.directory}} unexpanded; then {@code target} below
     * the base directory is used.
     */
    static File reportDirectory(File configured, File buildDirectory, File baseDir) {
        if (configured != null) {
            return configured;
        }
        if (buildDirectory == null || buildDirectory.getPath().contains("${")) {
            return new File(new File(baseDir, "target"), "atomledger");
        }
        return new File(buildDirectory, "atomledger");
    }

    /** "error", "warning", "info", or "none" to never fail. */
    static Severity failOn(String value) {
        String v = value == null ? "" : value.strip().toLowerCase(Locale.ROOT);
        if (v.equals("none") || v.equals("off") || v.equals("never")) {
            return null;
        }
        try {
            return Severity.parse(v);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("failOnSeverity: unknown value '" + value
                    + "'; allowed: error, warning, info, none");
        }
    }

    /** The one-paragraph failure summary: counts, the first few rule ids and elements, the report path. */
    static String failureSummary(RunResult result, List<Path> written, Path base) {
        List<Finding> failing = result.failing();
        Map<Severity, Integer> counts = result.countsBySeverity();
        StringBuilder sb = new StringBuilder("AtomLedger: ").append(Wording.count(failing.size(), "finding"))
                .append(" at or above '").append(result.config().failOn().label()).append("' (")
                .append(Wording.count(counts.get(Severity.ERROR), "error")).append(", ")
                .append(Wording.count(counts.get(Severity.WARNING), "warning")).append(", ")
                .append(counts.get(Severity.INFO)).append(" info): ");
        Map<String, List<String>> byRule = new java.util.TreeMap<>();
        for (Finding f : failing) {
            List<String> ids = byRule.computeIfAbsent(f.ruleId(), k -> new ArrayList<>());
            if (!ids.contains(f.elementId())) {
                ids.add(f.elementId());
            }
        }
        List<String> parts = new ArrayList<>();
        byRule.forEach((rule, ids) -> parts.add(rule + " (" + ids.size() + "): " + Wording.shortList(ids, 3)));
        sb.append(String.join("; ", parts));
        if (!written.isEmpty()) {
            sb.append("; report: ").append(display(base, written.get(0)));
        }
        return sb.toString();
    }

    static String display(Path base, Path p) {
        Path abs = p.toAbsolutePath().normalize();
        return abs.startsWith(base) ? base.relativize(abs).toString().replace('\\', '/') : abs.toString();
    }
}
