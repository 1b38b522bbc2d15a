package io.github.atomledger.checker.trace;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.engine.ModelResult;

import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Carbon traces against textbook tracer facts (issue #14), all from memory of standard
 * biochemistry texts: [1-13C]glucose through glycolysis labels pyruvate C3 (glucose C1 and C6 end in
 * pyruvate C3, C2 and C5 in C2, C3 and C4 in C1, because triose-phosphate isomerase feeds both
 * trioses into one pool); the oxidative pentose phosphate pathway releases glucose C1 as CO2; in the
 * first turn of the citric acid cycle the acetyl carbons of acetyl-CoA end in 2-oxoglutarate C4 and
 * C5. The structures and numbering are in the fixtures' headers ({@code trace/glycolysis.xml},
 * {@code trace/tca.xml}, {@code trace/tca-pinned.xml}); the maps are the mapper's own.
 */
class TextbookTracesTest {

    private static ModelResult glycolysis;

    @BeforeAll
    static void run() {
        glycolysis = TraceFixtures.run("glycolysis");
    }

    @Test
    void glucoseCarbonOneEndsInPyruvateCarbonThree() {
        Map<String, String> fates = TraceFixtures.fates(glycolysis, "glycolysis");
        assertThat(fates).containsEntry("C1", "pyr:C3").containsEntry("C6", "pyr:C3")
                .containsEntry("C2", "pyr:C2").containsEntry("C5", "pyr:C2")
                .containsEntry("C3", "pyr:C1").containsEntry("C4", "pyr:C1");
        CarbonTrace c1 = TraceFixtures.carbon(glycolysis, "glycolysis", "C1");
        assertThat(c1.status()).isEqualTo(CarbonStatus.DECIDED);
        // Glucose C1 goes to DHAP at the aldolase (step 4) and to glyceraldehyde 3-phosphate at the isomerase (step 5).
        assertThat(c1.path()).extracting(h -> h.step().reactionId()).contains("R_FBA", "R_TPI", "R_PYK");
        assertThat(c1.lastMove()).isEqualTo(10);
    }

    @Test
    void oxidativePentosePhosphatePathwayReleasesGlucoseCarbonOne() {
        Map<String, String> fates = TraceFixtures.fates(glycolysis, "oxidative PPP");
        assertThat(fates).containsEntry("C1", "co2:C1").containsEntry("C2", "ru5p:C1").containsEntry("C6", "ru5p:C5");
        assertThat(TraceFixtures.counts(glycolysis, "oxidative PPP")).containsExactlyInAnyOrderEntriesOf(
                Map.of("co2", "1", "ru5p", "5"));
    }

    @Test
    void aStepRunBackwardsConsumesItsProducts() {
        assertThat(TraceFixtures.fates(glycolysis, "gluconeogenic end")).containsExactlyInAnyOrderEntriesOf(
                Map.of("C1", "pg3:C1", "C2", "pg3:C2", "C3", "pg3:C3"));
    }

    @Test
    void acetylCarbonsEndInOxoglutarateFourAndFiveWhenTheEnzymesPinTheArm() {
        ModelResult pinned = TraceFixtures.run("tca-pinned");
        assertThat(TraceFixtures.fates(pinned, "first turn")).containsEntry("C1", "akg:C5").containsEntry("C2", "akg:C4");
        assertThat(TraceFixtures.carbon(pinned, "first turn", "C2").status()).isEqualTo(CarbonStatus.DECIDED);
    }

    @Test
    void withoutPinsTheTwoArmsOfCitrateLeaveTheAcetylCarbonsSplit() {
        // Citrate's arms are equivalent by constitution; only the enzymes' stereospecificity puts
        // the acetyl carbons into C4-C5 of 2-oxoglutarate. Unpinned, the trace must not guess.
        ModelResult open = TraceFixtures.run("tca");
        CarbonTrace methyl = TraceFixtures.carbon(open, "first turn", "C2");
        assertThat(methyl.status()).isEqualTo(CarbonStatus.SPLIT);
        assertThat(TraceFixtures.fates(open, "first turn")).containsEntry("C2", "akg:C2/C4").containsEntry("C1", "akg:C1/C5");
        assertThat(methyl.reason()).contains("R_ACN").contains("stereo pin");
        assertThat(methyl.fateSpecies()).contains("akg");
        assertThat(methyl.positions().values()).allSatisfy(w -> assertThat(w.toString()).isEqualTo("1/2"));
    }
}
