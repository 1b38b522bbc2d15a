package io.github.atomledger.checker.baseline;

import static io.github.atomledger.checker.baseline.FingerprintTest.finding;
import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class BaselineUpdateTest {

    private final Finding hex = finding("balance.charge", "R_HEX", 10, "m", Map.of("delta.charge", "-1"));
    private final Finding pfk = finding("balance.charge", "R_PFK", 20, "m", Map.of("delta.charge", "-1"));
    private final Finding note = new Finding("balance.exempt", Severity.INFO, "models/x.xml", "R_EX", 30, "m",
            new java.util.TreeMap<>());

    @Test
    void keepsReasonsAddsPlaceholdersAndDropsStaleEntriesOfCheckedModels() {
        BaselineEntry kept = new BaselineEntry("models/x.xml", "balance.charge", "R_HEX", Fingerprint.of(hex), "ana",
                "proton lumped on purpose", 7);
        BaselineEntry stale = new BaselineEntry("models/x.xml", "balance.elements", "R_OLD", "0000000000000001", "ana", "x", 8);
        BaselineEntry elsewhere = new BaselineEntry("models/y.xml", "balance.elements", "R_Y", "0000000000000002", "ana", "y", 9);
        BaselineUpdate u = BaselineUpdate.of(Baseline.of(List.of(kept, stale, elsewhere)), List.of(pfk, hex, note),
                List.of("models/x.xml"), Severity.ERROR, "mkrause");
        assertThat(u.kept()).containsExactly(kept);
        assertThat(u.removed()).containsExactly(stale);
        assertThat(u.added()).singleElement().satisfies(e -> {
            assertThat(e.elementId()).isEqualTo("R_PFK");
            assertThat(e.acceptedBy()).isEqualTo("mkrause");
            assertThat(e.reason()).isEqualTo(Baseline.PLACEHOLDER_REASON);
        });
        assertThat(u.baseline().entries()).extracting(BaselineEntry::elementId, BaselineEntry::reason).containsExactly(
                org.assertj.core.api.Assertions.tuple("R_HEX", "proton lumped on purpose"),
                org.assertj.core.api.Assertions.tuple("R_PFK", Baseline.PLACEHOLDER_REASON),
                org.assertj.core.api.Assertions.tuple("R_Y", "y"));
    }

    @Test
    void updatingTwiceGivesTheSameBytes() {
        BaselineUpdate first = BaselineUpdate.of(Baseline.empty(), List.of(pfk, hex), List.of("models/x.xml"), Severity.ERROR, "a");
        Baseline reread = Baseline.parse(first.baseline().format(), "b.tsv");
        BaselineUpdate second = BaselineUpdate.of(reread, List.of(hex, pfk), List.of("models/x.xml"), Severity.ERROR, "b");
        assertThat(second.baseline().format()).isEqualTo(first.baseline().format());
        assertThat(second.added()).isEmpty();
        assertThat(second.kept()).hasSize(2);
    }

    @Test
    void keepsAnExistingEntryWhoseFindingIsNowBelowTheThreshold() {
        BaselineEntry e = new BaselineEntry("models/x.xml", "balance.exempt", "R_EX", Fingerprint.of(note), "ana", "ok", 7);
        BaselineUpdate u = BaselineUpdate.of(Baseline.of(List.of(e)), List.of(note), List.of("models/x.xml"), Severity.ERROR, "b");
        assertThat(u.kept()).containsExactly(e);
        assertThat(u.removed()).isEmpty();
    }
}
