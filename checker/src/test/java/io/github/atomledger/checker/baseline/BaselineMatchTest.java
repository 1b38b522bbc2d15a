package io.github.atomledger.checker.baseline;

import static io.github.atomledger.checker.baseline.FingerprintTest.finding;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.tuple;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.BaselineStatus;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class BaselineMatchTest {

    private final Finding biomass = finding("balance.elements", "R_BIOMASS", 40, "m", Map.of("delta.C", "-20"));
    private final Finding hex = finding("balance.charge", "R_HEX", 10, "m", Map.of("delta.charge", "-1"));
    private final Finding pfk = finding("balance.charge", "R_PFK", 20, "m", Map.of("delta.charge", "-1"));

    private static BaselineEntry accept(Finding f, String reason) {
        return new BaselineEntry(f.modelFile(), f.ruleId(), f.elementId(), Fingerprint.of(f), "mkrause", reason, 0);
    }

    @Test
    void marksAcceptedPendingAndNewFindings() {
        Baseline b = Baseline.of(List.of(accept(biomass, "lumped growth reaction"), accept(hex, Baseline.PLACEHOLDER_REASON)));
        BaselineMatch m = BaselineMatch.of(b, "models/atomledger-baseline.tsv", List.of(biomass, hex, pfk), List.of("models/x.xml"));
        assertThat(m.statuses()).containsExactlyInAnyOrderEntriesOf(Map.of(biomass, BaselineStatus.ACCEPTED,
                hex, BaselineStatus.PENDING_REASON, pfk, BaselineStatus.NEW));
        assertThat(m.stale()).isEmpty();
    }

    @Test
    void survivesEditsElsewhereButNotAChangeOfTheFacts() {
        Baseline b = Baseline.of(List.of(accept(biomass, "lumped")));
        Finding moved = finding("balance.elements", "R_BIOMASS", 412, "reworded", Map.of("delta.C", "-20"));
        Finding worse = finding("balance.elements", "R_BIOMASS", 40, "m", Map.of("delta.C", "-21"));
        assertThat(BaselineMatch.of(b, "b.tsv", List.of(moved), List.of("models/x.xml")).statuses())
                .containsEntry(moved, BaselineStatus.ACCEPTED);
        BaselineMatch changed = BaselineMatch.of(b, "b.tsv", List.of(worse), List.of("models/x.xml"));
        assertThat(changed.statuses()).containsEntry(worse, BaselineStatus.NEW);
        assertThat(changed.stale()).extracting(Finding::ruleId, Finding::elementId)
                .containsExactly(tuple("model.baseline-stale", "R_BIOMASS"));
    }

    @Test
    void reportsStaleEntriesOfCheckedModelsOnly() {
        BaselineEntry other = new BaselineEntry("models/other.xml", "balance.charge", "R_Y", "0000000000000000", "a", "why", 9);
        BaselineEntry gone = new BaselineEntry("models/x.xml", "balance.charge", "R_GONE", "00000000000000ff", "a", "why", 8);
        BaselineMatch m = BaselineMatch.of(Baseline.of(List.of(other, gone)), "models/atomledger-baseline.tsv", List.of(hex),
                List.of("models/x.xml"));
        assertThat(m.stale()).singleElement().satisfies(f -> {
            assertThat(f.ruleId()).isEqualTo(BaselineMatch.STALE_RULE);
            assertThat(f.severity()).isEqualTo(Severity.WARNING);
            assertThat(f.modelFile()).isEqualTo("models/x.xml");
            assertThat(f.elementId()).isEqualTo("R_GONE");
            assertThat(f.data()).containsExactlyEntriesOf(new java.util.TreeMap<>(Map.of("baselineFile",
                    "models/atomledger-baseline.tsv", "baselineLine", "8", "fingerprint", "00000000000000ff",
                    "ruleId", "balance.charge")));
        });
    }
}
