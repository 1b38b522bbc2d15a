package io.github.atomledger.maven;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.gate.Gate;
import io.github.atomledger.checker.gate.GateConfig;
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
     * {@code markdown}, or {@code all}. Default {@code all}. Example: {@code -Datomledger.formats=json,sarif}.
     */
    @Parameter(property = "atomledger.formats", defaultValue = "all")
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

    /**
     * The baseline of accepted findings (see {@code docs/gating.md}): findings listed there with a
     * reason are reported as accepted and do not fail the build; entries that match nothing are
     * reported as {@code model.baseline-stale}. Default {@code models/atomledger-baseline.tsv}, used
     * when it exists; a file named here must exist. Example: {@code -Datomledger.baseline=models/baseline.tsv}.
     */
    @Parameter(property = "atomledger.baseline")
    private File baseline;

    /**
     * The previous release's models, for the release diff: a directory holding them under the same
     * relative paths as the current ones, or one file when one model is checked. Default: no diff.
     * Example: {@code -Datomledger.previousModels=target/previous} after
     * {@code git archive v1.3 models | tar -x -C target/previous}.
     */
    @Parameter(property = "atomledger.previousModels")
    private File previousModels;

    /**
     * Which findings may fail the build: {@code findings} (every finding at or above
     * {@code failOnSeverity} not accepted in the baseline) or {@code regressions} (only the release
     * diff's findings; needs {@code previousModels}). Default {@code findings}.
     */
    @Parameter(property = "atomledger.failOn", defaultValue = "findings")
    private String failOn;

    /** The most bytes of XML read from one model file, after gzip decompression. Default 1 GiB. */
    @Parameter(property = "atomledger.maxModelBytes", defaultValue = "1073741824")
    private long maxModelBytes;

    /**
     * Structure files, a comma list, first to last in precedence: TSV tables (a {@code species}
     * column and/or cross-reference columns {@code chebi}, {@code metanetx.chemical},
     * {@code kegg.compound}, {@code bigg.metabolite}, {@code inchikey}; a {@code smiles} or
     * {@code inchi} column), SD files ({@code .sdf}, {@code .sdf.gz}; see {@code structureIdField}),
     * molfiles ({@code .mol}) and directories of molfiles, each named by species id or
     * cross-reference ({@code CHEBI_15361.mol}). The format is told by the name, else by the
     * content. Cross-reference keys resolve every species whose MIRIAM annotation carries the id.
     * Setting it turns atom mapping on (see {@code mapping}). Example:
     * {@code -Datomledger.structures=structures.tsv,lab/chebi.sdf.gz,lab/molfiles}.
     */
    @Parameter(property = "atomledger.structures")
    private String structures;

    /**
     * The SD data item holding each record's id. Values resolve species with that id, or species
     * whose annotation carries it as a cross-reference (the field {@code ChEBI ID} and fields
     * named after an identifiers.org prefix say which collection; otherwise the id's form does).
     * Default {@code ChEBI ID}, as in the public ChEBI SD dump.
     */
    @Parameter(property = "atomledger.structureIdField", defaultValue = "ChEBI ID")
    private String structureIdField;

    /**
     * A directory of curated maps as MDL RXN files with atom-atom mapping numbers, one per
     * reaction, named {@code <reaction id>.rxn}. Each is read onto the reaction's structures and
     * validated like a curated map in the model ({@code mapping.curated-invalid},
     * {@code mapping.curated-differs}); {@code annotate} writes valid ones into the model. Default: none.
     * Example: {@code -Datomledger.curatedMaps=maps-curated}.
     */
    @Parameter(property = "atomledger.curatedMaps")
    private File curatedMaps;

    /**
     * Writes the maps as standard files into {@code <reportDirectory>/maps/}: one MDL RXN file per
     * reaction with a map ({@code <reaction id>.rxn}, atom-atom mapping numbers) and
     * {@code carbon-transitions.tsv}, all carbon transitions with readable positions; curated and
     * inferred maps are marked. Default {@code false}. Example: {@code -Datomledger.exportMaps}.
     */
    @Parameter(property = "atomledger.exportMaps", defaultValue = "false")
    private boolean exportMaps;

    /**
     * Atom mapping: {@code auto} (map when {@code structures} is set), {@code on} (also with
     * InChIs from MIRIAM annotations or structures stored by {@code annotate}), or {@code off}.
     * Default {@code auto}.
     */
    @Parameter(property = "atomledger.mapping", defaultValue = "auto")
    private String mapping;

    /** Threads for mapping, drawing the HTML report's pictures and writing reports; 0 means one per core. Default 0. */
    @Parameter(property = "atomledger.threads", defaultValue = "0")
    private int threads;

    /**
     * Where mapping results are cached between runs (they survive {@code mvn clean}), with the
     * HTML report's drawn pictures in its {@code pictures/} folder; {@code none} switches both off.
     * Default {@code ~/.cache/atomledger/maps}.
     */
    @Parameter(property = "atomledger.cacheDirectory")
    private String cacheDirectory;

    /** Time budget per reaction for the exact mapper, in milliseconds. Default 2000. */
    @Parameter(property = "atomledger.mappingTimeBudget", defaultValue = "2000")
    private long mappingTimeBudget;

    /** Size cap per molecule for the mapper, in heavy (non-hydrogen) atoms. Default 400. */
    @Parameter(property = "atomledger.maxHeavyAtoms", defaultValue = "400")
    private int maxHeavyAtoms;

    /**
     * Budget per reaction for the confidence analysis of a proven optimal map (the runner-up
     * search and the alternative C–C weights), in milliseconds of the mapping thread's CPU time;
     * 0 switches the analysis off (then no margins, and no {@code mapping.review} findings).
     * Default 1000. Example: {@code -Datomledger.mappingConfidenceBudget=0}.
     */
    @Parameter(property = "atomledger.mappingConfidenceBudget", defaultValue = "1000")
    private long mappingConfidenceBudget;

    /**
     * Maps whose margin to the runner-up (the cheapest map that sends some carbon elsewhere) is
     * at most this many weighted bond edits get a {@code mapping.review} finding, and a curated map
     * at most this much dearer than the optimum is accepted ({@code mapping.curated-undecided})
     * instead of failing as {@code mapping.curated-differs}. Default 0: a narrow margin alone does
     * not flag, as correct maps of central metabolism often win by 1 or 2 (BENCHMARKS.md);
     * rearrangement patterns and weight-dependent fates always do. Example:
     * {@code -Datomledger.reviewMargin=2}.
     */
    @Parameter(property = "atomledger.reviewMargin", defaultValue = "0")
    private int reviewMargin;

    /**
     * Pathways whose carbons are followed (see {@code docs/traces.md}): a TSV file with a header
     * and the columns {@code pathway}, {@code source} (the species whose carbons are followed) and
     * {@code steps} (reaction ids in order, separated by spaces; {@code -R_X} runs R_X backwards).
     * Needs atom mapping. Default {@code models/pathways.tsv}, used when it exists; a file named
     * here must exist. Example: {@code -Datomledger.pathways=models/pathways.tsv}.
     */
    @Parameter(property = "atomledger.pathways")
    private File pathways;

    /**
     * Declared carbon fates that fail the build when a trace disagrees: a TSV file with a header
     * and the columns {@code pathway}, {@code carbon} (as reports name it, {@code C1}) and
     * {@code fate} ({@code species} or {@code species:position}). Default {@code models/fates.tsv},
     * used when it exists; a file named here must exist. Example: {@code -Datomledger.fates=models/fates.tsv}.
     */
    @Parameter(property = "atomledger.fates")
    private File fates;

    /**
     * Label sources for the "where label can go" report: a comma list of {@code species:position}
     * (a label such as {@code C1}, or a heavy-atom index) or {@code species} for every carbon of
     * it. Default: none. Example: {@code -Datomledger.tracers=glc_e:C1}.
     */
    @Parameter(property = "atomledger.tracers")
    private List<String> tracers;

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
                .withMapping(ConfigMapper.confidence(ConfigMapper.mapping(mapping, baseDirectory, structures, threads,
                        cacheDirectory, mappingTimeBudget, maxHeavyAtoms).withSdIdField(structureIdField)
                        .withCuratedMaps(ConfigMapper.curatedMaps(baseDirectory, curatedMaps)), mappingConfidenceBudget,
                        reviewMargin))
                .withTraces(ConfigMapper.traces(baseDirectory, pathways, fates, tracers));
        GateConfig gate = ConfigMapper.toGate(baseDirectory, baseline, previousModels, failOn);
        RunResult result;
        Reporters.Outcome reports;
        try {
            Engine engine = new Engine();
            MavenRunListener listener = new MavenRunListener(getLog());
            result = Gate.standard(engine, config.maxModelBytes()).apply(engine.run(config, listener), gate, listener);
            reports = Reporters.forFormats(config.formats()).writeAll(result, config.reportDirectory());
        } catch (AtomLedgerException e) {
            throw new MojoExecutionException(e.getMessage(), e);
        } catch (IllegalArgumentException e) {
            throw new MojoExecutionException("AtomLedger configuration: " + e.getMessage(), e);
        }
        List<Path> written = reports.written();
        boolean colour = ConsoleSummary.colourWanted(System.getenv(), System.console() != null);
        for (String line : ConsoleSummary.lines(result, colour)) {
            getLog().info(line);
        }
        for (Path p : written) {
            getLog().info("report: " + ConfigMapper.display(config.baseDirectory(), p));
        }
        // Maps are exported after the reports; a file system error there fails the goal like a
        // report that could not be written.
        List<String> exported;
        String exportError = null;
        try {
            exported = exportMaps ? ConfigMapper.exportMaps(result, config.reportDirectory().resolve("maps")) : List.of();
        } catch (IOException e) {
            exported = List.of();
            exportError = "AtomLedger could not export the maps: " + e.getMessage();
        }
        for (String line : exported) {
            if (line.startsWith("!")) {
                getLog().warn(line.substring(1));
            } else {
                getLog().info(line);
            }
        }
        // A report we could not write is a broken tool, not a finding: fail loudly, after the
        // summary and every other report are out.
        for (Reporters.Failure f : reports.failures()) {
            getLog().error("AtomLedger: " + f.message());
        }
        if (!reports.failures().isEmpty()) {
            Reporters.Failure f = reports.failures().get(0);
            throw new MojoExecutionException("AtomLedger: " + f.message(), f.error());
        }
        if (exportError != null) {
            throw new MojoExecutionException(exportError);
        }
        if (!result.failing().isEmpty()) {
            throw new MojoFailureException(ConfigMapper.failureSummary(result, written, config.baseDirectory()));
        }
    }
}
