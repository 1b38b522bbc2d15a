package io.github.atomledger.checker.check.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static io.github.atomledger.checker.SourceFixtures.ADP;
import static io.github.atomledger.checker.SourceFixtures.ATP;
import static io.github.atomledger.checker.SourceFixtures.PEP;
import static io.github.atomledger.checker.SourceFixtures.PYRUVIC_ACID;
import static io.github.atomledger.checker.SourceFixtures.molfile;
import static io.github.atomledger.checker.SourceFixtures.record;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.SourceFixtures;
import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.model.ModelView;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import java.util.Map;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15: structures from SD files, molfile directories and cross-reference tables, resolved
 * through the species' MIRIAM cross-references, and their place in the order of precedence. The
 * model is {@code structure/sources/cross-references.xml}; structures are SMILES from memory
 * (charged forms at pH 7 as ChEBI gives them), written into molfiles by CDK's writer. The SD
 * files follow the layout of the public ChEBI dump (from memory): a blank name line, data items
 * {@code > <ChEBI ID>} and {@code > <ChEBI Name>}, {@code $$$$}.
 */
class StructureSourcesTest {

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        return SourceFixtures.write(dir, name, text);
    }

    private Path chebiSd() throws IOException {
        return SourceFixtures.chebiSd(dir);
    }

    private StructureLibrary library(Path... files) {
        return StructureLibrary.load(List.of(files), dir, SdFile.DEFAULT_ID_FIELD, dir.resolve("cache"));
    }

    private static ModelView model() {
        return TestModels.load("structure/sources/cross-references.xml");
    }

    @Test
    void theLoaderKeepsIsCrossReferencesAsWrittenAndTheNotes() {
        ModelView m = model();
        assertThat(m.species("M_pep_c").orElseThrow().references()).containsExactly(
                "https://identifiers.org/kegg.compound:C00074", "urn:miriam:chebi:CHEBI%3A58702");
        assertThat(m.species("M_h_c").orElseThrow().references())
                .containsExactly("http://identifiers.org/inchi_key/GPRLSGONYQIRFK-UHFFFAOYSA-N");
        assertThat(m.species("M_2pg_c").orElseThrow().notes()).containsEntry("SMILES", "OC[C@H](OP([O-])([O-])=O)C([O-])=O");
    }

    @Test
    void resolvesSpeciesThroughCrossReferencesInAnSdFileAMolfileDirectoryAndATable() throws IOException {
        Path sd = chebiSd();
        write("mol/MNXM7.mol", molfile(ADP));
        write("mol/unrelated.mol", molfile("CCO"));
        Path table = write("lab.tsv", "inchikey\tsmiles\nGPRLSGONYQIRFK-UHFFFAOYSA-N\t[H+]\n");
        SpeciesStructures s = new StructureResolver().resolve(model(), library(sd, dir.resolve("mol"), table), Map.of());

        assertThat(s.problems()).isEmpty();
        assertThat(s.get("M_pep_c").orElseThrow().origin()).isEqualTo("chebi.sdf record 1 (line 1), chebi:CHEBI:58702");
        assertThat(s.get("M_adp_c").orElseThrow().origin()).isEqualTo("mol/MNXM7.mol, metanetx.chemical:MNXM7");
        assertThat(s.get("M_atp_c").orElseThrow().structure().formula().toHillString()).isEqualTo("C10H12N5O13P3");
        assertThat(s.get("M_h_c").orElseThrow().origin()).isEqualTo("lab.tsv:2, inchikey:GPRLSGONYQIRFK-UHFFFAOYSA-N");
        // The acid is listed first, but the anion matches the declared C3H3O3 and charge -1.
        assertThat(s.get("M_pyr_c").orElseThrow().origin()).contains("chebi:CHEBI:15361");
        assertThat(List.of("M_pep_c", "M_adp_c", "M_atp_c", "M_pyr_c", "M_h_c"))
                .allSatisfy(id -> assertThat(s.get(id).orElseThrow().source()).isEqualTo(SpeciesStructures.Source.CROSS_REFERENCE));
        assertThat(s.get("M_h2o_c").orElseThrow().source()).isEqualTo(SpeciesStructures.Source.NOTES);
        assertThat(s.get("M_2pg_c").orElseThrow().text()).isEqualTo("OC[C@H](OP([O-])([O-])=O)C([O-])=O");
        assertThat(s.get("M_acp_c")).isEmpty();
        assertThat(s.get("M_x_c")).isEmpty();
    }

    @Test
    void filesKeyedBySpeciesComeBeforeNotesAndNotesBeforeCrossReferences() throws IOException {
        // The table keys M_2pg_c by id with a different (neutral) drawing: the table wins over the
        // notes; the SD file's pyruvic acid keyed by species id wins over the cross-referenced anion.
        Path table = write("model.tsv", "species\tsmiles\nM_2pg_c\tOCC(OP(O)(O)=O)C(O)=O\n");
        Path sd = write("by-id.sdf", record("M_pyr_c", molfile(PYRUVIC_ACID), "pyruvic acid"));
        SpeciesStructures s = new StructureResolver().resolve(model(), library(table, sd, chebiSd()), Map.of());
        assertThat(s.get("M_2pg_c").orElseThrow().source()).isEqualTo(SpeciesStructures.Source.TABLE);
        assertThat(s.get("M_pyr_c").orElseThrow().source()).isEqualTo(SpeciesStructures.Source.SD_FILE);
        assertThat(s.problems()).extracting(SpeciesStructures.Problem::species, SpeciesStructures.Problem::kind,
                        p -> p.source().label())
                .containsExactlyInAnyOrder(org.assertj.core.groups.Tuple.tuple("M_2pg_c", "conflict", "notes"),
                        org.assertj.core.groups.Tuple.tuple("M_pyr_c", "conflict", "cross-reference"));
    }

    @Test
    void aBrokenRecordIsNamedByFileRecordAndLineAndTheRestStillResolves() throws IOException {
        String broken = molfile(ATP).replaceFirst("(?m)^(\\s*1\\s+2\\s+)", "  1 99  ");
        String text = record("CHEBI:58702", molfile(PEP), "phosphoenolpyruvate") + record("CHEBI:30616", broken, "ATP(4-)")
                + "\n  hand\n\n" + molfile("O").lines().skip(3).reduce("", (a, b) -> a + b + "\n") + "> <ChEBI Name>\nwater\n\n$$$$\n";
        Path sd = write("broken.sdf", text);
        SpeciesStructures s = new StructureResolver().resolve(model(), library(sd), Map.of());
        long atpStart = text.substring(0, text.indexOf("$$$$") + 5).lines().count() + 1;
        SpeciesStructures.Problem p = s.problems().stream().filter(x -> x.kind().equals("invalid")).findFirst().orElseThrow();
        assertThat(p.species()).isEqualTo("M_atp_c");
        assertThat(p.origin()).isEqualTo("broken.sdf record 2 (line " + atpStart + ")");
        assertThat(p.message()).startsWith("broken.sdf record 2 (line " + atpStart + "), line ").contains("joins atoms 1 and 99");
        assertThat(s.get("M_pep_c")).isPresent();
        SpeciesStructures.Problem unusable = s.problems().stream().filter(x -> x.kind().equals("unusable-record")).findFirst()
                .orElseThrow();
        assertThat(unusable.origin()).startsWith("broken.sdf record 3 (line ");
        assertThat(unusable.message()).isEqualTo("no data item 'ChEBI ID'");
    }

    @Test
    void theSdIndexIsBuiltOnceThenReadFromTheCacheUntilTheFileChanges() throws IOException {
        Path sd = chebiSd();
        Path cache = dir.resolve("cache");
        assertThat(SdFile.load(sd, "chebi.sdf", SdFile.DEFAULT_ID_FIELD, cache).indexFromCache()).isFalse();
        SdFile again = SdFile.load(sd, "chebi.sdf", SdFile.DEFAULT_ID_FIELD, cache);
        assertThat(again.indexFromCache()).isTrue();
        assertThat(again.recordCount()).isEqualTo(4);
        Files.writeString(sd, Files.readString(sd) + record("CHEBI:15377", molfile("O"), "water"));
        Files.setLastModifiedTime(sd, FileTime.fromMillis(Files.getLastModifiedTime(sd).toMillis() + 2000));
        SdFile changed = SdFile.load(sd, "chebi.sdf", SdFile.DEFAULT_ID_FIELD, cache);
        assertThat(changed.indexFromCache()).isFalse();
        assertThat(changed.recordCount()).isEqualTo(5);
    }

    @Test
    void gzipSdFilesAndFilesWithoutATellingNameAreReadByContent() throws IOException {
        Path gz = dir.resolve("chebi.sdf.gz");
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(gz))) {
            out.write(Files.readAllBytes(chebiSd()));
        }
        Path noName = write("structures.dat", Files.readString(dir.resolve("chebi.sdf")));
        for (Path p : List.of(gz, noName)) {
            SpeciesStructures s = new StructureResolver().resolve(model(), library(p), Map.of());
            assertThat(s.get("M_atp_c")).as(p.toString()).isPresent();
            assertThat(s.get("M_pyr_c").orElseThrow().origin()).contains("record 4");
        }
        Path unknown = write("notes.txt", "just words\n");
        assertThatThrownBy(() -> library(unknown)).isInstanceOf(AtomLedgerException.class)
                .hasMessageContaining("notes.txt: cannot tell the format");
        assertThatThrownBy(() -> library(write("bad.tsv", "chebi\tsmiles\nfoo\tC\n")))
                .hasMessage("bad.tsv:2: 'foo' in column chebi is not a chebi id");
    }
}
