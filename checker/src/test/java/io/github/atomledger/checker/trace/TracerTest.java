package io.github.atomledger.checker.trace;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.check.mapping.MapStatus;

import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * The tracing rules of {@link Tracer} on hand-made maps (invented chemistry, for the rules only):
 * consumed carbons move, others stay, backwards steps, missing, unmapped, best-found and ambiguous
 * steps, symmetric species and copies, curated maps.
 */
class TracerTest {

    static Synthetic model() {
        return new Synthetic()
                .species("a", "[CH3:3][CH2:2][C:1](=O)O")          // atoms: C3 1, C2 2, C1 3
                .species("b", "[CH3:3][C:2](=O)[C:1](=O)O")        // C3 1, C2 2, C1 4
                .species("c", "[CH3:2][C:1](=O)O")                 // C2 1, C1 2
                .species("co2", "O=[C:1]=O")                       // C1 2
                .species("s", "O[C:1](=O)[CH2:2][CH2:3][C:4](=O)O") // symmetric: C1 2 = C4 6, C2 4 = C3 5
                .species("m", "O[C:1](=O)[CH:2](O)[CH2:3][C:4](=O)O") // C1 2, C2 4, C3 6, C4 7
                .species("d", "[CH3:4][C:3](=O)[CH2:2][C:1](=O)O")  // C4 1, C3 2, C2 4, C1 5
                .reaction("R1", "a -> b", MapStatus.MAPPED, "a:1>b:1 a:2>b:2 a:3>b:4")
                .reaction("R2", "b -> c + co2", MapStatus.MAPPED, "b:4>co2:2 b:2>c:2 b:1>c:1")
                .reaction("R3", "b -> c + co2", MapStatus.AMBIGUOUS, "b:4>co2:2 b:2>c:2 b:1>c:1", "b:4>c:2 b:2>co2:2 b:1>c:1")
                .reaction("R4", "b -> c + co2", MapStatus.BEST_FOUND, "b:4>co2:2 b:2>c:2 b:1>c:1")
                .reaction("R5", "b -> c", MapStatus.UNMAPPABLE)
                .reaction("R6", "co2 + c -> b", MapStatus.MAPPED, "co2:2>b:4 c:2>b:2 c:1>b:1")
                .reaction("R7", "s <=> m", MapStatus.MAPPED, "s:2>m:2 s:4>m:4 s:5>m:6 s:6>m:7")
                .reaction("R9", "2 c -> d", MapStatus.MAPPED, "c#1:2>d:1 c#1:1>d:2 c#2:2>d:4 c#2:1>d:5")
                .reaction("R10", "b -> c + co2", MapStatus.MAPPED, "b:4>co2:2 b:2>c:2 b:1>c:1")
                .reaction("R11", "b -> c + co2", MapStatus.MAPPED, "b:4>co2:2 b:2>c:2 b:1>c:1")
                .curated("R10", "b:4>co2:2 b:2>c:1 b:1>c:2", true)
                .curated("R11", "b:4>co2:2 b:2>c:1 b:1>c:2", false);
    }

    private static Map<String, String> fates(String source, String steps) {
        PathwayTrace t = model().trace(source, steps);
        Atoms atoms = new Atoms(model().data().structures());
        Map<String, String> out = new TreeMap<>();
        for (CarbonTrace c : t.carbons()) {
            String label = atoms.label(new Position(source, c.atom()));
            out.put(label, c.status().label() + " " + atoms.text(c.positions().keySet()) + " @" + c.lastMove());
        }
        return out;
    }

    @Test
    void movesCarbonsOfConsumedSpeciesAndLeavesTheOthers() {
        assertThat(fates("a", "R1 R2")).containsEntry("C1", "decided co2:C1 @2").containsEntry("C2", "decided c:C1 @2")
                .containsEntry("C3", "decided c:C2 @2");
    }

    @Test
    void aCarbonThatLeftAsCo2MovesAgainWhenALaterStepConsumesCo2() {
        assertThat(fates("a", "R1 R2 R6")).containsEntry("C1", "decided b:C1 @3");
    }

    @Test
    void runsAStepBackwards() {
        assertThat(fates("b", "-R1")).containsEntry("C1", "decided a:C1 @1").containsEntry("C3", "decided a:C3 @1");
    }

    @Test
    void aStepTheModelLacksLeavesEveryCarbonUndecided() {
        PathwayTrace t = model().trace("a", "R1 R_X R2");
        assertThat(t.carbons()).allSatisfy(c -> {
            assertThat(c.status()).isEqualTo(CarbonStatus.UNDECIDED);
            assertThat(c.stopStep()).isEqualTo(2);
            assertThat(c.reason()).isEqualTo("step 2, R_X, is not a reaction of the model");
        });
        assertThat(t.problems()).containsExactly("step 2, R_X, is not a reaction of the model");
    }

    @Test
    void anAmbiguousStepLeavesOnlyTheCarbonsItsMapsDisagreeOnUndecided() {
        Map<String, String> f = fates("b", "R3");
        assertThat(f).containsEntry("C3", "decided c:C2 @1");
        assertThat(f.get("C1")).startsWith("undecided b:C1 @0");
        CarbonTrace c1 = model().trace("b", "R3").carbon(4);
        assertThat(c1.reason()).isEqualTo("step 1, R3, has co-optimal maps that send it to co2:C1 or c:C1");
    }

    @Test
    void aBestFoundOrUnmappedStepLeavesTheCarbonsItConsumesUndecided() {
        assertThat(model().trace("b", "R4").carbon(1).reason()).startsWith("step 1, R4, has only the best map found");
        assertThat(model().trace("a", "R1 R5").carbon(1).reason())
                .isEqualTo("step 2, R5, has no atom map (unmappable: heavy atoms differ)");
        // A step without a map that does not consume the carbon's species is no obstacle.
        assertThat(fates("a", "R5 R1")).containsEntry("C1", "decided b:C1 @2");
    }

    @Test
    void aSymmetricSpeciesSpreadsTheLabelEvenly() {
        PathwayTrace t = model().trace("m", "-R7 R7");
        CarbonTrace c1 = t.carbon(2);
        assertThat(c1.path().get(0).positions().keySet()).extracting(Position::atom).containsExactly(2, 6);
        assertThat(c1.status()).isEqualTo(CarbonStatus.SPLIT);
        assertThat(c1.positions()).hasSize(2);
        assertThat(c1.positions().values()).extracting(Object::toString).containsExactly("1/2", "1/2");
        assertThat(c1.fateSpecies()).contains("m");
        assertThat(c1.reason()).isEqualTo("it can be at m:C1/C4, which the structures cannot tell apart (split at R7)");
        // One step into the symmetric species the carbon is decided: succinate C1 and C4 are one position.
        assertThat(fates("m", "-R7")).containsEntry("C1", "decided s:C1/C4 @1");
    }

    @Test
    void copiesOfASpeciesShareTheLabel() {
        CarbonTrace c2 = model().trace("c", "R9").carbon(1);
        assertThat(c2.status()).isEqualTo(CarbonStatus.SPLIT);
        assertThat(new Atoms(model().data().structures()).text(c2.positions().keySet())).isEqualTo("d:C1/C3");
    }

    @Test
    void aValidCuratedMapWinsAndAnInvalidOneLeavesTheCarbonUndecided() {
        assertThat(fates("b", "R10")).containsEntry("C2", "decided c:C2 @1");
        assertThat(model().trace("b", "R11").carbon(2).reason())
                .isEqualTo("step 1, R11, has a curated map that is not a valid carbon map (mapping.curated-invalid)");
    }

    @Test
    void saysWhyASourceCannotBeTraced() {
        Synthetic s = model();
        PathwayTrace t = new Tracer(s.model(), s.data()).trace(new Pathway("p", "zz", java.util.List.of(new Step("R1", false)),
                "", "f", 1));
        assertThat(t.carbons()).isEmpty();
        assertThat(t.problems()).containsExactly("the source zz is not a species of the model");
        Synthetic water = model().species("w", "O");
        assertThat(new Tracer(water.model(), water.data()).trace(new Pathway("p", "w", java.util.List.of(new Step("R1", false)),
                "", "f", 1)).problems()).containsExactly("the source w has no carbon");
    }
}
