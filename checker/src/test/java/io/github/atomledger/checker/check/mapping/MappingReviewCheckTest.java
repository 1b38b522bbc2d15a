package io.github.atomledger.checker.check.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Issue 16: review findings and curated maps the criterion cannot decide against; see the fixture's header. */
class MappingReviewCheckTest {

    private static final MappingOptions OPTIONS = MappingOptions.defaults().withTimeBudget(Duration.ofSeconds(60))
            .withConfidenceBudget(Duration.ofSeconds(60));

    private static ModelResult standard;
    private static ModelResult wide;

    @BeforeAll
    static void run() throws URISyntaxException {
        standard = run(0);
        wide = run(2);
    }

    private static ModelResult run(int reviewMargin) throws URISyntaxException {
        Path dir = Path.of(MappingReviewCheckTest.class.getResource("review.xml").toURI()).getParent();
        RunConfig config = RunConfig.defaults(dir, List.of("review.xml")).withMapping(
                new MappingConfig(true, dir.resolve("review-structures.tsv"), OPTIONS, 2, null, reviewMargin));
        return new Engine().run(config, RunListener.SILENT).models().get(0);
    }

    /** Mapping findings but the stereo pin note (the product's two methyls are prochiral in R_KARI). */
    private static List<Finding> findings(ModelResult result, String reaction) {
        return result.reactions().stream().filter(r -> r.id().equals(reaction)).findFirst().orElseThrow().findings()
                .stream().filter(f -> f.ruleId().startsWith("mapping.") && !f.ruleId().equals("mapping.stereo-pin-needed"))
                .toList();
    }

    @Test
    void flagsTheReductoisomeraseWhoseFateTiesUnderAnotherWeight() {
        List<Finding> f = findings(standard, "R_KARI");
        assertThat(f).extracting(Finding::ruleId).containsExactly("mapping.review");
        Finding review = f.get(0);
        assertThat(review.severity()).isEqualTo(Severity.WARNING);
        assertThat(review.data()).containsEntry("reasons", "weights").containsEntry("weights", "2:tied,4:robust")
                .containsEntry("margin", "2").containsEntry("marginProven", "true").containsKeys("runnerUp", "atStake", "weight.2");
        assertThat(review.data()).containsEntry("atStake", "alac: 1 2 4 7")
                .containsEntry("runnerUp", "alac: 1 2 4 5 7 = dhmb: 3 2 5 1 7");
        assertThat(review.message()).isEqualTo("The map of reaction R_KARI may not show the enzyme's carbon fate: "
                + "with a C–C weight of 2 another carbon fate is as cheap (1,2-shift: the carbon group at alac atom 5 leaves "
                + "atom 4 for its neighbour atom 2); the runner-up (dearer by 2 weighted bond edits) "
                + "sends carbons alac: 1 2 4 7 elsewhere (alac: 1 2 4 7 = dhmb: 3 2 5 7); pin the intended map with a "
                + "curated carbon map.");
    }

    @Test
    void flagsTheDioxygenaseWhoseOptimumWalksTheRingOxygen() {
        List<Finding> f = findings(standard, "R_HPPD");
        assertThat(f).extracting(Finding::ruleId).containsExactly("mapping.review");
        assertThat(f.get(0).data()).containsEntry("reasons", "rearrangement");
        assertThat(f.get(0).data().get("rearrangements")).startsWith("a heteroatom moving around a ring: ");
        assertThat(f.get(0).message()).contains("may not show the enzyme's carbon fate: it explains the change by a heteroatom"
                + " moving around a ring: ");
    }

    @Test
    void staysQuietOnAWideEnoughMarginAndFlagsItWhenTheReviewMarginIsRaised() {
        assertThat(findings(standard, "R_TPI")).isEmpty();
        assertThat(findings(wide, "R_TPI")).extracting(Finding::ruleId).containsExactly("mapping.review");
        assertThat(findings(wide, "R_TPI").get(0).data()).containsEntry("reasons", "margin").containsEntry("margin", "2");
        assertThat(findings(wide, "R_TPI").get(0).message()).contains("it beats the runner-up by only 2 weighted bond edits");
    }

    @Test
    void acceptsCuratedMigrationsAsCriterionUndecided() {
        for (String id : List.of("R_KARI_CURATED", "R_HPPD_CURATED")) {
            List<Finding> f = findings(standard, id);
            assertThat(f).as(id).extracting(Finding::ruleId).containsExactly("mapping.curated-undecided");
            assertThat(f.get(0).severity()).isEqualTo(Severity.INFO);
            CuratedVerdict v = standard.mapping().curated().get(id);
            assertThat(v.agrees()).isFalse();
            assertThat(v.undecided()).isTrue();
            assertThat(f.get(0).data()).containsEntry("extraCost", Integer.toString(v.extraCost()));
        }
        assertThat(standard.mapping().curated().get("R_KARI_CURATED").extraCost()).isEqualTo(2);
        assertThat(standard.mapping().curated().get("R_HPPD_CURATED").extraCost()).isEqualTo(4);
    }

    @Test
    void acceptsThePinnedRunnerUpOfAnUnflaggedReactionOnlyWithinTheReviewMargin() {
        assertThat(findings(standard, "R_TPI_PINNED")).extracting(Finding::ruleId).containsExactly("mapping.curated-differs");
        assertThat(standard.mapping().curated().get("R_TPI_PINNED").undecided()).isFalse();
        assertThat(findings(wide, "R_TPI_PINNED")).extracting(Finding::ruleId).containsExactly("mapping.curated-undecided");
        assertThat(wide.mapping().curated().get("R_TPI_PINNED").extraCost()).isEqualTo(2);
    }
}
