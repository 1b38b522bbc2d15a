package io.github.atomledger.checker.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.TestModels;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The structure side table: header, rows, comments, and errors with file and line. */
class StructureTableTest {

    @TempDir
    Path tmp;

    @Test
    void readsSpeciesAndSmilesInFileOrderSkippingCommentsBlanksAndEmptyCells() {
        Map<String, StructureTable.Entry> t = StructureTable.load(TestModels.fixture("structure/formula-vs-structure.tsv"));
        assertThat(t.keySet()).containsExactly("M_pyr_c", "M_glc_c", "M_ac_c", "M_pyr2_c", "M_bad_c", "M_poly_c");
        assertThat(t.get("M_pyr_c")).isEqualTo(new StructureTable.Entry("M_pyr_c", "CC(=O)C(=O)O", StructureTable.Kind.SMILES, 3));
    }

    @Test
    void acceptsAnInchiColumnAndPrefersSmilesWhenBothAreGiven() throws IOException {
        Path f = tmp.resolve("s.tsv");
        Files.writeString(f, "Species\tInChI\tSMILES\nA\tInChI=1S/H2O/h1H2\t\nB\tInChI=1S/H2O/h1H2\tO\n");
        Map<String, StructureTable.Entry> t = StructureTable.load(f);
        assertThat(t.get("A").kind()).isEqualTo(StructureTable.Kind.INCHI);
        assertThat(t.get("B").kind()).isEqualTo(StructureTable.Kind.SMILES);
        assertThat(t.get("B").text()).isEqualTo("O");
    }

    @Test
    void parsesThroughAtomMapper() throws Exception {
        Map<String, StructureTable.Entry> t = StructureTable.load(TestModels.fixture("structure/formula-vs-structure.tsv"));
        // Pyruvic acid C3H4O3 (ChEBI, from memory).
        assertThat(t.get("M_pyr_c").parse().formula().toHillString()).isEqualTo("C3H4O3");
        assertThat(t.get("M_pyr2_c").parse().charge()).isEqualTo(-1);
    }

    @Test
    void namesFileAndLineOfABadHeader() throws IOException {
        Path f = tmp.resolve("bad.tsv");
        Files.writeString(f, "id,smiles\nA,O\n");
        assertThatThrownBy(() -> StructureTable.load(f, "models/bad.tsv")).isInstanceOf(AtomLedgerException.class)
                .hasMessageStartingWith("models/bad.tsv:1: the header must name");
    }

    @Test
    void namesTheLineOfADuplicateOrIncompleteRow() throws IOException {
        Path dup = tmp.resolve("dup.tsv");
        Files.writeString(dup, "species\tsmiles\nA\tO\nA\tC\n");
        assertThatThrownBy(() -> StructureTable.load(dup, "dup.tsv")).isInstanceOf(AtomLedgerException.class)
                .hasMessage("dup.tsv:3: species 'A' is listed twice (first on line 2)");
        Path shortRow = tmp.resolve("short.tsv");
        Files.writeString(shortRow, "smiles\tspecies\nO\n");
        assertThatThrownBy(() -> StructureTable.load(shortRow, "short.tsv")).isInstanceOf(AtomLedgerException.class)
                .hasMessage("short.tsv:2: expected 2 tab-separated columns, found 1");
        Path noSpecies = tmp.resolve("nospecies.tsv");
        Files.writeString(noSpecies, "species\tsmiles\n\tO\n");
        assertThatThrownBy(() -> StructureTable.load(noSpecies, "nospecies.tsv")).hasMessage("nospecies.tsv:2: the species column is empty");
    }

    @Test
    void reportsAMissingFile() {
        assertThatThrownBy(() -> StructureTable.load(tmp.resolve("none.tsv"), "none.tsv")).isInstanceOf(AtomLedgerException.class)
                .hasMessage("none.tsv: structure table not found");
    }
}
