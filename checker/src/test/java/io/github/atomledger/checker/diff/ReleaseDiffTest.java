package io.github.atomledger.checker.diff;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.tuple;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.SeverityPolicy;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class ReleaseDiffTest {

    private static final CarbonTransitions STORED = new StoredTransitions(LoadOptions.DEFAULT_MAX_BYTES);

    static Path fixture(String name) {
        try {
            return Path.of(ReleaseDiffTest.class.getResource(name).toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static ModelResult checked(String name) {
        Path file = fixture(name);
        return new Engine().check(new ModelLoader(new LoadOptions(LoadOptions.DEFAULT_MAX_BYTES)).load(file, "models/x.xml"),
                SeverityPolicy.defaults());
    }

    private static List<Finding> diff(String before, String after) {
        ModelResult p = checked(before);
        ModelResult c = checked(after);
        return ReleaseDiff.compare(p, c, STORED.carbons(p, fixture(before)), STORED.carbons(c, fixture(after)));
    }

    @Test
    void reportsNothingWhenTheModelIsUnchanged() {
        assertThat(diff("release-1.xml", "release-1.xml")).isEmpty();
    }

    @Test
    void reportsEveryKindOfChangeAgainstThePreviousRelease() {
        List<Finding> found = diff("release-1.xml", "release-2.xml");
        assertThat(found).extracting(Finding::ruleId, Finding::elementId, Finding::severity).containsExactlyInAnyOrder(
                tuple("balance.regression", "R_HEX", Severity.ERROR),
                tuple("mapping.transitions-changed", "R_PGI", Severity.WARNING),
                tuple("balance.fixed", "R_PFK", Severity.INFO),
                tuple("balance.imbalance-changed", "R_G6PH", Severity.WARNING),
                tuple("model.reaction-removed", "R_FBP", Severity.WARNING),
                tuple("model.reaction-added", "R_ATPASE2", Severity.INFO),
                tuple("balance.regression", "R_ATPASE2", Severity.ERROR));
        assertThat(found).isSortedAccordingTo(Finding.ORDER);
    }

    @Test
    void regressionDataNamesTheStatesAndTheExactImbalance() {
        Finding hex = only(diff("release-1.xml", "release-2.xml"), "balance.regression", "R_HEX");
        assertThat(hex.data()).containsExactlyEntriesOf(new java.util.TreeMap<>(Map.of("class", "internal",
                "was.elements", "balanced", "was.charge", "balanced", "now.elements", "imbalanced",
                "now.charge", "imbalanced", "delta.H", "-1", "delta.charge", "-1")));
        assertThat(hex.message()).isEqualTo("Reaction R_HEX regressed: H -1, charge -1 in this release"
                + " (before: elements balanced, charge balanced).");
        Finding added = only(diff("release-1.xml", "release-2.xml"), "balance.regression", "R_ATPASE2");
        assertThat(added.data()).containsEntry("was.elements", "absent").containsEntry("delta.O", "1")
                .containsEntry("delta.charge", "-1");
    }

    @Test
    void changedImbalanceKeepsBothVectors() {
        Finding g6ph = only(diff("release-1.xml", "release-2.xml"), "balance.imbalance-changed", "R_G6PH");
        assertThat(g6ph.data()).containsEntry("delta.H", "-4").containsEntry("delta.O", "-2")
                .containsEntry("previous.delta.H", "-2").containsEntry("previous.delta.O", "-1")
                .doesNotContainKey("delta.charge");
    }

    @Test
    void listsWhichCarbonsNowGoElsewhere() {
        Finding pgi = only(diff("release-1.xml", "release-2.xml"), "mapping.transitions-changed", "R_PGI");
        assertThat(pgi.data()).containsExactlyEntriesOf(new java.util.TreeMap<>(Map.of(
                "moved", "2", "now", "mapped",
                "moved.g6p_c#1:5", "f6p_c#1:5 -> f6p_c#1:6",
                "moved.g6p_c#1:6", "f6p_c#1:6 -> f6p_c#1:5")));
        assertThat(pgi.message()).isEqualTo("Reaction R_PGI's carbon transitions changed: 2 carbons now go elsewhere"
                + " (g6p_c#1:5 to f6p_c#1:6 instead of f6p_c#1:5; g6p_c#1:6 to f6p_c#1:5 instead of f6p_c#1:6).");
    }

    @Test
    void reportsLostTransitionsWhenTheNewReleaseHasNone() {
        ModelResult p = checked("release-1.xml");
        ModelResult c = checked("release-1.xml");
        List<Finding> found = ReleaseDiff.compare(p, c, STORED.carbons(p, fixture("release-1.xml")), Map.of());
        assertThat(found).extracting(Finding::ruleId, Finding::elementId)
                .containsExactly(tuple("mapping.transitions-changed", "R_PGI"));
        assertThat(found.get(0).data()).containsEntry("now", "none").containsEntry("moved", "6");
    }

    @Test
    void aModelWithoutPreviousVersionReportsOnlyItsImbalancedReactionsAsRegressions() {
        ModelResult c = checked("release-2.xml");
        assertThat(ReleaseDiff.compare(null, c, Map.of(), Map.of())).extracting(Finding::ruleId, Finding::elementId)
                .containsExactlyInAnyOrder(tuple("balance.regression", "R_HEX"), tuple("balance.regression", "R_ATPASE2"),
                        tuple("balance.regression", "R_G6PH"));
    }

    @Test
    void transitionsAreReadFromTheAnnotations() {
        ModelResult p = checked("release-1.xml");
        assertThat(STORED.carbons(p, fixture("release-1.xml"))).containsOnlyKeys("R_PGI");
        assertThat(STORED.carbons(p, fixture("release-1.xml")).get("R_PGI")).hasSize(6);
    }

    static Finding only(List<Finding> found, String rule, String element) {
        List<Finding> matching = found.stream().filter(f -> f.ruleId().equals(rule) && f.elementId().equals(element)).toList();
        assertThat(matching).hasSize(1);
        return matching.get(0);
    }
}
