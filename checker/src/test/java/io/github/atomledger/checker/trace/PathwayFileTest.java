package io.github.atomledger.checker.trace;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.AtomLedgerException;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading pathways and fates files: what they say, and errors that name the file and line. */
class PathwayFileTest {

    @TempDir
    Path dir;

    private Path file(String text) throws IOException {
        return Files.writeString(dir.resolve("f.tsv"), text);
    }

    @Test
    void readsStepsDirectionsAndTheOptionalModelColumn() throws IOException {
        List<Pathway> p = PathwayFile.read(file("# comment\nPathway\tsource\tsteps\tmodel\n"
                + "leucine\tleu_c\tR_A  -R_B R_C\t\n\nother\tx\tR_D\tmodels/b.xml\n"), "models/pathways.tsv");
        assertThat(p).hasSize(2);
        assertThat(p.get(0).steps()).containsExactly(new Step("R_A", false), new Step("R_B", true), new Step("R_C", false));
        assertThat(p.get(0).where()).isEqualTo("models/pathways.tsv:3");
        assertThat(p.get(0).appliesTo("models/a.xml", true)).isTrue();
        assertThat(p.get(0).appliesTo("models/a.xml", false)).isFalse();
        assertThat(p.get(1).appliesTo("models/a.xml", true)).isFalse();
        assertThat(p.get(1).appliesTo("models/b.xml", false)).isTrue();
    }

    @Test
    void namesTheFileAndLineOfABadPathway() throws IOException {
        assertThatThrownBy(() -> PathwayFile.read(file("pathway\tsource\n"), "p.tsv"))
                .isInstanceOf(AtomLedgerException.class).hasMessageContaining("p.tsv:1: the header needs")
                .hasMessageContaining("'steps' is missing");
        assertThatThrownBy(() -> PathwayFile.read(file("pathway\tsource\tsteps\nx\ty\t\n"), "p.tsv"))
                .hasMessage("p.tsv:2: pathway x has no steps");
        assertThatThrownBy(() -> PathwayFile.read(file("pathway\tsource\tsteps\nx\ty\t- R_A\n"), "p.tsv"))
                .hasMessageStartingWith("p.tsv:2: a lone '-'");
        assertThatThrownBy(() -> PathwayFile.read(file("pathway\tsource\tsteps\nx\ty\tR\nx\tz\tR\n"), "p.tsv"))
                .hasMessage("p.tsv:3: pathway x is defined twice (first at line 2)");
        assertThatThrownBy(() -> PathwayFile.read(dir.resolve("none.tsv"), "none.tsv"))
                .hasMessage("none.tsv: pathways file not found");
    }

    @Test
    void readsFatesAndRefusesUnknownPathwaysAndBadFates() throws IOException {
        List<FateExpectation> f = FateFile.read(file("pathway\tcarbon\tfate\nleu\tC1\tco2_c\nleu\tC5\tacac_c:C4\n"),
                "models/fates.tsv", Set.of("leu"));
        assertThat(f).extracting(FateExpectation::fateText).containsExactly("co2_c", "acac_c:C4");
        assertThat(f.get(1).where()).isEqualTo("models/fates.tsv:3");
        assertThatThrownBy(() -> FateFile.read(file("pathway\tcarbon\tfate\nile\tC1\tco2_c\n"), "f.tsv", Set.of("leu")))
                .hasMessage("f.tsv:2: pathway ile is not defined in the pathways file (defined: leu)");
        assertThatThrownBy(() -> FateFile.read(file("pathway\tcarbon\tfate\nleu\tC1\tco2_c:\n"), "f.tsv", Set.of("leu")))
                .hasMessage("f.tsv:2: the fate 'co2_c:' is not 'species' or 'species:position'");
        assertThatThrownBy(() -> FateFile.read(file("pathway\tcarbon\tfate\nleu\tC1\tco2_c\nleu\tC1\tx\n"), "f.tsv",
                Set.of("leu"))).hasMessage("f.tsv:3: carbon C1 of pathway leu has an expectation already (line 2)");
    }
}
