package io.github.atomledger.checker.baseline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.AtomLedgerException;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BaselineTest {

    @TempDir
    Path dir;

    private static BaselineEntry entry(String file, String rule, String element, String fp, String reason) {
        return new BaselineEntry(file, rule, element, fp, "mkrause", reason, 0);
    }

    @Test
    void writesSortedEntriesAfterTheHeaderAndReadsThemBack() throws Exception {
        Baseline b = Baseline.of(List.of(
                entry("models/z.xml", "balance.elements", "R_BIOMASS", "0000000000000002", "lumped growth reaction"),
                entry("models/a.xml", "balance.polymer", "R_GLYCOGEN", "0000000000000001", "glycogen\tis a polymer")));
        String text = b.format();
        List<String> lines = text.lines().filter(l -> !l.startsWith("#")).toList();
        assertThat(lines).containsExactly(Baseline.HEADER,
                "models/a.xml\tbalance.polymer\tR_GLYCOGEN\t0000000000000001\tmkrause\tglycogen is a polymer",
                "models/z.xml\tbalance.elements\tR_BIOMASS\t0000000000000002\tmkrause\tlumped growth reaction");
        assertThat(text).endsWith("\n").doesNotContain("\r");
        Path file = dir.resolve("baseline.tsv");
        b.write(file);
        assertThat(Files.readString(file, StandardCharsets.UTF_8)).isEqualTo(text);
        Baseline back = Baseline.read(file, "models/atomledger-baseline.tsv");
        assertThat(back.format()).isEqualTo(text);
        assertThat(back.entries()).extracting(BaselineEntry::line).containsExactly(7, 8);
    }

    @Test
    void placeholderOrEmptyReasonIsNoReason() {
        assertThat(entry("m", "balance.charge", "R", "0000000000000000", Baseline.PLACEHOLDER_REASON).hasReason()).isFalse();
        assertThat(entry("m", "balance.charge", "R", "0000000000000000", "  ").hasReason()).isFalse();
        assertThat(entry("m", "balance.charge", "R", "0000000000000000", "TODO").hasReason()).isFalse();
        assertThat(entry("m", "balance.charge", "R", "0000000000000000", "proton pool lumped").hasReason()).isTrue();
    }

    @Test
    void acceptsAMissingReasonColumnAndCrLfLineEnds() {
        Baseline b = Baseline.parse("# c\r\n" + Baseline.HEADER + "\r\nmodels/a.xml\tbalance.charge\tR_X\t00000000000000ab\tana\r\n", "b.tsv");
        assertThat(b.entries()).singleElement().satisfies(e -> {
            assertThat(e.reason()).isEmpty();
            assertThat(e.acceptedBy()).isEqualTo("ana");
            assertThat(e.line()).isEqualTo(3);
        });
    }

    @Test
    void rejectsAMissingHeaderNamingTheLine() {
        assertThatThrownBy(() -> Baseline.parse("# comment\nmodels/a.xml\tbalance.charge\tR\t0000000000000000\tx\ty\n", "b.tsv"))
                .isInstanceOf(AtomLedgerException.class).hasMessageStartingWith("b.tsv:2: expected the column header");
    }

    @Test
    void rejectsMalformedEntriesNamingFileLineAndProblem() {
        String head = Baseline.HEADER + "\n";
        assertThatThrownBy(() -> Baseline.parse(head + "models/a.xml\tbalance.charge\tR\n", "b.tsv"))
                .hasMessage("b.tsv:2: expected 6 tab-separated fields (model rule element fingerprint acceptedBy reason), found 3");
        assertThatThrownBy(() -> Baseline.parse(head + "models/a.xml\tbalance.charge\tR\tXYZ\tx\ty\n", "b.tsv"))
                .hasMessage("b.tsv:2: 'XYZ' is not a fingerprint (16 lower-case hex digits)");
        assertThatThrownBy(() -> Baseline.parse(head + "models/a.xml\tCharge\tR\t0000000000000000\tx\ty\n", "b.tsv"))
                .hasMessage("b.tsv:2: 'Charge' is not a rule id (<area>.<kebab-name>)");
        assertThatThrownBy(() -> Baseline.parse(head + "models/a.xml\tbalance.charge\tR\t0000000000000000\tx\ty\n"
                + "models/a.xml\tbalance.charge\tR\t0000000000000000\tz\tw\n", "b.tsv"))
                .hasMessage("b.tsv:3: duplicate of the entry on line 2 (balance.charge R)");
    }

    @Test
    void rejectsAFileThatIsNotUtf8() throws Exception {
        Path file = dir.resolve("b.tsv");
        Files.write(file, new byte[] {(byte) 0xff, (byte) 0xfe, 'a'});
        assertThatThrownBy(() -> Baseline.read(file, "b.tsv")).hasMessage("b.tsv: the baseline file is not UTF-8 text");
        assertThatThrownBy(() -> Baseline.read(dir.resolve("none.tsv"), "none.tsv")).hasMessage("none.tsv: baseline file not found");
    }
}
