package io.github.atomledger.maven;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.baseline.Baseline;
import io.github.atomledger.checker.baseline.BaselineEntry;
import io.github.atomledger.checker.baseline.BaselineUpdate;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.engine.SeverityPolicy;
import io.github.atomledger.checker.gate.FailScope;
import io.github.atomledger.checker.gate.Gate;
import io.github.atomledger.checker.gate.GateConfig;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.util.List;
import java.util.Map;
import org.apache.maven.execution.MavenSession;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.descriptor.PluginDescriptor;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;

/**
 * Writes or updates the baseline of accepted findings from the current findings: every finding at
 * or above {@code failOnSeverity} gets an entry; existing entries keep their reason and who
 * accepted them; new entries get the placeholder reason {@code TODO: ...}, which accepts nothing
 * until a curator writes the reason; entries that match no finding any more are removed. Checks
 * the models like {@code check} (same parameters) but never fails on findings and never writes a
 * model. Example: {@code mvn io.github.atomledger:atomledger-maven-plugin:VERSION:baseline
 * -Datomledger.baselineOwner=mkrause}.
 */
@Mojo(name = "baseline", threadSafe = true, requiresProject = false)
public final class BaselineMojo extends AbstractMojo {

    /** Model files or glob patterns, as for {@code check}. Default: {@code models/**.{xml,xml.gz}}. */
    @Parameter(property = "atomledger.models")
    private List<String> models;

    /** Skips the goal. */
    @Parameter(property = "atomledger.skip", defaultValue = "false")
    private boolean skip;

    /**
     * The lowest severity recorded in the baseline: {@code error}, {@code warning} or {@code info}
     * ({@code none} records every finding); the same default as {@code check}.
     */
    @Parameter(property = "atomledger.failOnSeverity", defaultValue = "error")
    private String failOnSeverity;

    /** Severity per rule id, or {@code off}, as for {@code check}. */
    @Parameter
    private Map<String, String> severities;

    /** Severity of {@code balance.*} findings per reaction class, as for {@code check}. */
    @Parameter
    private Map<String, String> classSeverities;

    /** Severity overrides in one line, as for {@code check}: {@code -Datomledger.severity=structure.protonation=off}. */
    @Parameter(property = "atomledger.severity")
    private String severity;

    /**
     * The baseline file to write. Default {@code models/atomledger-baseline.tsv}. Example:
     * {@code -Datomledger.baseline=models/baseline.tsv}.
     */
    @Parameter(property = "atomledger.baseline")
    private File baseline;

    /**
     * Who accepts the new entries, written in their {@code acceptedBy} column (the default is the
     * JVM's {@code user.name}). Example: {@code -Datomledger.baselineOwner=mkrause}.
     */
    @Parameter(property = "atomledger.baselineOwner", defaultValue = "${user.name}")
    private String baselineOwner;

    /** The previous release's models, as for {@code check}: release-diff findings get entries too. */
    @Parameter(property = "atomledger.previousModels")
    private File previousModels;

    /** The most bytes of XML read from one model file, after gzip decompression, as for {@code check}. */
    @Parameter(property = "atomledger.maxModelBytes", defaultValue = "1g")
    private String maxModelBytes;

    @Parameter(defaultValue = "${project.build.directory}", readonly = true)
    private File buildDirectory;

    /** The project directory; model patterns and the baseline path are relative to it. */
    @Parameter(defaultValue = "${basedir}", readonly = true, required = true)
    private File baseDirectory;

    @Parameter(defaultValue = "${session}", readonly = true)
    private MavenSession session;

    @Parameter(defaultValue = "${plugin}", readonly = true)
    private PluginDescriptor plugin;

    @Override
    public void execute() throws MojoExecutionException {
        if (skip) {
            getLog().info("AtomLedger baseline skipped (atomledger.skip=true)");
            return;
        }
        ConfigMapper.warnUnknownProperties(getLog(), session, plugin);
        SeverityPolicy.Overrides levels = ConfigMapper.severityOverrides(severities, classSeverities, severity);
        long maxBytes = ParameterValues.bytes("maxModelBytes", maxModelBytes, 1L << 30);
        RunConfig config = ConfigMapper.toConfig(baseDirectory, models,
                ConfigMapper.reportDirectory(null, buildDirectory, baseDirectory), failOnSeverity, "json",
                levels.byRule(), levels.byClass(), maxBytes);
        GateConfig gate = ConfigMapper.toGate(baseDirectory, baseline, previousModels, FailScope.FINDINGS.label());
        String display = ConfigMapper.display(config.baseDirectory(), gate.baseline());
        try {
            Engine engine = new Engine();
            MavenRunListener listener = new MavenRunListener(getLog());
            RunResult result = engine.run(config, listener);
            if (gate.previousModels() != null) {
                result = Gate.standard(engine, maxBytes).withReleaseDiff(result, gate.previousModels(), listener);
            }
            Baseline existing = Files.exists(gate.baseline()) ? Baseline.read(gate.baseline(), display) : Baseline.empty();
            Severity threshold = config.failOn() == null ? Severity.INFO : config.failOn();
            BaselineUpdate update = BaselineUpdate.of(existing, result.allFindings(),
                    result.models().stream().map(ModelResult::file).toList(), threshold,
                    baselineOwner == null || baselineOwner.isBlank() ? "unknown" : baselineOwner);
            update.baseline().write(gate.baseline());
            getLog().info("baseline " + display + ": " + Wording.count(update.baseline().entries().size(), "entry")
                    + " (" + update.kept().size() + " kept, " + update.added().size() + " added, "
                    + update.removed().size() + " removed)");
            for (BaselineEntry e : update.added()) {
                getLog().warn("new baseline entry needs a reason: " + e.modelFile() + " " + e.ruleId() + " " + e.elementId());
            }
        } catch (AtomLedgerException e) {
            throw ConfigMapper.failure(e.getMessage(), e);
        } catch (IOException e) {
            throw ConfigMapper.failure("AtomLedger could not write the baseline " + display + ": " + e.getMessage(), e);
        } catch (IllegalArgumentException e) {
            throw ConfigMapper.failure("AtomLedger configuration: " + e.getMessage(), e);
        }
    }
}
