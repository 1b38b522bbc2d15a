package io.github.atomledger.checker;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.SeverityPolicy;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;

import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Path;
import java.util.List;

/** Loads the tiny SBML fixtures under src/test/resources and runs the standard checks on them. */
public final class TestModels {

    private TestModels() {
    }

    /** The fixture {@code <area>/<name>} below {@code io/github/atomledger/checker/check/}. */
    public static Path fixture(String areaAndName) {
        URL url = TestModels.class.getResource("/io/github/atomledger/checker/check/" + areaAndName);
        if (url == null) {
            throw new IllegalArgumentException("no fixture " + areaAndName);
        }
        try {
            return Path.of(url.toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    public static ModelView load(String areaAndName) {
        return new ModelLoader(LoadOptions.defaults()).load(fixture(areaAndName), areaAndName);
    }

    /** Every finding of the standard checks, with default severities and class defaults applied. */
    public static List<Finding> findings(String areaAndName) {
        return new Engine().check(load(areaAndName), SeverityPolicy.defaults()).allFindings();
    }

    /** The result of a run with a structure side table (mapping on, one thread, no cache). */
    public static ModelResult result(String areaAndName, String structureTable) {
        Path model = fixture(areaAndName);
        RunConfig config = RunConfig.defaults(model.getParent(), List.of(model.getFileName().toString()))
                .withMapping(new MappingConfig(true, fixture(structureTable), MappingOptions.defaults(), 1, null));
        return new Engine().run(config, RunListener.SILENT).models().get(0);
    }

    /** Findings of one rule. */
    public static List<Finding> findings(String areaAndName, String ruleId) {
        return findings(areaAndName).stream().filter(f -> f.ruleId().equals(ruleId)).toList();
    }
}
