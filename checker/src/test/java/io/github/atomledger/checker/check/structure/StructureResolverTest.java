package io.github.atomledger.checker.check.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.model.CompartmentInfo;
import io.github.atomledger.checker.model.FormulaSource;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class StructureResolverTest {

    @TempDir
    Path dir;

    private static SpeciesInfo species(String id, List<String> inchis) {
        return new SpeciesInfo(id, id, "c", false, "", null, FormulaSource.NONE, null, FormulaSource.NONE, inchis, 3);
    }

    private static ModelView model(SpeciesInfo... species) {
        return new ModelView("m.xml", "m", 3, 1, 2, List.of(new CompartmentInfo("c", "cytosol")), List.of(species),
                List.of(), List.of());
    }

    private StructureTable table(String text) throws IOException {
        Path f = dir.resolve("s.tsv");
        Files.writeString(f, text);
        return StructureTable.load(f, "s.tsv");
    }

    @Test
    void prefersTheTableOverStoredStructuresAndReportsWhenTheyDisagree() throws IOException {
        // Pyruvate as the table gives it, and acetate where an old annotation stored something else.
        StructureTable t = table("species\tsmiles\npyr\tCC(=O)C([O-])=O\n");
        SpeciesStructures s = new StructureResolver().resolve(model(species("pyr", List.of())), t,
                Map.of("pyr", "CC([O-])=O"));
        assertThat(s.get("pyr").orElseThrow().source()).isEqualTo(SpeciesStructures.Source.TABLE);
        assertThat(s.problems()).extracting(SpeciesStructures.Problem::kind).containsExactly("conflict");
    }

    @Test
    void agreeingSourcesWrittenDifferentlyAreNotAConflict() throws IOException {
        StructureTable t = table("species\tsmiles\npyr\tCC(=O)C([O-])=O\n");
        SpeciesStructures s = new StructureResolver().resolve(model(species("pyr", List.of())), t,
                Map.of("pyr", "[O-]C(=O)C(C)=O"));
        assertThat(s.problems()).isEmpty();
    }

    @Test
    void reportsUnreadableSmilesAndRowsForUnknownSpecies() throws IOException {
        StructureTable t = table("species\tsmiles\npyr\tC1CC\nghost\tCCO\n");
        SpeciesStructures s = new StructureResolver().resolve(model(species("pyr", List.of())), t, Map.of());
        assertThat(s.get("pyr")).isEmpty();
        assertThat(s.problems()).extracting(SpeciesStructures.Problem::kind, SpeciesStructures.Problem::species)
                .containsExactlyInAnyOrder(org.assertj.core.groups.Tuple.tuple("invalid", "pyr"),
                        org.assertj.core.groups.Tuple.tuple("unknown-species", "ghost"));
    }

    @Test
    void tableErrorsNameFileAndLine() throws IOException {
        assertThatThrownBy(() -> table("id\tsmiles\n")).isInstanceOf(AtomLedgerException.class)
                .hasMessageStartingWith("s.tsv:1: the header needs a 'species' column");
        assertThatThrownBy(() -> table("species\tsmiles\na\tC\na\tCC\n")).hasMessage("s.tsv:3: species a is listed twice (first at line 2)");
        assertThat(table("species\tsmiles\nb\t\n").entries()).isEmpty();
    }
}
