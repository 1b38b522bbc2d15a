package io.github.atomledger.atommapper.depict;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.structure.Structure;

import java.awt.Color;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * A traced step: fructose-bisphosphate aldolase with FBP numbered C1..C6 by atom classes, C1–C3
 * going to DHAP and C4–C6 to glyceraldehyde 3-phosphate (textbook glycolysis, from memory; the
 * same split as {@code ReactionPictureTest}). Only C1 and C6 are followed here.
 */
class TracedStepPictureTest {

    private static final String FBP = "OP(=O)(O)O[CH2:1][C:2]1(O)O[CH:5]([CH2:6]OP(=O)(O)O)[CH:4](O)[CH:3]1O";
    private static final String DHAP = "O[CH2:3][C:2](=O)[CH2:1]OP(=O)(O)O";
    private static final String G3P = "O=[CH:1][CH:2](O)[CH2:3]OP(=O)(O)O";

    private static String hex(Color c) {
        return String.format(Locale.ROOT, "#%02X%02X%02X", c.getRed(), c.getGreen(), c.getBlue());
    }

    private static TracedStepPicture.Molecule molecule(String smiles, String title, int[] map, int[] keys, String[] labels)
            throws Exception {
        return new TracedStepPicture.Molecule(Structure.fromSmiles(smiles), title, map, keys, labels);
    }

    static TracedStepPicture aldolase() throws Exception {
        // FBP heavy atoms: 1-4 phosphate O/P, 5 O, 6 C1, 7 C2, 8 O, 9 O, 10 C5, 11 C6, 12 O, ..., 17 C4, 18 O, 19 C3, 20 O
        int[] fbpMap = new int[20];
        for (int i = 0; i < 20; i++) {
            fbpMap[i] = i + 1;
        }
        int[] fbpKeys = new int[20];
        String[] fbpLabels = new String[20];
        fbpKeys[5] = 1;
        fbpLabels[5] = "C1";
        fbpKeys[10] = 2;
        fbpLabels[10] = "C6";
        // DHAP: 1 O, 2 C3, 3 C2, 4 O, 5 C1, then phosphate; G3P: 1 O, 2 C1, 3 C2, 4 O, 5 C3, then phosphate
        int[] dhapMap = {0, 19, 7, 0, 6, 0, 0, 0, 0, 0};
        int[] g3pMap = {0, 17, 10, 0, 11, 0, 0, 0, 0, 0};
        return TracedStepPicture.of("R_FBA",
                List.of(molecule(FBP, "fructose 1,6-bisphosphate", fbpMap, fbpKeys, fbpLabels)),
                List.of(molecule(DHAP, "DHAP", dhapMap, new int[] {0, 0, 0, 0, 1, 0, 0, 0, 0, 0},
                                new String[] {null, null, null, null, "C1", null, null, null, null, null}),
                        molecule(G3P, "G3P", g3pMap, new int[] {0, 0, 0, 0, 2, 0, 0, 0, 0, 0},
                                new String[] {null, null, null, null, "C6", null, null, null, null, null})));
    }

    @Test
    void drawsEachFollowedCarbonInItsKeyColourAndTheRestMuted() throws Exception {
        String svg = aldolase().svg();
        Path out = Path.of("target", "depict");
        Files.createDirectories(out);
        Files.writeString(out.resolve("traced-R_FBA.svg"), svg);
        assertThat(svg).startsWith("<?xml").contains("<svg");
        assertThat(svg.toUpperCase(Locale.ROOT)).contains(hex(TracedStepPicture.colour(1)), hex(TracedStepPicture.colour(2)),
                hex(TracedStepPicture.MUTED));
        assertThat(svg.toUpperCase(Locale.ROOT)).doesNotContain(hex(TracedStepPicture.colour(3)));
        assertThat(aldolase().svg()).isEqualTo(svg);
    }

    @Test
    void cyclesColoursAndRefusesKeyZero() {
        assertThat(TracedStepPicture.colour(1)).isEqualTo(ReactionPicture.PALETTE.get(0));
        assertThat(TracedStepPicture.colour(ReactionPicture.PALETTE.size() + 1)).isEqualTo(ReactionPicture.PALETTE.get(0));
        assertThatThrownBy(() -> TracedStepPicture.colour(0)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void refusesArraysThatDoNotFitTheStructure() {
        assertThatThrownBy(() -> molecule(DHAP, "DHAP", new int[2], new int[10], new String[10]))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("expected 10");
    }
}
