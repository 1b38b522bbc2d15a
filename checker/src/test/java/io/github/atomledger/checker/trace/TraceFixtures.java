package io.github.atomledger.checker.trace;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Runs a trace fixture ({@code <name>.xml} with {@code <name>-structures.tsv} and
 * {@code <name>-pathways.tsv}) through the engine, mapping with a node limit so that no status
 * depends on machine load.
 */
final class TraceFixtures {

    private TraceFixtures() {
    }

    static Path dir() {
        try {
            return Path.of(TraceFixtures.class.getResource("glycolysis.xml").toURI()).getParent();
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static ModelResult run(String name, String fates, List<String> tracers) {
        Path dir = dir();
        MappingOptions options = MappingOptions.defaults().withTimeBudget(java.time.Duration.ofMinutes(2))
                .withNodeLimit(300_000);
        RunConfig config = RunConfig.defaults(dir, List.of(name + ".xml"))
                .withMapping(new MappingConfig(true, dir.resolve(name + "-structures.tsv"), options, 2, null))
                .withTraces(new TraceConfig(dir.resolve(name + "-pathways.tsv"), fates == null ? null : dir.resolve(fates),
                        tracers));
        return new Engine().run(config, RunListener.SILENT).models().get(0);
    }

    static ModelResult run(String name) {
        return run(name, null, List.of());
    }

    static PathwayTrace pathway(ModelResult m, String name) {
        return m.traces().pathways().stream().filter(p -> p.pathway().name().equals(name)).findFirst().orElseThrow();
    }

    /** The trace of the source carbon with this label ("C1"). */
    static CarbonTrace carbon(ModelResult m, String pathway, String label) {
        PathwayTrace t = pathway(m, pathway);
        int atom = m.mapping().structures().get(t.pathway().source()).orElseThrow().structure().atomNamed(label);
        return t.carbon(atom);
    }

    /** Each source carbon's label with where it ends, as "C1>co2:C1" ("C5>acac:C2/C4" when split in one species). */
    static Map<String, String> fates(ModelResult m, String pathway) {
        PathwayTrace t = pathway(m, pathway);
        Map<String, String> out = new TreeMap<>();
        Atoms atoms = new Atoms(m.mapping().structures());
        for (CarbonTrace c : t.carbons()) {
            String label = m.mapping().structures().label(t.pathway().source(), c.atom());
            out.put(label, c.status() == CarbonStatus.UNDECIDED ? "undecided" : atoms.text(c.positions().keySet()));
        }
        return out;
    }

    /** Share of the source's labelled carbons (atom-class carbons only) per fate species, as exact text. */
    static Map<String, String> counts(ModelResult m, String pathway) {
        PathwayTrace t = pathway(m, pathway);
        Map<String, io.github.atomledger.atommapper.formula.Rational> sum = new TreeMap<>();
        for (CarbonTrace c : t.carbons()) {
            if (m.mapping().structures().get(t.pathway().source()).orElseThrow().structure().atomClass(c.atom()) == 0) {
                continue;
            }
            if (c.status() == CarbonStatus.UNDECIDED) {
                sum.merge("undecided", io.github.atomledger.atommapper.formula.Rational.ONE,
                        io.github.atomledger.atommapper.formula.Rational::add);
            }
            c.sharesBySpecies().forEach((s, w) -> sum.merge(s, w, io.github.atomledger.atommapper.formula.Rational::add));
        }
        Map<String, String> out = new TreeMap<>();
        sum.forEach((k, v) -> out.put(k, v.toString()));
        return out;
    }
}
