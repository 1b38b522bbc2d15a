package io.github.atomledger.checker.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.TestModels;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.zip.GZIPOutputStream;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * ModelLoader: formulas, charges and stoichiometry texts exactly as written, lines, gzip, errors, and what
 * JSBML is not shown still reaching the view (issue 8).
 */
class ModelLoaderTest {

    @TempDir
    Path tmp;

    @Test
    void readsLevel2FormulaAndChargeFromNotesAndTheChargeAttribute() {
        ModelView m = TestModels.load("model/level2-notes.xml");
        SpeciesInfo g6p = m.species("M_g6p_c").orElseThrow();
        assertThat(g6p.formulaText()).isEqualTo("C6H11O9P");
        assertThat(g6p.formulaSource()).isEqualTo(FormulaSource.NOTES);
        assertThat(g6p.chargeText()).isEqualTo("-2");
        assertThat(g6p.chargeSource()).isEqualTo(FormulaSource.NOTES);
        SpeciesInfo f6p = m.species("M_f6p_c").orElseThrow();
        assertThat(f6p.formulaText()).as("'Formula : x' spelling").isEqualTo("C6H11O9P");
        assertThat(f6p.chargeSource()).isEqualTo(FormulaSource.SBML_CHARGE_ATTRIBUTE);
        assertThat(f6p.inchis()).containsExactly("InChI=1S/C6H13O9P/c7-2-6(10)5(9)4(8)3(15-6)1-14-16(11,12)13");
        SpeciesInfo x = m.species("M_x_c").orElseThrow();
        assertThat(x.formulaText()).as("an empty FORMULA line means none").isNull();
        assertThat(x.formulaSource()).isEqualTo(FormulaSource.NONE);
        assertThat(m.reactions().get(0).reactants().get(0).stoichiometryText()).as("Level 2 default").isEqualTo("1");
        assertThat(m.level()).isEqualTo(2);
        assertThat(m.fbcVersion()).isZero();
    }

    @Test
    void recordsTheLineOfEverySpeciesReactionAndReference() throws IOException {
        ModelView m = TestModels.load("model/level2-notes.xml");
        List<String> lines = Files.readAllLines(TestModels.fixture("model/level2-notes.xml"));
        assertThat(lines.get(m.species("M_f6p_c").orElseThrow().line() - 1)).contains("<species id=\"M_f6p_c\"");
        ReactionInfo x = m.reactions().get(1);
        assertThat(lines.get(x.line() - 1)).contains("<reaction id=\"R_X\"");
        assertThat(lines.get(x.products().get(0).line() - 1)).contains("species=\"M_x_c\" stoichiometry=\"2\"");
    }

    @Test
    void keepsEveryFbcVersion3FormulaAndDecimalCharge() throws IOException {
        ModelView m = TestModels.load("model/fbc3-decimal.xml");
        assertThat(m.fbcVersion()).isEqualTo(3);
        // Independent of the loader: every fbc:charge / fbc:chemicalFormula attribute of the file.
        String xml = Files.readString(TestModels.fixture("model/fbc3-decimal.xml"));
        Map<String, String> charges = attributes(xml, "fbc:charge");
        Map<String, String> formulas = attributes(xml, "fbc:chemicalFormula");
        assertThat(charges).hasSize(8).containsEntry("M_a_c", "-0.5").containsEntry("M_p_c", "0.633");
        assertThat(formulas).containsEntry("M_glycogen_c", "(C6H10O5)n").containsEntry("M_p_c", "RH");
        assertThat(m.species().stream().collect(Collectors.toMap(SpeciesInfo::id, SpeciesInfo::chargeText))).isEqualTo(charges);
        assertThat(m.species().stream().collect(Collectors.toMap(SpeciesInfo::id, SpeciesInfo::formulaText))).isEqualTo(formulas);
        assertThat(m.species()).allSatisfy(s -> assertThat(s.chargeSource()).isEqualTo(FormulaSource.FBC));
    }

    private static Map<String, String> attributes(String xml, String attribute) {
        Map<String, String> out = new java.util.TreeMap<>();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("<species id=\"([^\"]+)\"[^>]*?" + attribute + "=\"([^\"]*)\"").matcher(xml);
        while (m.find()) {
            out.put(m.group(1), m.group(2));
        }
        return out;
    }

    @Test
    void readsGzipCompressedModelsTheSameWay() throws IOException {
        Path gz = tmp.resolve("m.xml.gz");
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(gz))) {
            out.write(Files.readAllBytes(TestModels.fixture("model/fbc3-decimal.xml")));
        }
        ModelView plain = TestModels.load("model/fbc3-decimal.xml");
        ModelView zipped = new ModelLoader(LoadOptions.defaults()).load(gz, "m.xml.gz");
        assertThat(zipped.species()).isEqualTo(plain.species());
        assertThat(zipped.reactions()).isEqualTo(plain.reactions());
    }

    @Test
    void stopsAtTheDecompressedSizeCap() throws IOException {
        Path gz = tmp.resolve("big.xml.gz");
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(gz))) {
            out.write(Files.readAllBytes(TestModels.fixture("model/fbc3-decimal.xml")));
        }
        assertThatThrownBy(() -> new ModelLoader(new LoadOptions(1000)).load(gz, "big.xml.gz"))
                .isInstanceOf(AtomLedgerException.class).hasMessageContaining("big.xml.gz").hasMessageContaining("cap of 1000 bytes");
    }

    @Test
    void namesFileAndLineForMalformedXml() throws IOException {
        Path bad = tmp.resolve("bad.xml");
        Files.writeString(bad, "<?xml version=\"1.0\"?>\n<sbml xmlns=\"http://www.sbml.org/sbml/level3/version1/core\" level=\"3\" version=\"1\">\n<model id=\"m\">\n</sbml>\n",
                StandardCharsets.UTF_8);
        assertThatThrownBy(() -> new ModelLoader(LoadOptions.defaults()).load(bad, "models/bad.xml"))
                .isInstanceOf(AtomLedgerException.class).hasMessageStartingWith("models/bad.xml:4:");
    }

    @Test
    void refusesDoctypeDeclarations() throws IOException {
        Path bad = tmp.resolve("dtd.xml");
        Files.writeString(bad, "<?xml version=\"1.0\"?>\n<!DOCTYPE sbml [<!ENTITY x SYSTEM \"file:///etc/passwd\">]>\n"
                + "<sbml xmlns=\"http://www.sbml.org/sbml/level3/version1/core\" level=\"3\" version=\"1\"><model id=\"m\"/></sbml>\n");
        assertThatThrownBy(() -> new ModelLoader(LoadOptions.defaults()).load(bad, "dtd.xml"))
                .isInstanceOf(AtomLedgerException.class).hasMessageContaining("DOCTYPE");
    }

    @Test
    void refusesNonSbmlRoots() throws IOException {
        Path bad = tmp.resolve("html.xml");
        Files.writeString(bad, "<html><body/></html>\n");
        assertThatThrownBy(() -> new ModelLoader(LoadOptions.defaults()).load(bad, "html.xml"))
                .isInstanceOf(AtomLedgerException.class).hasMessageContaining("html.xml:1: not an SBML file");
    }

    @Test
    void contentWithheldFromJsbmlStillReachesTheView() {
        ModelView m = TestModels.load("model/withheld-content.xml");
        assertThat(m.modelId()).isEqualTo("withheld");
        assertThat(m.compartment("e").orElseThrow().name()).isEqualTo("extracellular space");
        SpeciesInfo glc = m.species("M_glc__D_c").orElseThrow();
        assertThat(glc.sboTerm()).isEqualTo("SBO:0000247");
        assertThat(glc.name()).isEqualTo("D-glucose");
        assertThat(glc.formulaText()).isEqualTo("C6H12O6");
        assertThat(glc.chargeText()).isEqualTo("0");
        assertThat(glc.inchis()).as("'+' is not a space, '%3F' is '?'")
                .containsExactly("InChI=1S/C6H12O6/c7-1-2-3(8)4(9)5(10)6(11)12-2/h2-11H,1H2/t2-,3-,4+,5-,6?/m1/s1");
        assertThat(m.species("M_g6p_c").orElseThrow().sboTerm()).as("JSBML refuses 'SBO:176' too").isEmpty();
        assertThat(m.species("M_glc__D_e").orElseThrow().boundary()).isTrue();
        ReactionInfo hex = m.reactions().get(0);
        assertThat(hex.sboTerm()).isEqualTo("SBO:0000176");
        assertThat(hex.reversible()).isFalse();
        assertThat(hex.modifiers()).containsExactly("M_atp_c");
        assertThat(hex.products()).extracting(Participant::species).containsExactly("M_g6p_c", "M_adp_c", "M_h_c");
        assertThat(m.reactions().get(1).sboTerm()).isEqualTo("SBO:0000627");
        assertThat(m.reactions().get(1).reversible()).isTrue();
        assertThat(m.reactions().get(2).sboTerm()).as("eight digits").isEmpty();
        assertThat(m.duplicateIds()).as("withheld elements still count").containsExactly("G_g2");
    }

    @Test
    void reactionKeepsItsIdWhenOnlyAWithheldElementRepeatsIt() throws IOException {
        // JSBML, shown the parameter, would refuse the reaction's id as taken and leave it blank.
        Path file = tmp.resolve("dup.xml");
        Files.writeString(file, "<sbml xmlns=\"http://www.sbml.org/sbml/level3/version1/core\" level=\"3\" version=\"1\">"
                + "<model id=\"m\"><listOfParameters><parameter id=\"R_1\" value=\"1\" constant=\"true\"/></listOfParameters>"
                + "<listOfReactions><reaction id=\"R_1\" reversible=\"false\"/></listOfReactions></model></sbml>\n");
        ModelView m = new ModelLoader(LoadOptions.defaults()).load(file, "dup.xml");
        assertThat(m.reactions()).extracting(ReactionInfo::id).containsExactly("R_1");
        assertThat(m.duplicateIds()).containsExactly("R_1");
    }

    @Test
    void level2StoichiometryMathLeavesTheCoefficientUnset() {
        ModelView m = TestModels.load("model/level2-stoichiometry-math.xml");
        ReactionInfo x = m.reactions().get(0);
        assertThat(x.reactants().get(0).stoichiometryText()).isEqualTo("1");
        assertThat(x.products().get(0).stoichiometryText()).isNull();
        assertThat(x.sboTerm()).isEqualTo("SBO:0000176");
    }

    static Stream<String> fixtures() {
        return Stream.of("model/level2-notes.xml", "model/fbc3-decimal.xml", "model/withheld-content.xml",
                "model/level2-stoichiometry-math.xml", "integrity/data-problems.xml", "balance/classes.xml",
                "balance/generic-formula.xml", "mapping/fba-curated.xml", "consistency/leak.xml");
    }

    /** Everything the view takes from JSBML equals what JSBML reads when it is shown the whole document. */
    @ParameterizedTest
    @MethodSource("fixtures")
    void viewAgreesWithJsbmlReadingTheWholeFixture(String fixture) throws Exception {
        Path file = TestModels.fixture(fixture);
        assertThat(JsbmlReference.describe(new ModelLoader(LoadOptions.defaults()).load(file, fixture)))
                .isEqualTo(JsbmlReference.describe(file));
    }

    @ParameterizedTest
    @MethodSource("sharedModels")
    void viewAgreesWithJsbmlReadingTheWholeSharedModel(String name) throws Exception {
        Path file = io.github.atomledger.checker.SharedData.require(name);
        assertThat(JsbmlReference.describe(new ModelLoader(LoadOptions.defaults()).load(file, name)))
                .isEqualTo(JsbmlReference.describe(file));
    }

    static Stream<String> sharedModels() {
        return Stream.of("e_coli_core.xml", "yeast-GEM.xml.gz");
    }
}
