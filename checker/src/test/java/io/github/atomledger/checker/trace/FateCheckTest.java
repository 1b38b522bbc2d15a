package io.github.atomledger.checker.trace;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Declared fates against traces of the hand-made maps of {@link TracerTest} (invented chemistry). */
class FateCheckTest {

    private static final List<Pathway> PATHWAYS = List.of(
            pathway("decarboxylation", "a", "R1 R2"),
            pathway("refixed", "a", "R1 R2 R6"),
            pathway("stalled", "a", "R5"),
            pathway("ambiguous", "b", "R3"),
            pathway("wrongway", "a", "R1 R6"),
            pathway("symmetric", "m", "-R7 R7"));

    private static Pathway pathway(String name, String source, String steps) {
        List<Step> list = new ArrayList<>();
        for (String s : steps.split(" ")) {
            list.add(Step.parse(s));
        }
        return new Pathway(name, source, list, "", "models/pathways.tsv", 2);
    }

    private static TraceResults run(String... lines) {
        List<FateExpectation> fates = new ArrayList<>();
        int line = 2;
        for (String l : lines) {
            String[] cells = l.split(" ");
            int colon = cells[2].indexOf(':');
            fates.add(new FateExpectation(cells[0], cells[1], colon < 0 ? cells[2] : cells[2].substring(0, colon),
                    colon < 0 ? "" : cells[2].substring(colon + 1), "models/fates.tsv", line++));
        }
        Synthetic s = TracerTest.model();
        return Traces.run(s.model(), s.data(), new TraceInputs(PATHWAYS, fates, List.of()));
    }

    private static FateOutcome only(String line) {
        return run(line).outcomes().get(0);
    }

    @Test
    void holdsForTheSpeciesAndForThePosition() {
        assertThat(only("decarboxylation C1 co2").verdict()).isEqualTo(FateOutcome.Verdict.HOLDS);
        assertThat(only("decarboxylation C1 co2:C1").verdict()).isEqualTo(FateOutcome.Verdict.HOLDS);
        assertThat(only("decarboxylation 3 co2:2").verdict()).as("atoms may be named by index").isEqualTo(FateOutcome.Verdict.HOLDS);
        assertThat(only("symmetric C1 m").verdict()).as("split within the species").isEqualTo(FateOutcome.Verdict.HOLDS);
    }

    @Test
    void namesTheFirstStepWhereActualAndExpectedPart() {
        FateOutcome o = only("decarboxylation C1 c");
        assertThat(o.verdict()).isEqualTo(FateOutcome.Verdict.DIFFERS);
        assertThat(o.actual()).isEqualTo("co2:C1");
        assertThat(o.step()).as("the first step that makes c").isEqualTo(2);
        assertThat(only("decarboxylation C2 c:C2").step()).as("makes c, at another position").isEqualTo(2);
        assertThat(only("refixed C1 co2").step()).as("was in CO2, left at step 3").isEqualTo(3);
        assertThat(only("decarboxylation C1 d").step()).as("d is never made: the fate's step").isEqualTo(2);
        assertThat(only("stalled C1 co2").step()).as("never moved").isZero();
        FateOutcome wrongWay = only("wrongway C1 co2");
        assertThat(wrongWay.step()).as("R6 makes b, where the carbon sits, instead of consuming it").isEqualTo(2);
        assertThat(wrongWay.detail()).isEqualTo("R6 makes b instead of consuming it (write -R6 to run it the other way)");
    }

    @Test
    void anUndecidedOrSplitCarbonCannotConfirmAPosition() {
        FateOutcome amb = only("ambiguous C1 co2");
        assertThat(amb.verdict()).isEqualTo(FateOutcome.Verdict.UNDECIDED);
        assertThat(amb.step()).isEqualTo(1);
        assertThat(amb.detail()).contains("co-optimal");
        FateOutcome split = only("symmetric C1 m:C1");
        assertThat(split.verdict()).isEqualTo(FateOutcome.Verdict.UNDECIDED);
        assertThat(split.actual()).isEqualTo("m:C1/C4");
        assertThat(only("symmetric C1 m:C2").verdict()).isEqualTo(FateOutcome.Verdict.DIFFERS);
    }

    @Test
    void flagsLinesThatNameWhatDoesNotExist() {
        assertThat(only("decarboxylation C9 co2").detail()).isEqualTo("names carbon C9, which a does not have");
        assertThat(only("decarboxylation C1 zz").detail()).isEqualTo("names zz, which is not a species of the model");
        assertThat(only("decarboxylation C1 c:C7").detail()).isEqualTo("names position C7, which c does not have");
    }

    @Test
    void turnsOutcomesIntoFindingsOnTheSourceSpecies() {
        TraceResults r = run("decarboxylation C1 co2", "decarboxylation C2 co2", "ambiguous C1 co2", "decarboxylation C9 co2");
        assertThat(r.findings()).extracting(Finding::ruleId).containsExactlyInAnyOrder(FateCheck.DIFFERS,
                FateCheck.UNDECIDED, FateCheck.EXPECTATION_INVALID);
        Finding differs = r.findings().stream().filter(f -> f.ruleId().equals(FateCheck.DIFFERS)).findFirst().orElseThrow();
        assertThat(differs.severity()).isEqualTo(Severity.ERROR);
        assertThat(differs.elementId()).isEqualTo("a");
        assertThat(differs.line()).isEqualTo(2);
        assertThat(differs.data()).containsEntry("pathway", "decarboxylation").containsEntry("carbon", "C2")
                .containsEntry("expected", "co2").containsEntry("actual", "c:C1").containsEntry("step", "R2")
                .containsEntry("stepIndex", "2").containsEntry("expectation", "models/fates.tsv:3");
        assertThat(differs.message()).isEqualTo("Pathway decarboxylation: carbon C2 of a ends in c:C1, not in co2 as"
                + " expected (models/fates.tsv:3); they part at step 2, R2.");
        Finding undecided = r.findings().stream().filter(f -> f.ruleId().equals(FateCheck.UNDECIDED)).findFirst().orElseThrow();
        assertThat(undecided.severity()).isEqualTo(Severity.WARNING);
        assertThat(undecided.data()).containsEntry("stepIndex", "1").containsEntry("step", "R3");
    }

    @Test
    void aPathwayWithAStepTheModelLacksIsAFinding() {
        Synthetic s = TracerTest.model();
        TraceResults r = Traces.run(s.model(), s.data(), new TraceInputs(List.of(pathway("typo", "a", "R1 R_TYPO")),
                List.of(), List.of()));
        assertThat(r.findings()).singleElement().satisfies(f -> {
            assertThat(f.ruleId()).isEqualTo(FateCheck.PATHWAY_INVALID);
            assertThat(f.data()).containsEntry("problems", "step 2, R_TYPO, is not a reaction of the model")
                    .containsEntry("definition", "models/pathways.tsv:2");
        });
    }
}
