package io.github.atomledger.atommapper.depict;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Pictures CDK cannot lay out the usual way still come out, with a note (issue #12). The mapped
 * reaction below is our own regression case, minimised from yeast-GEM r_0942 (protoporphyrinogen
 * oxidase with a best-found map spreading each product's carbons over both substrate copies) by
 * dropping molecules and atom pairs while CDK 2.11's mapped-reaction layout still threw a
 * NullPointerException in RingPlacer: two macrocycles whose map scrambles the ring atoms.
 */
class ReactionPictureFallbackTest {

    static final String MACROCYCLES = "[C:9]1[CH2:10][C:11]=[C:12][C:13]=[C:14][CH2:16][C:17]2=[C:18][C:19]="
            + "[C:20]([NH:21]2)[CH2:22][C:23]3=[C:24][C:25]=[C:26]([NH:27]3)[CH2:28][C:29][NH:36]1>>[C:24]1=[C:23]"
            + "[C:71]=[CH:70][C:68][C:55]=[C:56][C:89]=[CH:90][C:65][C:64]=[C:62][C:87]=[CH:72][C:50][NH:21][C:20]"
            + "[CH:26]=[C:25]1";

    @Test
    void layoutFailureOfTheMappedReactionFallsBackToOneMoleculeAtATimeAndSaysSo() {
        ReactionPicture.Drawing d = ReactionPicture.of("R_MACRO", MACROCYCLES, List.of("ring_a"), List.of("ring_b"))
                .titles(java.util.Map.of("ring_a", "macrocycle A")).atomIndices(true).draw();
        assertThat(d.drawn()).isTrue();
        assertThat(d.notes()).containsExactly("CDK could not lay out the mapped reaction (NullPointerException in "
                + "RingPlacer: Cannot read field \"x\" because \"a\" is null), so each molecule was laid out on its own "
                + "and products are not turned to match their reactants.");
        assertThat(d.svg()).contains(">macrocycle A</text>").contains(">ring_b</text>");
        assertThat(d.width()).isPositive();
    }

    @Test
    void unreadableMappedSmilesIsANoteNotAnException() {
        ReactionPicture.Drawing d = ReactionPicture.of("R_BAD", "C1CC>>CC", List.of("a"), List.of("b")).draw();
        assertThat(d.drawn()).isFalse();
        assertThat(d.notes()).singleElement().asString().startsWith("CDK cannot read the mapped SMILES of R_BAD (");
    }

    @Test
    void sameInputGivesTheSameBytesAndTheStyleKeyNamesTheVersions() {
        String a = ReactionPicture.of("R_MACRO", MACROCYCLES, List.of(), List.of()).svg();
        assertThat(ReactionPicture.of("R_MACRO", MACROCYCLES, List.of(), List.of()).svg()).isEqualTo(a);
        assertThat(ReactionPicture.styleKey()).startsWith("style=" + ReactionPicture.STYLE_VERSION + ";cdk=2.");
    }
}
