package io.github.atomledger.checker.gate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.tuple;

import io.github.atomledger.checker.baseline.Baseline;
import io.github.atomledger.checker.baseline.BaselineUpdate;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.BaselineStatus;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.report.JsonReporter;

import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class GateTest {

    @TempDir
    Path base;

    private final Engine engine = new Engine();
    private RunConfig config;

    private static Path fixture(String name) throws URISyntaxException {
        return Path.of(GateTest.class.getResource("/io/github/atomledger/checker/diff/" + name).toURI());
    }

    @BeforeEach
    void repository() throws Exception {
        Files.createDirectories(base.resolve("models"));
        Files.copy(fixture("release-2.xml"), base.resolve("models/central.xml"));
        Files.createDirectories(base.resolve("target/previous/models"));
        Files.copy(fixture("release-1.xml"), base.resolve("target/previous/models/central.xml"));
        config = RunConfig.defaults(base, RunConfig.DEFAULT_MODELS);
    }

    private RunResult gate(GateConfig gate) {
        return Gate.standard(engine, config.maxModelBytes()).apply(engine.run(config, RunListener.SILENT), gate, RunListener.SILENT);
    }

    private static List<String> failing(RunResult r) {
        return r.failing().stream().map(f -> f.ruleId() + " " + f.elementId()).toList();
    }

    @Test
    void withoutGateEveryErrorFails() {
        RunResult r = gate(GateConfig.none());
        // The missing proton of R_HEX also makes the network stoichiometrically inconsistent.
        assertThat(failing(r)).containsExactlyInAnyOrder("balance.elements R_HEX", "balance.charge R_HEX",
                "balance.elements R_G6PH", "balance.elements R_ATPASE2", "balance.charge R_ATPASE2",
                "balance.mass-inconsistent brackwater_release");
        assertThat(r.allFindings()).noneMatch(f -> f.ruleId().startsWith("model.reaction-"));
    }

    @Test
    void failingOnRegressionsOnlyIgnoresTheOldImbalance() {
        RunResult r = gate(new GateConfig(null, false, base.resolve("target/previous"), FailScope.REGRESSIONS));
        assertThat(failing(r)).containsExactlyInAnyOrder("balance.regression R_HEX", "balance.regression R_ATPASE2");
        ModelResult m = r.models().get(0);
        assertThat(m.modelFindings()).extracting(Finding::ruleId, Finding::elementId)
                .contains(tuple("model.reaction-removed", "R_FBP"));
        assertThat(m.reactions().stream().filter(x -> x.id().equals("R_PGI")).findFirst().orElseThrow().findings())
                .extracting(Finding::ruleId).contains("mapping.transitions-changed");
    }

    @Test
    void unchangedModelPassesWhenFailingOnRegressions() throws Exception {
        Files.copy(fixture("release-2.xml"), base.resolve("target/previous/models/central.xml"),
                java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        RunResult r = gate(new GateConfig(null, false, base.resolve("target/previous"), FailScope.REGRESSIONS));
        assertThat(r.failing()).isEmpty();
        assertThat(r.allFindings()).noneMatch(f -> f.ruleId().startsWith("model.reaction-") || f.ruleId().startsWith("mapping."));
    }

    @Test
    void baselineAcceptsReasonedFindingsReportsStaleOnesAndLetsNewOnesFail() throws Exception {
        RunResult plain = engine.run(config, RunListener.SILENT);
        List<Finding> accepted = plain.failing().stream().filter(f -> !f.elementId().equals("R_ATPASE2")).toList();
        Baseline b = BaselineUpdate.of(Baseline.empty(), accepted, List.of("models/central.xml"), Severity.ERROR, "mkrause")
                .baseline();
        String text = b.format().replace(Baseline.PLACEHOLDER_REASON, "known before release 2")
                + "models/central.xml\tbalance.charge\tR_GONE\t0123456789abcdef\tmkrause\tfixed since\n"
                + "models/other.xml\tbalance.charge\tR_ELSE\t0123456789abcdef\tmkrause\tnot checked in this run\n";
        Path file = base.resolve("models/atomledger-baseline.tsv");
        Files.writeString(file, text);
        RunResult r = gate(new GateConfig(file, true, null, FailScope.FINDINGS));
        assertThat(failing(r)).containsExactlyInAnyOrder("balance.elements R_ATPASE2", "balance.charge R_ATPASE2");
        assertThat(r.allFindings()).filteredOn(f -> f.ruleId().equals("model.baseline-stale"))
                .extracting(Finding::elementId, Finding::severity).containsExactly(tuple("R_GONE", Severity.WARNING));
        Finding hex = r.allFindings().stream().filter(f -> f.ruleId().equals("balance.charge") && f.elementId().equals("R_HEX"))
                .findFirst().orElseThrow();
        assertThat(r.gate().status(hex)).contains(BaselineStatus.ACCEPTED);
        String json = new JsonReporter().toJson(r);
        assertThat(json).contains("\"baseline\" : \"accepted\"", "\"baseline\" : \"new\"", "\"file\" : \"models/atomledger-baseline.tsv\"");
    }

    @Test
    void placeholderReasonDoesNotAccept() throws Exception {
        RunResult plain = engine.run(config, RunListener.SILENT);
        Path file = base.resolve("models/atomledger-baseline.tsv");
        BaselineUpdate.of(Baseline.empty(), plain.allFindings(), List.of("models/central.xml"), Severity.ERROR, "a")
                .baseline().write(file);
        RunResult r = gate(new GateConfig(file, false, null, FailScope.FINDINGS));
        assertThat(r.failing()).hasSize(plain.failing().size())
                .allSatisfy(f -> assertThat(r.gate().status(f)).contains(BaselineStatus.PENDING_REASON));
    }

    @Test
    void defaultBaselineIsOptionalButANamedOneMustExist() {
        Path missing = base.resolve("models/atomledger-baseline.tsv");
        assertThat(gate(new GateConfig(missing, false, null, FailScope.FINDINGS)).gate().hasBaseline()).isFalse();
        assertThatThrownBy(() -> gate(new GateConfig(missing, true, null, FailScope.FINDINGS)))
                .hasMessage("models/atomledger-baseline.tsv: baseline file not found");
    }

    @Test
    void theSeverityPolicyAppliesToTheGatesOwnFindings() {
        config = config.withPolicy(io.github.atomledger.checker.engine.SeverityPolicy.of(
                java.util.Map.of("balance.regression", "warning", "model.reaction-removed", "off"), java.util.Map.of(),
                Gate.ruleIds()));
        RunResult r = gate(new GateConfig(null, false, base.resolve("target/previous"), FailScope.REGRESSIONS));
        assertThat(r.failing()).isEmpty();
        assertThat(r.allFindings()).filteredOn(f -> f.ruleId().equals("balance.regression"))
                .extracting(Finding::severity).containsOnly(Severity.WARNING).hasSize(2);
        assertThat(r.allFindings()).noneMatch(f -> f.ruleId().equals("model.reaction-removed"));
    }

    @Test
    void failingOnRegressionsNeedsPreviousModels() {
        assertThatThrownBy(() -> new GateConfig(null, false, null, FailScope.REGRESSIONS))
                .hasMessageStartingWith("failOn=regressions needs previousModels");
        assertThatThrownBy(() -> FailScope.parse("new"))
                .hasMessage("failOn: unknown value 'new'; allowed: findings, regressions");
    }
}
