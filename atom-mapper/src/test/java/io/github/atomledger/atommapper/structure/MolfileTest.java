package io.github.atomledger.atommapper.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.formula.Formula;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IIsotope;
import org.openscience.cdk.interfaces.IMolecularFormula;
import org.openscience.cdk.io.MDLV2000Reader;
import org.openscience.cdk.io.MDLV2000Writer;
import org.openscience.cdk.io.MDLV3000Reader;
import org.openscience.cdk.io.MDLV3000Writer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;
import org.openscience.cdk.tools.manipulator.MolecularFormulaManipulator;

/**
 * Issue 15: MDL molfiles (V2000 and V3000) as a structure source. The reference is CDK's own MDL
 * readers and formula code (general-purpose reference library): our reading must give the same
 * formula and charge as CDK's reader plus {@code MolecularFormulaManipulator} on the same file.
 * Layouts follow the CTfile specification (BIOVIA "CTfile Formats", from memory for the edition).
 */
class MolfileTest {

    /** Pyruvate, CH3-CO-COO(-), C3H3O3 charge -1 (ChEBI 15361, from memory), written by hand. */
    static final String PYRUVATE = """
            pyruvate
              hand      2D

              6  5  0  0  0  0  0  0  0  0999 V2000
                0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  1  0  0
                1.2990    0.7500    0.0000 C   0  0  0  0  0  0  0  0  0  2  0  0
                1.2990    2.2500    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
                2.5981    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  3  0  0
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

    @Test
    void readsAHandWrittenV2000MolfileWithChargeAndMapNumbers() throws StructureException {
        Structure s = Structure.fromMolfile(PYRUVATE);
        assertThat(s.formula().toHillString()).isEqualTo("C3H3O3");
        assertThat(s.charge()).isEqualTo(-1);
        assertThat(s.heavyAtomCount()).isEqualTo(6);
        assertThat(s.graph().element(2)).as("atom order is the atom block's").isEqualTo("O");
        assertThat(s.mapNumbers()).containsExactly(1, 2, 0, 3, 0, 0);
    }

    @Test
    void aromaticBondsGetKekuleOrdersAndHydrogens() throws StructureException {
        // Benzene with the query bond type 4 (aromatic) on every ring bond: C6H6.
        StringBuilder mol = new StringBuilder("benzene\n  hand\n\n  6  6  0  0  0  0  0  0  0  0999 V2000\n");
        for (int i = 0; i < 6; i++) {
            mol.append(String.format(java.util.Locale.ROOT, "%10.4f%10.4f%10.4f C   0  0  0  0  0  0  0  0  0  0  0  0%n",
                    Math.cos(i * Math.PI / 3), Math.sin(i * Math.PI / 3), 0.0));
        }
        for (int i = 0; i < 6; i++) {
            mol.append(String.format(java.util.Locale.ROOT, "%3d%3d  4  0  0  0  0%n", i + 1, (i + 1) % 6 + 1));
        }
        mol.append("M  END\n");
        Structure s = Structure.fromMolfile(mol.toString());
        assertThat(s.formula().toHillString()).isEqualTo("C6H6");
        assertThat(s.graph().bond(0, 1)).isEqualTo(MoleculeGraph.AROMATIC);
    }

    @Test
    void explicitHydrogensCountInTheFormulaButAreNotGraphAtoms() throws StructureException {
        // Methanol with all four hydrogens drawn: CH4O, two heavy atoms.
        String mol = """
                methanol


                  6  5  0  0  0  0  0  0  0  0999 V2000
                    0.0000    0.0000    0.0000 C   0  0
                    1.4000    0.0000    0.0000 O   0  0
                   -0.5000    0.9000    0.0000 H   0  0
                   -0.5000   -0.9000    0.0000 H   0  0
                   -1.0000    0.0000    0.0000 H   0  0
                    1.9000    0.9000    0.0000 H   0  0
                  1  2  1  0
                  1  3  1  0
                  1  4  1  0
                  1  5  1  0
                  2  6  1  0
                M  END
                """.stripIndent();
        Structure s = Structure.fromMolfile(mol);
        assertThat(s.formula().toHillString()).isEqualTo("CH4O");
        assertThat(s.heavyAtomCount()).isEqualTo(2);
    }

    @Test
    void brokenLayoutsAreRefusedWithTheLine() {
        String shortBlock = PYRUVATE.replace("  6  5  0", "  7  5  0");
        assertThatThrownBy(() -> Structure.fromMolfile(shortBlock)).isInstanceOf(StructureException.class)
                .satisfies(e -> assertThat(((StructureException) e).line()).isEqualTo(11))
                .hasMessageContaining("atom line 7");
        String badBond = PYRUVATE.replace("  4  6  1  0  0  0  0", "  4  9  1  0  0  0  0");
        assertThatThrownBy(() -> Structure.fromMolfile(badBond))
                .satisfies(e -> assertThat(((StructureException) e).line()).isEqualTo(15))
                .hasMessageContaining("bond 5 joins atoms 4 and 9 of 6");
        String noEnd = PYRUVATE.replace("M  END\n", "");
        assertThatThrownBy(() -> Structure.fromMolfile(noEnd)).hasMessageContaining("no 'M  END'");
        assertThatThrownBy(() -> Structure.fromMolfile("x\n\n")).hasMessageContaining("ends after 2 line(s)");
        String badCounts = PYRUVATE.replace("  6  5  0", "  a  5  0");
        assertThatThrownBy(() -> Structure.fromMolfile(badCounts))
                .satisfies(e -> assertThat(((StructureException) e).line()).isEqualTo(4));
    }

    /**
     * Metabolites written from memory as SMILES (formulas as in ChEBI for these forms), turned
     * into molfiles by CDK's writers; our reading of each file must agree with CDK's reader on
     * formula and charge.
     */
    @ParameterizedTest
    @ValueSource(strings = {
        "OC[C@H]1OC(O)[C@H](O)[C@@H](O)[C@@H]1O",
        "CC(=O)C([O-])=O",
        "OC(=O)CC(O)(CC(O)=O)C(O)=O",
        "Nc1ncnc2c1ncn2[C@@H]1O[C@H](COP(O)(=O)OP(O)(=O)OP(O)(O)=O)[C@@H](O)[C@H]1O",
        "NC(=O)c1ccc[n+](c1)C1OC(COP([O-])(=O)OP([O-])(=O)OCC2OC(C(O)C2O)n2cnc3c(N)ncnc23)C(O)C1O",
        "C[N+](C)(C)CC([O-])=O",
        "c1ccc2[nH]ccc2c1",
        "O=C([O-])CCC(=O)SCCNC(=O)CCNC(=O)C(O)C(C)(C)COP(=O)([O-])OP(=O)([O-])OCC1OC(n2cnc3c(N)ncnc32)C(O)C1OP(=O)([O-])[O-]",
        "[NH3+][C@@H](CCC([O-])=O)C([O-])=O",
        "[Fe+2]",
        "*OC(=O)CCCCCCC",
    })
    void agreesWithCdkOnFormulasOfWrittenMolfiles(String smiles) throws Exception {
        IAtomContainer mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(smiles);
        StringWriter v2 = new StringWriter();
        try (MDLV2000Writer w = new MDLV2000Writer(v2)) {
            w.write(mol);
        }
        StringWriter v3 = new StringWriter();
        try (MDLV3000Writer w = new MDLV3000Writer(v3)) {
            w.write(mol);
        }
        IAtomContainer cdk2 = new MDLV2000Reader(new StringReader(v2.toString()))
                .read(SilentChemObjectBuilder.getInstance().newAtomContainer());
        IAtomContainer cdk3 = new MDLV3000Reader(new StringReader(v3.toString()))
                .read(SilentChemObjectBuilder.getInstance().newAtomContainer());
        Structure ours2 = Structure.fromMolfile(v2.toString());
        Structure ours3 = Structure.fromMolfile(v3.toString());
        assertThat(counts(ours2.formula())).isEqualTo(cdkCounts(cdk2));
        assertThat(counts(ours3.formula())).isEqualTo(cdkCounts(cdk3));
        assertThat(ours2.charge()).isEqualTo(MolecularFormulaManipulator.getMolecularFormula(cdk2).getCharge());
        assertThat(ours3.charge()).isEqualTo(ours2.charge());
        // The writers get no coordinates, so stereo may be lost: compare the constitution.
        assertThat(AtomCorrespondence.find(ours2.graph(), Structure.fromSmiles(smiles).graph(), true))
                .as("same molecule as the SMILES").isPresent();
    }

    private static Map<String, Integer> counts(Formula f) {
        Map<String, Integer> out = new TreeMap<>();
        f.counts().forEach((k, v) -> {
            if (!k.equals("R")) {
                out.put(k, v.intValue());
            }
        });
        return out;
    }

    private static Map<String, Integer> cdkCounts(IAtomContainer mol) {
        IMolecularFormula f = MolecularFormulaManipulator.getMolecularFormula(mol);
        Map<String, Integer> out = new TreeMap<>();
        for (IIsotope i : f.isotopes()) {
            if (i.getAtomicNumber() != null && i.getAtomicNumber() > 0) {
                out.merge(i.getSymbol(), f.getIsotopeCount(i), Integer::sum);
            }
        }
        return out;
    }
}
