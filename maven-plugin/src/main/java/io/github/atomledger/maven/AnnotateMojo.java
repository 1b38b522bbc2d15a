package io.github.atomledger.maven;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.annotate.AnnotationPlan;
import io.github.atomledger.checker.annotate.ModelAnnotator;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunResult;

import java.io.File;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.apache.maven.execution.MavenSession;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.descriptor.PluginDescriptor;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;

/**
 * Maps every reaction and writes the carbon transitions of each proven, unique map into the model
 * as an AtomLedger annotation ({@code atomTransitions}, namespace
 * {@code http://atomledger.github.io/ns/atom-transitions/1}) inside the reaction's
 * {@code <annotation>}. Everything else in the file stays byte-for-byte as it was; curated maps are
 * kept unless {@code overwriteCurated}; the write is atomic. Ambiguous maps are not written.
 *
 * <p>Without a pom: {@code mvn io.github.atomledger:atomledger-maven-plugin:VERSION:annotate
 * -Datomledger.models=models/my.xml -Datomledger.structures=structures.tsv}.
 */
@Mojo(name = "annotate", threadSafe = true, requiresProject = false)
public final class AnnotateMojo extends AbstractMojo {

    /** Model files or glob patterns, as for {@code check}. Default {@code models/**.{xml,xml.gz}}. */
    @Parameter(property = "atomledger.models")
    private List<String> models;

    /** Skips the goal. */
    @Parameter(property = "atomledger.skip", defaultValue = "false")
    private boolean skip;

    /** Reports what would change without writing anything. */
    @Parameter(property = "atomledger.dryRun", defaultValue = "false")
    private boolean dryRun;

    /** Replaces curated ({@code origin="curated"}) maps too. */
    @Parameter(property = "atomledger.overwriteCurated", defaultValue = "false")
    private boolean overwriteCurated;

    /**
     * Structure files and directories, a comma list (as for {@code check}). Needed unless the
     * species carry identifiers.org InChI annotations; without any structure the goal fails, as
     * nothing could be annotated.
     */
    @Parameter(property = "atomledger.structures")
    private String structures;

    /** The SD data item holding each record's id (as for {@code check}). Default {@code ChEBI ID}. */
    @Parameter(property = "atomledger.structureIdField", defaultValue = "ChEBI ID")
    private String structureIdField;

    /**
     * A directory of curated maps as RXN files, {@code <reaction id>.rxn} (as for {@code check}):
     * those that are valid carbon maps of their reactions are written as curated annotations.
     */
    @Parameter(property = "atomledger.curatedMaps")
    private File curatedMaps;

    /** Mapping threads; {@code 0} means one per core. */
    @Parameter(property = "atomledger.threads", defaultValue = "0")
    private String threads;

    /** Mapping cache directory, or {@code none}. Default {@code ~/.cache/atomledger/maps}. */
    @Parameter(property = "atomledger.cacheDirectory")
    private String cacheDirectory;

    /** Time budget per reaction, as for {@code check}: milliseconds or a number with a unit ({@code 2s}). */
    @Parameter(property = "atomledger.mappingTimeBudget", defaultValue = "2000")
    private String mappingTimeBudget;

    /** Size cap per molecule in heavy atoms. */
    @Parameter(property = "atomledger.maxHeavyAtoms", defaultValue = "400")
    private String maxHeavyAtoms;

    /** The most bytes of XML read from one model file, after gzip decompression, as for {@code check}. */
    @Parameter(property = "atomledger.maxModelBytes", defaultValue = "1g")
    private String maxModelBytes;

    @Parameter(defaultValue = "${basedir}", readonly = true, required = true)
    private File baseDirectory;

    @Parameter(defaultValue = "${session}", readonly = true)
    private MavenSession session;

    @Parameter(defaultValue = "${plugin}", readonly = true)
    private PluginDescriptor plugin;

    @Override
    public void execute() throws MojoExecutionException {
        if (skip) {
            getLog().info("AtomLedger annotate skipped (atomledger.skip=true)");
            return;
        }
        ConfigMapper.warnUnknownProperties(getLog(), session, plugin);
        long maxBytes = ParameterValues.bytes("maxModelBytes", maxModelBytes, 1L << 30);
        RunConfig config = ConfigMapper.toConfig(baseDirectory, models, new File(baseDirectory, "target/atomledger"),
                "none", "json", Map.of(), Map.of(), maxBytes)
                .withMapping(ConfigMapper.mapping("on", baseDirectory, structures, ParameterValues.threads(threads),
                        cacheDirectory, ParameterValues.durationMillis("mappingTimeBudget", mappingTimeBudget, 2000),
                        ParameterValues.positive("maxHeavyAtoms", maxHeavyAtoms, 400)).withSdIdField(structureIdField)
                        .withCuratedMaps(ConfigMapper.curatedMaps(baseDirectory, curatedMaps)));
        RunResult result;
        try {
            result = new Engine().run(config, new MavenRunListener(getLog()));
        } catch (AtomLedgerException e) {
            throw ConfigMapper.failure(e.getMessage(), e);
        }
        if (result.models().stream().allMatch(m -> m.mapping().structures().bySpecies().isEmpty())) {
            throw new MojoExecutionException("AtomLedger annotate: no species has a structure, so nothing can be"
                    + " annotated. Set atomledger.structures to species structure files (a TSV table with the columns"
                    + " species and smiles or inchi, SD files or molfiles), for example -Datomledger.structures=structures.tsv, or add"
                    + " identifiers.org InChI annotations to the species.");
        }
        // Each model is annotated on its own: one that cannot be written (or one reaction's
        // annotation that cannot be made) does not keep the others from being annotated; the
        // goal fails at the end, naming them.
        ModelAnnotator annotator = new ModelAnnotator(overwriteCurated, dryRun, maxBytes);
        List<String> failures = new ArrayList<>();
        for (ModelResult m : result.models()) {
            try {
                ModelAnnotator.Outcome out = annotator.annotate(config.baseDirectory().resolve(m.file()), m.file(),
                        AnnotationPlan.of(m));
                getLog().info(summary(m, out));
                out.failures().forEach(f -> failures.add(m.file() + ": " + f));
            } catch (AtomLedgerException e) {
                failures.add(e.getMessage());
            }
        }
        failures.forEach(f -> getLog().error("AtomLedger: " + f));
        if (!failures.isEmpty()) {
            throw new MojoExecutionException("AtomLedger annotate: " + failures.get(0)
                    + (failures.size() > 1 ? " (and " + (failures.size() - 1) + " more, listed above)" : ""));
        }
    }

    private String summary(ModelResult m, ModelAnnotator.Outcome out) {
        Map<ModelAnnotator.Action, Integer> counts = new EnumMap<>(ModelAnnotator.Action.class);
        out.changes().forEach(c -> counts.merge(c.action(), 1, Integer::sum));
        long notWritten = m.reactions().stream().map(ReactionResult::mapping)
                .filter(x -> x != null && x.hasMap() && x.status() != io.github.atomledger.checker.check.mapping.MapStatus.MAPPED)
                .count();
        String verb = dryRun ? "would add " : "added ";
        return m.file() + ": " + verb + counts.getOrDefault(ModelAnnotator.Action.ADDED, 0) + ", "
                + (dryRun ? "would replace " : "replaced ") + counts.getOrDefault(ModelAnnotator.Action.REPLACED, 0)
                + ", unchanged " + counts.getOrDefault(ModelAnnotator.Action.UNCHANGED, 0)
                + ", curated kept " + counts.getOrDefault(ModelAnnotator.Action.KEPT_CURATED, 0)
                + "; " + Wording.count(notWritten, "ambiguous or unproven map") + " not written"
                + (out.written() ? "" : dryRun ? " (dry run: nothing written)" : " (file unchanged)");
    }
}
