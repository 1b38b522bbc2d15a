package io.github.atomledger.atommapper.structure;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * OpenSMILES atom classes as readable positions (issue #14). L-leucine, C6H13NO2 (ChEBI 57427
 * as the zwitterion), numbered as biochemistry numbers it: C1 the carboxyl carbon, C2 the alpha
 * carbon, C3 the beta CH2, C4 the CH, C5 and C6 the methyls (common practice). The classes are the
 * curator's labels only: OpenSMILES says an atom class has no chemical meaning.
 */
class AtomClassTest {

    private static final String LEUCINE = "CC(C)C[C@H]([NH3+])C([O-])=O";
    private static final String LEUCINE_NUMBERED = "[CH3:5][CH:4]([CH3:6])[CH2:3][C@H:2]([NH3+])[C:1]([O-])=O";

    @Test
    void namesCarbonsByTheirAtomClassAndOtherAtomsByIndex() throws Exception {
        Structure s = Structure.fromSmiles(LEUCINE_NUMBERED);
        assertThat(s.atomLabel(1)).isEqualTo("C5");
        assertThat(s.atomLabel(5)).isEqualTo("C2");
        assertThat(s.atomLabel(6)).isEqualTo("6");
        assertThat(s.atomLabel(7)).isEqualTo("C1");
        assertThat(s.atomClass(7)).isEqualTo(1);
        assertThat(s.atomClass(6)).isZero();
        assertThat(s.hasAtomClasses()).isTrue();
        assertThat(Structure.fromSmiles(LEUCINE).atomLabel(7)).isEqualTo("7");
        assertThat(Structure.fromSmiles(LEUCINE).hasAtomClasses()).isFalse();
    }

    @Test
    void atomClassesChangeNeitherTheMoleculeNorItsSymmetry() throws Exception {
        Structure plain = Structure.fromSmiles(LEUCINE);
        Structure numbered = Structure.fromSmiles(LEUCINE_NUMBERED);
        assertThat(numbered.fingerprint()).isEqualTo(plain.fingerprint());
        assertThat(numbered.formula()).isEqualTo(plain.formula());
        assertThat(numbered.numberedAlike(plain)).isTrue();
        for (int i = 0; i < plain.heavyAtomCount(); i++) {
            assertThat(numbered.graph().orbit(i)).isEqualTo(plain.graph().orbit(i));
        }
        // The two methyls are equivalent by constitution whatever their labels say.
        assertThat(numbered.graph().orbit(0)).isEqualTo(numbered.graph().orbit(2));
    }

    @Test
    void speciesAtomClassesNeverLeakIntoWrittenMapNumbers() throws Exception {
        Structure numbered = Structure.fromSmiles(LEUCINE_NUMBERED);
        String written = numbered.smilesWithAtomClasses(new int[] {11, 0, 0, 0, 0, 0, 17, 0, 0});
        assertThat(written).isEqualTo("[CH3:11]C(C)C[C@H]([NH3+])[C:17]([O-])=O");
    }

    @Test
    void aSharedClassNamesNeitherAtom() throws Exception {
        Structure s = Structure.fromSmiles("[CH3:1][C:1](=O)[O-]");
        assertThat(s.atomLabel(1)).isEqualTo("1");
        assertThat(s.atomLabel(2)).isEqualTo("2");
        // Oxygen and carbon may share a number: the element tells them apart.
        Structure t = Structure.fromSmiles("[CH3:2][C:1](=[O:1])[O-]");
        assertThat(t.atomLabel(2)).isEqualTo("C1");
        assertThat(t.atomLabel(3)).isEqualTo("O1");
    }

    @Test
    void findsAnAtomByLabelOrByIndex() throws Exception {
        Structure s = Structure.fromSmiles(LEUCINE_NUMBERED);
        assertThat(s.atomNamed("C1")).isEqualTo(7);
        assertThat(s.atomNamed("7")).isEqualTo(7);
        assertThat(s.atomNamed("6")).isEqualTo(6);
        assertThat(s.atomNamed("C9")).isZero();
        assertThat(s.atomNamed("10")).isZero();
        assertThat(s.atomNamed("")).isZero();
    }

    @Test
    void anotherStartingAtomNumbersTheAtomsDifferently() throws Exception {
        Structure a = Structure.fromSmiles("CC(=O)C([O-])=O");
        Structure b = Structure.fromSmiles("[O-]C(=O)C(C)=O");
        assertThat(a.fingerprint()).isEqualTo(b.fingerprint());
        assertThat(a.numberedAlike(b)).isFalse();
        assertThat(a.numberedAlike(Structure.fromSmiles("[CH3:3][C:2](=O)[C:1]([O-])=O"))).isTrue();
    }

    @Test
    void anInchiHasNoAtomClasses() throws Exception {
        Structure s = Structure.fromInchi("InChI=1S/C2H4O2/c1-2(3)4/h1H3,(H,3,4)");
        assertThat(s.hasAtomClasses()).isFalse();
        assertThat(s.atomLabel(1)).isEqualTo("1");
    }
}
