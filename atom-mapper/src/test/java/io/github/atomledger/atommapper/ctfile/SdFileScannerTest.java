package io.github.atomledger.atommapper.ctfile;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.GZIPInputStream;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.io.iterator.IteratingSDFReader;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.tools.manipulator.MolecularFormulaManipulator;

/**
 * Issue 15: SD files (CTfile standard; the layout of the public ChEBI dump, from memory: a blank
 * name line, the program line, data items {@code > <ChEBI ID>} with values such as
 * {@code CHEBI:15361}). CDK's {@code IteratingSDFReader} is the reference for what a record holds.
 */
class SdFileScannerTest {

    static String record(String id, String body, String name) {
        return "\n  hand      2D\n\n" + body + "> <ChEBI ID>\n" + id + "\n\n> <ChEBI Name>\n" + name + "\n\n$$$$\n";
    }

    /** Carbon dioxide, O=C=O (from memory). */
    static final String CO2 = """
              3  2  0  0  0  0  0  0  0  0999 V2000
                0.0000    0.0000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
                1.2000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                2.4000    0.0000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
              1  2  2  0  0  0  0
              2  3  2  0  0  0  0
            M  END
            """.stripIndent();

    /** Pyruvate, CH3-CO-COO(-) (from memory). */
    static final String PYRUVATE = """
              6  5  0  0  0  0  0  0  0  0999 V2000
                0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                1.2990    0.7500    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                1.2990    2.2500    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
                2.5981    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                2.5981   -1.5000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
                3.8971    0.7500    0.0000 O   0  5  0  0  0  0  0  0  0  0  0  0
              1  2  1  0  0  0  0
              2  3  2  0  0  0  0
              2  4  1  0  0  0  0
              4  5  2  0  0  0  0
              4  6  1  0  0  0  0
            M  CHG  1   6  -1
            M  END
            """.stripIndent();

    /** Water, one oxygen (from memory). */
    static final String WATER = """
              1  0  0  0  0  0  0  0  0  0999 V2000
                0.0000    0.0000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
            M  END
            """.stripIndent();

    private static List<SdFileScanner.Record> scan(byte[] bytes, String field) throws IOException {
        List<SdFileScanner.Record> out = new ArrayList<>();
        SdFileScanner.scan(new ByteArrayInputStream(bytes), field, out::add);
        return out;
    }

    @Test
    void indexesRecordsWithBlankNameLinesAndFindsThemAgainByOffset() throws Exception {
        String text = record("CHEBI:16526", CO2, "carbon dioxide") + record("CHEBI:15377", WATER, "water") + "\n\n";
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        List<SdFileScanner.Record> records = scan(bytes, "ChEBI ID");
        assertThat(records).extracting(SdFileScanner.Record::values).containsExactly(List.of("CHEBI:16526"), List.of("CHEBI:15377"));
        assertThat(records).extracting(SdFileScanner.Record::problem).containsOnlyNulls();
        assertThat(records.get(0).line()).isEqualTo(1);
        assertThat(records.get(1).line()).isEqualTo(text.substring(0, text.indexOf("$$$$") + 5).lines().count() + 1);
        SdFileScanner.Record water = records.get(1);
        String again = new String(bytes, (int) water.offset(), (int) water.length(), StandardCharsets.UTF_8);
        Structure s = Structure.fromMolfile(SdFileScanner.molfilePart(again));
        assertThat(s.formula().toHillString()).isEqualTo("H2O");
    }

    @Test
    void recordsWithoutTheFieldOrWithoutMolfileEndAreNamed() throws IOException {
        String noId = "\n  hand\n\n" + WATER + "> <ChEBI Name>\nwater\n\n$$$$\n";
        String noEnd = "\n  hand\n\n" + WATER.replace("M  END\n", "") + "> <ChEBI ID>\nCHEBI:1\n\n$$$$\n";
        List<SdFileScanner.Record> records = scan((noId + noEnd + record("CHEBI:2", WATER, "w"))
                .getBytes(StandardCharsets.UTF_8), "ChEBI ID");
        assertThat(records).extracting(SdFileScanner.Record::problem)
                .containsExactly("no data item 'ChEBI ID'", "the molfile part has no 'M  END' line", null);
        assertThat(records).extracting(SdFileScanner.Record::number).containsExactly(1, 2, 3);
    }

    @Test
    void readsCrLfLinesAndALastRecordWithoutTerminator() throws IOException {
        String text = (record("CHEBI:16526", CO2, "carbon dioxide") + record("CHEBI:15377", WATER, "water"))
                .replace("\n", "\r\n");
        text = text.substring(0, text.length() - "$$$$\r\n".length());
        List<SdFileScanner.Record> records = scan(text.getBytes(StandardCharsets.UTF_8), "ChEBI ID");
        assertThat(records).extracting(SdFileScanner.Record::values).containsExactly(List.of("CHEBI:16526"), List.of("CHEBI:15377"));
        assertThat(records.get(1).offset() + records.get(1).length()).isEqualTo(text.getBytes(StandardCharsets.UTF_8).length);
    }

    @Test
    void agreesWithCdksSdReaderOnRecordsAndFormulasThroughGzip() throws Exception {
        String text = record("CHEBI:16526", CO2, "carbon dioxide") + record("CHEBI:15377", WATER, "water")
                + record("CHEBI:15361", PYRUVATE, "pyruvate");
        ByteArrayOutputStream gz = new ByteArrayOutputStream();
        try (GZIPOutputStream out = new GZIPOutputStream(gz)) {
            out.write(text.getBytes(StandardCharsets.UTF_8));
        }
        List<SdFileScanner.Record> records = new ArrayList<>();
        SdFileScanner.scan(new GZIPInputStream(new ByteArrayInputStream(gz.toByteArray())), "ChEBI ID", records::add);
        List<String> cdkIds = new ArrayList<>();
        List<String> cdkFormulas = new ArrayList<>();
        try (IteratingSDFReader reader = new IteratingSDFReader(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)),
                SilentChemObjectBuilder.getInstance())) {
            while (reader.hasNext()) {
                IAtomContainer m = reader.next();
                cdkIds.add(m.getProperty("ChEBI ID"));
                cdkFormulas.add(MolecularFormulaManipulator.getString(MolecularFormulaManipulator.getMolecularFormula(m)));
            }
        }
        assertThat(records).extracting(r -> r.values().get(0)).containsExactlyElementsOf(cdkIds);
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        List<String> ours = new ArrayList<>();
        for (SdFileScanner.Record r : records) {
            Structure s = molecule(new String(bytes, (int) r.offset(), (int) r.length(), StandardCharsets.UTF_8));
            ours.add(s.charge() == 0 ? s.formula().toHillString() : "[" + s.formula().toHillString() + "]-");
        }
        assertThat(ours).containsExactlyElementsOf(cdkFormulas);
    }

    private static Structure molecule(String record) throws StructureException {
        return Structure.fromMolfile(SdFileScanner.molfilePart(record));
    }
}
