package io.github.atomledger.atommapper.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Collections;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * Issue 7: structure ingestion ends on inputs with many interchangeable parts, which made CDK's
 * automorphism computation run for minutes (found by {@link StructureFuzzTest}: twenty
 * disconnected methanes). The timeouts are hang guards only. Orbits are checked against
 * symmetry facts that follow from the drawings.
 */
class SymmetricStructureTest {

    private static String copies(String piece, int n) {
        return String.join(".", Collections.nCopies(n, piece));
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void manyIdenticalPiecesShareOneOrbitPerPosition() throws StructureException {
        Structure methanes = Structure.fromSmiles(copies("C", 130));
        assertThat(methanes.heavyAtomCount()).isEqualTo(130);
        assertThat(orbitCount(methanes)).isEqualTo(1);

        Structure benzenes = Structure.fromSmiles(copies("c1ccccc1", 12));
        assertThat(orbitCount(benzenes)).isEqualTo(1);

        // Ethanol pieces: the methyl carbons, the CH2 carbons and the oxygens are three orbits.
        Structure ethanols = Structure.fromSmiles(copies("CCO", 40));
        assertThat(orbitCount(ethanols)).isEqualTo(3);

        Structure neopentanes = Structure.fromSmiles(copies("C(C)(C)(C)C", 30));
        assertThat(orbitCount(neopentanes)).isEqualTo(2);
    }

    @Test
    void differentPiecesStayInDifferentOrbits() throws StructureException {
        // Water and methanol oxygens are not exchangeable; the two waters are.
        Structure s = Structure.fromSmiles("O.CO.O");
        MoleculeGraph g = s.graph();
        assertThat(g.atomCount()).isEqualTo(4);
        assertThat(orbitCount(s)).isEqualTo(3);
    }

    @Test
    void atomWithMoreThanTwelveHeavyNeighboursIsRefused() {
        assertThatThrownBy(() -> Structure.fromSmiles("[Fe]" + "(C)".repeat(13)))
                .isInstanceOf(StructureException.class)
                .hasMessageContaining("13 bonds to heavy atoms, more than 12");
    }

    private static long orbitCount(Structure s) {
        MoleculeGraph g = s.graph();
        java.util.Set<Integer> orbits = new java.util.HashSet<>();
        for (int i = 0; i < g.atomCount(); i++) {
            orbits.add(g.orbit(i));
        }
        return orbits.size();
    }
}
