package io.github.atomledger.atommapper.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.formula.FormulaParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;
import org.openscience.cdk.tools.manipulator.MolecularFormulaManipulator;

/** Issue 3: parsing, formulas, charges, fingerprints and the heavy-atom graph of {@link Structure}. */
class StructureTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        pyruvate anion  | CC(=O)C(=O)[O-]                      | C3H3O3        | -1 | 6
        acetyl-CoA      | CC(=O)SCCNC(=O)CCNC(=O)C(O)C(C)(C)COP(=O)(O)OP(=O)(O)OCC1OC(C(O)C1OP(=O)(O)O)n1cnc2c(N)ncnc12 | C23H38N7O17P3S | 0 | 51
        ATP 4-          | Nc1ncnc2c1ncn2C1OC(COP(=O)([O-])OP(=O)([O-])OP(=O)([O-])[O-])C(O)C1O | C10H12N5O13P3 | -4 | 31
        NAD+            | NC(=O)c1ccc[n+](c1)C1OC(COP(=O)([O-])OP(=O)([O-])OCC2OC(C(O)C2O)n2cnc3c(N)ncnc23)C(O)C1O | C21H26N7O14P2 | -1 | 44
        glycine zwitterion | [NH3+]CC(=O)[O-]                  | C2H5NO2       | 0  | 5
        acyl-R          | *C(=O)O                              | CHO2R         | 0  | 4
        proton          | [H+]                                 | H             | 1  | 0
        """)
    void readsFormulaChargeAndHeavyAtomsAsKnownFromChebi(String name, String smiles, String formula, int charge,
                                                        int heavy) throws Exception {
        // Formulas and charges from memory of the ChEBI entries for these forms.
        Structure s = Structure.fromSmiles(smiles);
        assertThat(s.formula()).isEqualTo(FormulaParser.parse(formula));
        assertThat(s.charge()).isEqualTo(charge);
        assertThat(s.heavyAtomCount()).isEqualTo(heavy);
        assertThat(s.source()).isEqualTo(smiles);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
        OC(=O)CC(O)(CC(=O)O)C(=O)O
        Nc1ncnc2c1ncn2C1OC(COP(=O)(O)OP(=O)(O)O)C(O)C1O
        [O-]C(=O)C(=C)OP(=O)([O-])[O-]
        """)
    void agreesWithCdkFormula(String smiles) throws Exception {
        var mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(smiles);
        var cdk = MolecularFormulaManipulator.getMolecularFormula(mol);
        Structure s = Structure.fromSmiles(smiles);
        assertThat(s.formula()).isEqualTo(FormulaParser.parse(MolecularFormulaManipulator.getHillString(cdk)));
        assertThat(s.charge()).isEqualTo(cdk.getCharge());
    }

    @Test
    void givesOneFingerprintToTwoDrawingsOfOneMolecule() throws Exception {
        Structure aromatic = Structure.fromSmiles("c1ccccc1O");
        Structure kekule = Structure.fromSmiles("OC1=CC=CC=C1");
        assertThat(kekule.fingerprint()).isEqualTo(aromatic.fingerprint()).matches("sha256:[0-9a-f]{16}");
        assertThat(kekule.canonicalSmiles()).isEqualTo(aromatic.canonicalSmiles());
        assertThat(Structure.fromSmiles("OC(=O)CC").fingerprint()).isNotEqualTo(aromatic.fingerprint());
    }

    @Test
    void numbersHeavyAtomsInInputOrderAndSkipsExplicitHydrogens() throws Exception {
        Structure s = Structure.fromSmiles("[H]OC([H])([H])C=O");
        MoleculeGraph g = s.graph();
        assertThat(g.atomCount()).isEqualTo(4);
        assertThat(g.element(0)).isEqualTo("O");
        assertThat(g.element(3)).isEqualTo("O");
        assertThat(g.hydrogens(0)).isEqualTo(1);
        assertThat(g.hydrogens(1)).isEqualTo(2);
        assertThat(g.bond(1, 2)).isEqualTo(1);
        assertThat(g.bond(3, 2)).isEqualTo(2);
        assertThat(g.bond(0, 2)).isEqualTo(MoleculeGraph.NO_BOND);
        assertThat(s.formula()).isEqualTo(FormulaParser.parse("C2H4O2"));
    }

    @Test
    void marksAromaticBondsAndSymmetricAtoms() throws Exception {
        MoleculeGraph phenol = Structure.fromSmiles("OC1=CC=CC=C1").graph();
        assertThat(phenol.bond(1, 2)).isEqualTo(MoleculeGraph.AROMATIC);
        assertThat(phenol.orbit(2)).isEqualTo(phenol.orbit(6));
        assertThat(phenol.orbit(3)).isEqualTo(phenol.orbit(5));
        assertThat(phenol.orbit(4)).isNotEqualTo(phenol.orbit(3));
        MoleculeGraph succinate = Structure.fromSmiles("OC(=O)CCC(=O)O").graph();
        assertThat(succinate.orbit(1)).isEqualTo(succinate.orbit(5));
        assertThat(succinate.orbit(3)).isEqualTo(succinate.orbit(4));
    }

    @Test
    void writesAtomClassesInInputOrder() throws Exception {
        Structure s = Structure.fromSmiles("CC(=O)O");
        assertThat(s.smilesWithAtomClasses(new int[] {4, 3, 0, 1})).isEqualTo("[CH3:4][C:3](=O)[OH:1]");
        assertThatThrownBy(() -> s.smilesWithAtomClasses(new int[2])).isInstanceOf(IllegalArgumentException.class);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
        C1CC    | invalid SMILES 'C1CC': unclosed ring
        c1cccc1 | invalid SMILES 'c1cccc1': a valid kekulé structure could not be assigned
        '  '    | invalid SMILES '  ': empty
        """)
    void namesTheTextAndTheProblemOfBadSmiles(String smiles, String message) {
        assertThatThrownBy(() -> Structure.fromSmiles(smiles)).isInstanceOf(StructureException.class)
                .hasMessageStartingWith(message);
    }

    @Test
    void readsInchiInItsOwnAtomOrder() throws Exception {
        // Ethanol, InChI from memory: atoms c1 (methyl), c2, o3.
        Structure s = Structure.fromInchi("InChI=1S/C2H6O/c1-2-3/h3H,2H2,1H3");
        assertThat(s.formula()).isEqualTo(FormulaParser.parse("C2H6O"));
        assertThat(s.heavyAtomCount()).isEqualTo(3);
        assertThat(s.graph().element(2)).isEqualTo("O");
        assertThat(s.fingerprint()).isEqualTo(Structure.fromSmiles("CCO").fingerprint());
        assertThatThrownBy(() -> Structure.fromInchi("InChI=1S/garbage")).isInstanceOf(StructureException.class)
                .hasMessageStartingWith("invalid InChI 'InChI=1S/garbage'");
    }
}
