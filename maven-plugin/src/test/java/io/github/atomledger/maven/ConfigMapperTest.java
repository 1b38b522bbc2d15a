package io.github.atomledger.maven;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.ReactionClass;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.gate.FailScope;
import io.github.atomledger.checker.gate.GateConfig;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.maven.plugin.MojoExecutionException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ConfigMapperTest {

    @TempDir
    Path base;

    private RunConfig config(Map<String, String> severities, Map<String, String> classes) throws MojoExecutionException {
        return ConfigMapper.toConfig(base.toFile(), List.of("models/a.xml, models/b.xml"), base.resolve("target/r").toFile(),
                "warning", "json", severities, classes, 1000);
    }

    @Test
    void mapsSeverityAndClassParametersIntoThePolicy() throws Exception {
        RunConfig c = config(Map.of("balance.charge", "warning", "model.baseline-stale", "error"), Map.of("transport", "off"));
        assertThat(c.policy().ruleOverrides()).containsEntry("balance.charge", "warning").containsEntry("model.baseline-stale", "error");
        assertThat(c.policy().classOverrides()).containsEntry(ReactionClass.TRANSPORT, "off");
        assertThat(c.models()).containsExactly("models/a.xml", "models/b.xml");
        assertThat(c.failOn()).isEqualTo(Severity.WARNING);
    }

    @Test
    void unknownRuleIdStopsTheBuildWithTheListOfKnownOnesIncludingTheGateRules() {
        assertThatThrownBy(() -> config(Map.of("balance.chrage", "off"), null))
                .isInstanceOf(MojoExecutionException.class)
                .hasMessageStartingWith("AtomLedger configuration: unknown rule id 'balance.chrage' in severities; known rule ids: ")
                .hasMessageContaining("balance.charge, balance.class-mismatch")
                .hasMessageContaining("model.baseline-stale")
                .hasMessageContaining("balance.regression")
                .hasMessageContaining("mapping.transitions-changed");
    }

    @Test
    void gateUsesTheDefaultBaselineOnlyWhenItExists() throws Exception {
        GateConfig g = ConfigMapper.toGate(base.toFile(), null, null, null);
        assertThat(g.baseline()).isEqualTo(base.resolve("models/atomledger-baseline.tsv"));
        assertThat(g.baselineRequired()).isFalse();
        assertThat(g.usesBaseline()).isFalse();
        assertThat(g.failOn()).isEqualTo(FailScope.FINDINGS);
        GateConfig named = ConfigMapper.toGate(base.toFile(), new File("accepted.tsv"), null, "findings");
        assertThat(named.baseline()).isEqualTo(base.resolve("accepted.tsv"));
        assertThat(named.usesBaseline()).isTrue();
    }

    @Test
    void gateRejectsRegressionsWithoutPreviousModelsAndMissingPreviousModels() throws Exception {
        assertThatThrownBy(() -> ConfigMapper.toGate(base.toFile(), null, null, "regressions"))
                .isInstanceOf(MojoExecutionException.class).hasMessageContaining("failOn=regressions needs previousModels");
        assertThatThrownBy(() -> ConfigMapper.toGate(base.toFile(), null, new File("target/previous"), "regressions"))
                .hasMessageEndingWith("target/previous does not exist");
        Files.createDirectories(base.resolve("target/previous"));
        assertThat(ConfigMapper.toGate(base.toFile(), null, new File("target/previous"), "Regressions").failOn())
                .isEqualTo(FailScope.REGRESSIONS);
    }

    /** Issue 15: a comma list of structure files and directories, each checked to exist, in order. */
    @Test
    void structuresAreACommaListOfExistingFilesAndDirectoriesInOrder() throws Exception {
        Files.createDirectories(base.resolve("lab/mol"));
        Files.writeString(base.resolve("lab/chebi.sdf"), "");
        Files.writeString(base.resolve("structures.tsv"), "");
        var m = ConfigMapper.mapping("auto", base.toFile(), "structures.tsv, lab/chebi.sdf,lab/mol", 1, "none", 2000, 400)
                .withSdIdField(" KEGG ID ");
        assertThat(m.enabled()).isTrue();
        assertThat(m.structureSources()).containsExactly(base.resolve("structures.tsv"), base.resolve("lab/chebi.sdf"),
                base.resolve("lab/mol"));
        assertThat(m.structures()).isEqualTo(base.resolve("structures.tsv"));
        assertThat(m.sdIdField()).isEqualTo("KEGG ID");
        assertThatThrownBy(() -> ConfigMapper.mapping("auto", base.toFile(), "structures.tsv,missing.sdf", 1, "none", 2000, 400))
                .isInstanceOf(MojoExecutionException.class).hasMessageContaining("structures: file not found: missing.sdf");
        assertThat(ConfigMapper.mapping("auto", base.toFile(), null, 1, "none", 2000, 400).enabled()).isFalse();
        assertThatThrownBy(() -> ConfigMapper.curatedMaps(base.toFile(), new File("nowhere")))
                .hasMessageContaining("curatedMaps: not a directory: nowhere");
    }
}
