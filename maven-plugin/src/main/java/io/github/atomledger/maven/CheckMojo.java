package io.github.atomledger.maven;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.engine.SeverityPolicy;
import io.github.atomledger.checker.gate.Gate;
import io.github.atomledger.checker.gate.GateConfig;
import io.github.atomledger.checker.report.ConsoleSummary;
import io.github.atomledger.checker.report.Reporters;
import io.github.atomledger.checker.report.UnchangedRun;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apache.maven.execution.MavenSession;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugin.descriptor.PluginDescriptor;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;

/**
 * Checks SBML models and fails the build on what is wrong: element and charge balance of every
 * reaction (exact arithmetic; exchange, demand and sink reactions exempt, biomass reported at
 * info), formulas and charges, model integrity and stoichiometric consistency. With species
 * structures ({@code structures}, or {@code mapping=on} for InChIs in the model) it also maps the
 * atoms of every reaction, checks declared formulas against the structures and validates curated
 * atom transitions. Writes the reports (HTML, JSON, JUnit XML, SARIF, Markdown), prints what fails
 * at {@code [ERROR]} and warnings at {@code [WARNING]}, and fails the build on findings at or
 * above {@code failOnSeverity} that the baseline does not accept. Read-only: never writes a model
 * file.
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

    /** Skips the goal. Example: {@code -Datomledger.skip}. */
    @Parameter(property = "atomledger.skip", defaultValue = "false")
    private boolean skip;

    /**
     * The lowest severity that fails the build: {@code error}, {@code warning}, {@code info}, or
     * {@code none} to only report.
     */
    @Parameter(property = "atomledger.failOnSeverity", defaultValue = "error")
    private String failOnSeverity;

    /**
     * Where reports are written. Default: {@code atomledger} in the build directory, which is
     * {@code target/atomledger} below the project directory (also without a pom).
     */
    @Parameter(property = "atomledger.reportDirectory")
    private File reportDirectory;

    @Parameter(defaultValue = "${project.build.directory}", readonly = true)
    private File buildDirectory;

    /**
     * Report formats, a comma list of {@code json}, {@code html}, {@code junit}, {@code sarif},
     * {@code markdown}, or {@code all}. Example: {@code -Datomledger.formats=json,sarif}.
     */
    @Parameter(property = "atomledger.formats", defaultValue = "all")
    private String formats;

    /**
     * Severity per rule id, in the pom: a severity or {@code off}. Example:
     * {@code <severities><balance.charge>warning</balance.charge></severities>}. Unknown rule ids
     * stop the build, naming the nearest known one. On the command line use {@code severity}.
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
     * Severity overrides in one line, for the command line: entries {@code key=level} separated by
     * commas, where the key is a rule id, an area with {@code .*} (every rule of the area; a named
     * rule wins over it) or {@code @} and a reaction class, and the level is {@code error},
     * {@code warning}, {@code info} or {@code off}. Laid over {@code severities} and
     * {@code classSeverities}. Example:
     * {@code -Datomledger.severity=structure.protonation=off,mapping.*=info,@biomass=off}.
     */
    @Parameter(property = "atomledger.severity")
    private String severity;

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
     * diff's findings; needs {@code previousModels}).
     */
    @Parameter(property = "atomledger.failOn", defaultValue = "findings")
    private String failOn;

    /**
     * The most bytes of XML read from one model file, after gzip decompression: a number of bytes
     * or a number with {@code k}, {@code m} or {@code g} (1 GiB = {@code 1g}).
     */
    @Parameter(property = "atomledger.maxModelBytes", defaultValue = "1g")
    private String maxModelBytes;

    /**
     * Structure files, a comma list, first to last in precedence: TSV tables (a {@code species}
     * column and/or cross-reference columns {@code chebi}, {@code metanetx.chemical},
     * {@code kegg.compound}, {@code bigg.metabolite}, {@code inchikey}; a {@code smiles} or
     * {@code inchi} column), SD files ({@code .sdf}, {@code .sdf.gz}; see {@code structureIdField}),
     * molfiles ({@code .mol}) and directories of molfiles, each named by species id or
     * cross-reference ({@code CHEBI_15361.mol}). The format is told by the name, else by the
     * content. Cross-reference keys resolve every species whose MIRIAM annotation carries the id.
     * Setting it turns atom mapping on (see {@code mapping}). Default: none. Example:
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
     * When every input is byte for byte what an earlier run had (the model files, structure
     * sources, curated maps, pathways, fates, baseline, every parameter, and AtomLedger's own
     * code), that run's reports, console lines and verdict are put back instead of computed again
     * (stored below {@code cacheDirectory}, in {@code runs/}). Never with {@code exportMaps}, a
     * {@code previousModels} gate or {@code cacheDirectory=none}. {@code false} always runs
     * everything. Example: {@code -Datomledger.reuseUnchanged=false}.
     */
    @Parameter(property = "atomledger.reuseUnchanged", defaultValue = "true")
    private boolean reuseUnchanged;

    /**
     * Atom mapping: {@code auto} (map when {@code structures} is set), {@code on} (also with
     * InChIs from MIRIAM annotations or structures stored by {@code annotate}), or {@code off}.
     */
    @Parameter(property = "atomledger.mapping", defaultValue = "auto")
    private String mapping;

    /** Threads for mapping, drawing the HTML report's pictures and writing reports; {@code 0} means one per core. */
    @Parameter(property = "atomledger.threads", defaultValue = "0")
    private String threads;

    /**
     * Where mapping results are cached between runs (they survive {@code mvn clean}), with the
     * HTML report's drawn pictures in its {@code pictures/} folder; {@code none} switches both off.
     * Default {@code ~/.cache/atomledger/maps}.
     */
    @Parameter(property = "atomledger.cacheDirectory")
    private String cacheDirectory;

    /**
     * Time budget per reaction for the exact mapper: milliseconds ({@code 2000}) or a number with
     * a unit ({@code 500ms}, {@code 2s}, {@code 1m}).
     */
    @Parameter(property = "atomledger.mappingTimeBudget", defaultValue = "2000")
    private String mappingTimeBudget;

    /** Size cap per molecule for the mapper, in heavy (non-hydrogen) atoms. */
    @Parameter(property = "atomledger.maxHeavyAtoms", defaultValue = "400")
    private String maxHeavyAtoms;

    /**
     * Budget per reaction for the confidence analysis of a proven optimal map (the runner-up
     * search and the alternative C–C weights), in milliseconds of the mapping thread's CPU time;
     * 0 switches the analysis off (then no margins, and no {@code mapping.review} findings).
     * Milliseconds ({@code 1000}) or a number with a unit ({@code 500ms}, {@code 1s}). Example:
     * {@code -Datomledger.mappingConfidenceBudget=0}.
     */
    @Parameter(property = "atomledger.mappingConfidenceBudget", defaultValue = "1000")
    private String mappingConfidenceBudget;

    /**
     * Maps whose margin to the runner-up (the cheapest map that sends some carbon elsewhere) is
     * at most this many weighted bond edits get a {@code mapping.review} finding, and a curated map
     * at most this much dearer than the optimum is accepted ({@code mapping.curated-undecided})
     * instead of failing as {@code mapping.curated-differs}. At 0 a narrow margin alone does not
     * flag, as correct maps of central metabolism often win by 1 or 2 (BENCHMARKS.md);
     * rearrangement patterns and weight-dependent fates always do. Example:
     * {@code -Datomledger.reviewMargin=2}.
     */
    @Parameter(property = "atomledger.reviewMargin", defaultValue = "0")
    private String reviewMargin;

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

    @Parameter(defaultValue = "${session}", readonly = true)
    private MavenSession session;

    @Parameter(defaultValue = "${plugin}", readonly = true)
    private PluginDescriptor plugin;

    @Override
    public void execute() throws MojoExecutionException, MojoFailureException {
        if (skip) {
            getLog().info("AtomLedger check skipped (atomledger.skip=true)");
            return;
        }
        ConfigMapper.warnUnknownProperties(getLog(), session, plugin);
        SeverityPolicy.Overrides levels = ConfigMapper.severityOverrides(severities, classSeverities, severity);
        RunConfig config = ConfigMapper.toConfig(baseDirectory, models,
                ConfigMapper.reportDirectory(reportDirectory, buildDirectory, baseDirectory), failOnSeverity, formats,
                levels.byRule(), levels.byClass(), ParameterValues.bytes("maxModelBytes", maxModelBytes, 1L << 30))
                .withMapping(ConfigMapper.confidence(ConfigMapper.mapping(mapping, baseDirectory, structures,
                        ParameterValues.threads(threads), cacheDirectory,
                        ParameterValues.durationMillis("mappingTimeBudget", mappingTimeBudget, 2000),
                        ParameterValues.positive("maxHeavyAtoms", maxHeavyAtoms, 400)).withSdIdField(structureIdField)
                        .withCuratedMaps(ConfigMapper.curatedMaps(baseDirectory, curatedMaps)),
                        ParameterValues.durationOrZeroMillis("mappingConfidenceBudget", mappingConfidenceBudget, 1000),
                        ParameterValues.nonNegative("reviewMargin", reviewMargin, 0)))
                .withTraces(ConfigMapper.traces(baseDirectory, pathways, fates, tracers));
        GateConfig gate = ConfigMapper.toGate(baseDirectory, baseline, previousModels, failOn);
        boolean colour = ConsoleSummary.colourWanted(System.getenv(), System.console() != null);
        MavenRunListener log = new MavenRunListener(getLog());
        Optional<UnchangedRun> reuse = reuseUnchanged && !exportMaps
                ? UnchangedRun.of(config, gate, "check;colour=" + colour, CheckMojo.class) : Optional.empty();
        if (reuse.isPresent() && replay(reuse.get(), log)) {
            return;
        }
        RunResult result;
        Reporters.Outcome reports;
        RecordingRunListener listener = new RecordingRunListener(log);
        try {
            Engine engine = new Engine();
            result = Gate.standard(engine, config.maxModelBytes()).apply(engine.run(config, listener), gate, listener);
            reports = Reporters.forFormats(config.formats()).writeAll(result, config.reportDirectory());
        } catch (AtomLedgerException e) {
            throw ConfigMapper.failure(e.getMessage(), e);
        } catch (IllegalArgumentException e) {
            throw ConfigMapper.failure("AtomLedger configuration: " + e.getMessage(), e);
        }
        List<Path> written = reports.written();
        // What a reused run shows again: the warnings the run logged, then the summary and the reports.
        List<ConsoleSummary.Line> shown = listener.kept();
        int live = shown.size();
        shown.addAll(ConsoleSummary.report(result, colour));
        for (Path p : written) {
            shown.add(new ConsoleSummary.Line(ConsoleSummary.Level.INFO,
                    "report: " + ConfigMapper.display(config.baseDirectory(), p)));
        }
        print(shown.subList(live, shown.size()), log);
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
        String failure = result.failing().isEmpty() ? null
                : ConfigMapper.failureSummary(result, written, config.baseDirectory());
        if (reuse.isPresent()) {
            try {
                reuse.get().store(new UnchangedRun.Outcome(shown, failure), written);
            } catch (IOException | RuntimeException e) {
                getLog().debug("AtomLedger: this run is not kept for reuse: " + e);
            }
        }
        if (failure != null) {
            throw new MojoFailureException(failure);
        }
    }

    /** Shows an unchanged earlier run again; false when there is none to show (then nothing was changed). */
    private boolean replay(UnchangedRun reuse, MavenRunListener log) throws MojoFailureException {
        Optional<UnchangedRun.Outcome> again;
        try {
            again = reuse.restore();
        } catch (IOException | RuntimeException e) {
            getLog().debug("AtomLedger: the earlier run cannot be reused: " + e);
            return false;
        }
        if (again.isEmpty()) {
            return false;
        }
        getLog().info("AtomLedger: no input changed since an earlier run; its reports and findings are shown"
                + " again (atomledger.reuseUnchanged=false runs everything)");
        print(again.get().lines(), log);
        if (again.get().failure() != null) {
            throw new MojoFailureException(again.get().failure());
        }
        return true;
    }

    private static void print(List<ConsoleSummary.Line> lines, MavenRunListener log) {
        for (ConsoleSummary.Line line : lines) {
            switch (line.level()) {
                case ERROR -> log.error(line.text());
                case WARNING -> log.warn(line.text());
                default -> log.info(line.text());
            }
        }
    }
}
