package io.github.atomledger.atommapper.depict;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.mapping.AtomMapper;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.MappingStatus;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.Structure;

import java.awt.Color;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * Pictures of mapped reactions. Fructose-bisphosphate aldolase splits fructose 1,6-bisphosphate
 * (C6) into dihydroxyacetone phosphate and glyceraldehyde 3-phosphate (C3 each): the textbook
 * carbon fate is C1–C3 to DHAP and C4–C6 to G3P (Berg, Tymoczko &amp; Stryer, Biochemistry,
 * glycolysis chapter; from memory). SMILES as in the demo's structures.tsv.
 */
class ReactionPictureTest {

    private static final String FDP = "O[C@H]1[C@H](O)[C@@](O)(COP([O-])([O-])=O)O[C@@H]1COP([O-])([O-])=O";
    private static final String DHAP = "OCC(=O)COP([O-])([O-])=O";
    private static final String G3P = "O=C[C@H](O)COP([O-])([O-])=O";

    private static ReactionInput aldolase() throws Exception {
        return new ReactionInput("R_FBA",
                List.of(new Participant("fdp_c", Structure.fromSmiles(FDP), 1)),
                List.of(new Participant("dhap_c", Structure.fromSmiles(DHAP), 1),
                        new Participant("g3p_c", Structure.fromSmiles(G3P), 1)));
    }

    private static String hex(Color c) {
        return String.format(Locale.ROOT, "#%02X%02X%02X", c.getRed(), c.getGreen(), c.getBlue());
    }

    private static int occurrences(String svg, String colour) {
        Matcher m = Pattern.compile(Pattern.quote(colour), Pattern.CASE_INSENSITIVE).matcher(svg);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    @Test
    void givesEachOfTheSixCarbonsItsOwnColourOnBothSides() throws Exception {
        ReactionInput in = aldolase();
        MappingResult result = new AtomMapper(MappingOptions.defaults()).map(in);
        assertThat(result.status()).isIn(MappingStatus.MAPPED, MappingStatus.AMBIGUOUS);
        String svg = ReactionPicture.of(in, result)
                .titles(Map.of("fdp_c", "fructose 1,6-bisphosphate", "dhap_c", "DHAP", "g3p_c", "G3P")).svg();
        Path out = Path.of("target", "depict");
        Files.createDirectories(out);
        Files.writeString(out.resolve("R_FBA.svg"), svg);
        assertThat(svg).startsWith("<?xml").contains("<svg").contains("px");
        for (int i = 0; i < 6; i++) {
            String colour = hex(ReactionPicture.PALETTE.get(i));
            // one carbon in the substrate and the same carbon in a product: at least two marks
            assertThat(occurrences(svg, colour)).as("colour %s", colour).isGreaterThanOrEqualTo(2);
        }
        assertThat(occurrences(svg, hex(ReactionPicture.PALETTE.get(6)))).as("only six carbons").isZero();
    }

    @Test
    void drawsTheSamePictureTwiceAndAddsNumbersOnRequest() throws Exception {
        ReactionInput in = aldolase();
        MappingResult result = new AtomMapper(MappingOptions.defaults()).map(in);
        String plain = ReactionPicture.of(in, result).svg();
        assertThat(ReactionPicture.of(in, result).svg()).isEqualTo(plain);
        String numbered = ReactionPicture.of(in, result).atomIndices(true).svg();
        Files.writeString(Path.of("target", "depict", "R_FBA-indices.svg"), numbered);
        assertThat(numbered.length()).isGreaterThan(plain.length());
    }

    @Test
    void refusesAResultWithoutAMap() {
        MappingResult none = MappingResult.unmappable("R_X", "a coefficient is not an integer");
        assertThat(ReactionPicture.drawable(none)).isFalse();
        assertThatThrownBy(() -> ReactionPicture.of(new ReactionInput("R_X", List.of(), List.of()), none).svg())
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("R_X").hasMessageContaining("unmappable");
    }
}
