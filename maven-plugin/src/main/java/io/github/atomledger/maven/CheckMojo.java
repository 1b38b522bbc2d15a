package io.github.atomledger.maven;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.report.ConsoleSummary;
import io.github.atomledger.checker.report.Reporters;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;

/**
 * Checks SBML models: element and charge balance of every reaction, formulas and charges, and
 * model integrity. Writes reports and fails the build on findings at or above
 * {@code failOnSeverity}. Read-only: never writes a model file.
 *
 * <p>Works without a pom: {@code mvn io.github.atomledger:atomledger-maven-plugin:VERSION:check
 * -Datomledger.models=models/my-model.xml}.
 */
@Mojo(name = "check", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true, requiresProject = false)
public final class CheckMojo extends AbstractMojo {

    /**
     * Model files or glob patterns, relative to the project directory (comma-separated on the
     * command line). {@code **} crosses directories. Default: every {@code .xml} and
     * {@code .xml.gz} file below {@code models/}. Example: {@code -Datomledger.models=models/core.xml,extra/*.xml.gz}.
     */
    @Parameter(property = "atomledger.models")
    private List<String> models;

    /** Skips the goal. Default {@code false}. Example: {@code -Datomledger.skip}. */
    @Parameter(property = "atomledger.skip", defaultValue = "false")
    private boolean skip;

    /**
     * The lowest severity that fails the build: {@code error}, {@code warning}, {@code info}, or
     * {@code none} to only report. Default {@code error}.
     */
    @Parameter(property = "atomledger.failOnSeverity", defaultValue = "error")
    private String failOnSeverity;

    /**
     * Where reports are written. Default {@code ${project.build.directory}/atomledger}, which is
     * {@code target/atomledger} in the working directory when there is no pom.
     */
    @Parameter(property = "atomledger.reportDirectory")
    private File reportDirectory;

    @Parameter(defaultValue = "${project.build.directory}", readonly = true)
    private File buildDirectory;

    /**
     * Report formats, a comma list of {@code json}, {@code html}, {@code junit}, {@code sarif},
     * {@code markdown}, or {@code all}. Default {@code json}.
     */
    @Parameter(property = "atomledger.formats", defaultValue = "json")
    private String formats;

    /**
     * Severity per rule id: a severity or {@code off}. Example:
     * {@code <severities><balance.charge>warning</balance.charge></severities>}. Unknown rule ids
     * stop the build with the list of known ones.
     */
    @Parameter
    private Map<String, String> severities;

    /**
     * Severity of {@code balance.*} findings per reaction class ({@code internal}, {@code transport},
     * {@code atp-maintenance}, {@code exchange}, {@code demand}, {@code sink}, {@code biomass},
     * {@code pseudo}): a severity or {@code off}. Default: biomass and pseudo at {@code info}.
     */
    @Parameter
    private Map<String, String> classSeverities;

    /** The most bytes of XML read from one model file, after gzip decompression. Default 1 GiB. */
    @Parameter(property = "atomledger.maxModelBytes", defaultValue = "1073741824")
    private long maxModelBytes;

    /**
     * A structure side table: a tab-separated file with a header line naming the columns
     * {@code species} and {@code smiles} or {@code inchi}. Each species' formula and charge are
     * compared with those derived from its structure. Relative to the project directory. Default:
     * none. Example: {@code -Datomledger.structures=models/structures.tsv}.
     */
    @Parameter(property = "atomledger.structures")
    private File structures;

    /** The project directory; model patterns are relative to it. */
    @Parameter(defaultValue = "${basedir}", readonly = true, required = true)
    private File baseDirectory;

    @Override
    public void execute() throws MojoExecutionException, MojoFailureException {
        if (skip) {
            getLog().info("AtomLedger check skipped (atomledger.skip=true)");
            return;
        }
        RunConfig config = ConfigMapper.toConfig(baseDirectory, models,
                ConfigMapper.reportDirectory(reportDirectory, buildDirectory, baseDirectory), failOnSeverity, formats,
                severities, classSeverities, maxModelBytes)
                .withStructureTable(structures == null ? null : structures.toPath());
        RunResult result;
        List<Path> written;
        try {
            result = new Engine().run(config, new MavenRunListener(getLog()));
            written = Reporters.forFormats(config.formats()).write(result, config.reportDirectory());
        } catch (AtomLedgerException e) {
            throw new MojoExecutionException(e.getMessage(), e);
        } catch (IOException e) {
            throw new MojoExecutionException("AtomLedger could not write its reports: " + e.getMessage(), e);
        } catch (IllegalArgumentException e) {
            throw new MojoExecutionException("AtomLedger configuration: " + e.getMessage(), e);
        }
        for (String line : ConsoleSummary.lines(result)) {
            getLog().info(line);
        }
        for (Path p : written) {
            getLog().info("report: " + ConfigMapper.display(config.baseDirectory(), p));
        }
        if (!result.failing().isEmpty()) {
            throw new MojoFailureException(ConfigMapper.failureSummary(result, written, config.baseDirectory()));
        }
    }
}
