package io.github.atomledger.checker.trace;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Where label can go, on the hand-made maps of {@link TracerTest} (invented chemistry). */
class ReachabilityTest {

    private static List<String> reach(String species, int atom) {
        Synthetic s = TracerTest.model();
        Atoms atoms = new Atoms(s.data().structures());
        LabelReach r = new Reachability(s.model(), s.data()).from(new Position(species, atom));
        return r.reached().stream().map(x -> atoms.text(List.of(x.position())) + " "
                + String.join(" ", x.chain().stream().map(Step::text).toList())).toList();
    }

    @Test
    void followsMapsForwardsAndReversibleOnesBothWays() {
        // a C1 -> b C1 (R1) -> co2 (R2, R10, R11) -> b C1 again (R6: co2 + c -> b) or c (R3's
        // alternative); unmappable R5 adds nothing. Irreversible R1 is never run backwards.
        List<String> r = reach("a", 3);
        assertThat(r.get(0)).isEqualTo("a:C1 ");
        assertThat(r).contains("b:C1 R1", "co2:C1 R1 R2", "c:C1 R1 R3");
        assertThat(r).noneMatch(x -> x.startsWith("a:") && !x.equals("a:C1 "));
    }

    @Test
    void aReversibleMapAndSymmetryReachEveryEquivalentPosition() {
        List<String> r = reach("m", 2);
        assertThat(r).contains("s:C1 -R7", "s:C4 -R7", "m:C4 -R7 R7");
    }

    @Test
    void isDeterministic() {
        assertThat(reach("a", 3)).isEqualTo(reach("a", 3));
    }
}
