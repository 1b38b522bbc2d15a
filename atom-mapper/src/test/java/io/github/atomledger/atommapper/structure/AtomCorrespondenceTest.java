package io.github.atomledger.atommapper.structure;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Issue 15: matching another drawing of a molecule atom by atom (SMILES from memory). */
class AtomCorrespondenceTest {

    private static Structure smiles(String s) throws StructureException {
        return Structure.fromSmiles(s);
    }

    @Test
    void findsEachAtomOfPyruvateDrawnInAnotherOrder() throws StructureException {
        // CH3-CO-COO(-) against OOC-CO-CH3: the methyl is atom 1 in one, atom 6 in the other.
        Structure a = smiles("CC(=O)C([O-])=O");
        Structure b = smiles("[O-]C(=O)C(=O)C");
        int[] at = AtomCorrespondence.find(a.graph(), b.graph(), true).orElseThrow();
        assertThat(at[0]).isEqualTo(5);
        assertThat(at[1]).isEqualTo(3);
        assertThat(at[3]).isEqualTo(1);
        for (int i = 0; i < at.length; i++) {
            assertThat(b.graph().element(at[i])).isEqualTo(a.graph().element(i));
        }
    }

    @Test
    void bondOrdersCanBeLeftOutForAnotherTautomerOrProtonation() throws StructureException {
        // Enol and keto pyruvate: same skeleton, different bond orders.
        Structure keto = smiles("CC(=O)C(O)=O");
        Structure enol = smiles("C=C(O)C(O)=O");
        assertThat(AtomCorrespondence.find(keto.graph(), enol.graph(), true)).isEmpty();
        assertThat(AtomCorrespondence.find(keto.graph(), enol.graph(), false)).isPresent();
    }

    @Test
    void differentMoleculesDoNotMatch() throws StructureException {
        // Lactate and glycerate differ by one oxygen; succinate and methylmalonate by the skeleton.
        assertThat(AtomCorrespondence.find(smiles("CC(O)C(O)=O").graph(), smiles("OCC(O)C(O)=O").graph(), false)).isEmpty();
        assertThat(AtomCorrespondence.find(smiles("OC(=O)CCC(O)=O").graph(), smiles("OC(=O)C(C)C(O)=O").graph(), false))
                .isEmpty();
    }

    @Test
    void symmetricAndLargeMoleculesMatchQuickly() throws StructureException {
        // Coenzyme A, and a C30 chain twice: many equivalent answers, one is returned.
        String coa = "SCCNC(=O)CCNC(=O)C(O)C(C)(C)COP(=O)(O)OP(=O)(O)OCC1OC(C(O)C1OP(=O)(O)O)n1cnc2c(N)ncnc12";
        assertThat(AtomCorrespondence.find(smiles(coa).graph(), smiles(coa).graph(), true)).isPresent();
        String chain = "C".repeat(30);
        assertThat(AtomCorrespondence.find(smiles(chain + "." + chain).graph(), smiles(chain + "." + chain).graph(), true))
                .isPresent();
    }
}
