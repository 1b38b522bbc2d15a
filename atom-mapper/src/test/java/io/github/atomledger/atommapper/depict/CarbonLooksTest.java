package io.github.atomledger.atommapper.depict;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.AtomMapper;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.Structure;

import java.awt.Color;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IChemObject;
import org.openscience.cdk.interfaces.IReaction;
import org.openscience.cdk.renderer.elements.MarkedElement;
import org.openscience.cdk.renderer.generators.standard.StandardGenerator;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

/**
 * Issue #13: cofactors muted, only moving or changing carbons coloured, each with a look of its own.
 * Textbook carbon fates (Berg, Tymoczko &amp; Stryer, Biochemistry, citric acid cycle chapter; from
 * memory): citrate synthase joins the acetyl group of acetyl-CoA to oxaloacetate and releases CoA
 * unchanged; pyruvate dehydrogenase splits pyruvate into CO2 and an acetyl group on CoA while NAD+
 * takes a hydride; hexokinase moves a phosphate only. SMILES as in the demo's structures.tsv
 * (acetyl-CoA C23H34N7O17P3S 4-, CoA C21H32N7O16P3S 4-, NAD+ C21H26N7O14P2 1-, ChEBI forms from memory).
 */
class CarbonLooksTest {

    private static final String COA_TAIL = "CCNC(=O)CCNC(=O)[C@H](O)C(C)(C)COP([O-])(=O)OP([O-])(=O)OC[C@H]1O[C@H]"
            + "([C@H](O)[C@@H]1OP([O-])([O-])=O)n1cnc2c(N)ncnc12";
    private static final String ACCOA = "CC(=O)S" + COA_TAIL;
    private static final String COA = "S" + COA_TAIL;
    private static final String OAA = "[O-]C(=O)CC(=O)C([O-])=O";
    private static final String CIT = "OC(CC([O-])=O)(CC([O-])=O)C([O-])=O";
    private static final String PYR = "CC(=O)C([O-])=O";
    private static final String NAD_TAIL = "[C@@H]1O[C@H](COP([O-])(=O)OP([O-])(=O)OC[C@H]2O[C@H]([C@H](O)[C@@H]2O)"
            + "n2cnc3c(N)ncnc23)[C@@H](O)[C@H]1O";
    private static final String NAD = "NC(=O)c1ccc[n+](c1)" + NAD_TAIL;
    private static final String NADH = "NC(=O)C1=CN(C=CC1)" + NAD_TAIL;
    private static final String GLC = "OC[C@H]1OC(O)[C@H](O)[C@@H](O)[C@@H]1O";
    private static final String G6P = "OC1O[C@H](COP([O-])([O-])=O)[C@@H](O)[C@H](O)[C@H]1O";
    private static final String ATP = "Nc1ncnc2c1ncn2[C@@H]1O[C@H](COP([O-])(=O)OP([O-])(=O)OP([O-])([O-])=O)[C@@H](O)[C@H]1O";
    private static final String ADP = "Nc1ncnc2c1ncn2[C@@H]1O[C@H](COP([O-])(=O)OP([O-])([O-])=O)[C@@H](O)[C@H]1O";

    private static Participant p(String id, String smiles) throws Exception {
        return new Participant(id, Structure.fromSmiles(smiles), 1);
    }

    private static IReaction mapped(ReactionInput in) throws Exception {
        MappingResult r = new AtomMapper(MappingOptions.defaults().withTimeBudget(java.time.Duration.ofSeconds(60))).map(in);
        assertThat(r.mappedSmiles()).isNotEmpty();
        return new SmilesParser(SilentChemObjectBuilder.getInstance()).parseReactionSmiles(r.mappedSmiles());
    }

    private static ReactionInput citrateSynthase() throws Exception {
        return new ReactionInput("R_CS", List.of(p("accoa_c", ACCOA), p("h2o_c", "O"), p("oaa_c", OAA)),
                List.of(p("cit_c", CIT), p("coa_c", COA), p("h_c", "[H+]")));
    }

    private static List<IAtom> atoms(IReaction rxn) {
        List<IAtom> out = new ArrayList<>();
        for (IAtomContainer m : rxn.getReactants().atomContainers()) {
            m.atoms().forEach(out::add);
        }
        for (IAtomContainer m : rxn.getProducts().atomContainers()) {
            m.atoms().forEach(out::add);
        }
        return out;
    }

    private static boolean muted(IAtom a) {
        return CarbonLooks.MUTED.equals(a.getProperty(MarkedElement.CLASS_KEY));
    }

    @Test
    void citrateSynthaseColoursTheSixCitrateCarbonsAndMutesCoenzymeA() throws Exception {
        IReaction rxn = mapped(citrateSynthase());
        CarbonLooks looks = CarbonLooks.of(rxn, ReactionPicture.PALETTE);
        assertThat(looks.coloured()).isEqualTo(6);
        assertThat(looks.muted()).isEqualTo(21);
        IAtomContainer coa = rxn.getProducts().getAtomContainer(1);
        for (IAtom a : coa.atoms()) {
            assertThat(muted(a)).as("CoA atom %s", a.getSymbol()).isTrue();
        }
        for (IAtom a : rxn.getProducts().getAtomContainer(0).atoms()) {
            assertThat(muted(a)).as("citrate atom %s", a.getSymbol()).isFalse();
        }
    }

    @Test
    void noTwoColouredCarbonsShareALook() throws Exception {
        IReaction rxn = mapped(citrateSynthase());
        CarbonLooks looks = CarbonLooks.of(rxn, List.of(Color.RED, Color.BLUE));
        Set<String> looksSeen = new HashSet<>();
        for (Map.Entry<Color, List<IChemObject>> e : looks.highlights().entrySet()) {
            for (IChemObject o : e.getValue()) {
                IAtom a = (IAtom) o;
                String label = a.getProperty(StandardGenerator.ANNOTATION_LABEL);
                assertThat(label).isEqualTo(Integer.toString(a.getMapIdx()));
                looksSeen.add(e.getKey() + "/" + label + "/" + (containerOf(rxn, a) != null ? "r" : "p"));
            }
        }
        // six carbons, each once on each side, two colours only: the labels keep all twelve marks distinct
        assertThat(looksSeen).hasSize(12);
    }

    private static IAtomContainer containerOf(IReaction rxn, IAtom a) {
        for (IAtomContainer m : rxn.getReactants().atomContainers()) {
            if (m.contains(a)) {
                return m;
            }
        }
        return null;
    }

    @Test
    void pyruvateDehydrogenaseMutesNadAndCoenzymeA() throws Exception {
        ReactionInput in = new ReactionInput("R_PDH", List.of(p("pyr_c", PYR), p("coa_c", COA), p("nad_c", NAD)),
                List.of(p("accoa_c", ACCOA), p("co2_c", "O=C=O"), p("nadh_c", NADH)));
        IReaction rxn = mapped(in);
        CarbonLooks looks = CarbonLooks.of(rxn, ReactionPicture.PALETTE);
        assertThat(looks.coloured()).isEqualTo(3);
        assertThat(looks.muted()).isEqualTo(42);
        for (IAtom a : rxn.getReactants().getAtomContainer(0).atoms()) {
            assertThat(muted(a)).as("pyruvate atom %s", a.getSymbol()).isFalse();
        }
        String svg = ReactionPicture.of(in, new AtomMapper(MappingOptions.defaults()
                .withTimeBudget(java.time.Duration.ofSeconds(60))).map(in)).svg();
        Files.createDirectories(Path.of("target", "depict"));
        Files.writeString(Path.of("target", "depict", "R_PDH.svg"), svg);
        assertThat(svg).containsPattern("class=['\"]muted[^'\"]*['\"][^>]*opacity=['\"]0\\.3['\"]");
    }

    @Test
    void hexokinaseMovesNoCarbonSoNothingIsColouredOrMuted() throws Exception {
        ReactionInput in = new ReactionInput("R_HEX", List.of(p("glc_c", GLC), p("atp_c", ATP)),
                List.of(p("g6p_c", G6P), p("adp_c", ADP), p("h_c", "[H+]")));
        IReaction rxn = mapped(in);
        CarbonLooks looks = CarbonLooks.of(rxn, ReactionPicture.PALETTE);
        assertThat(looks.coloured()).isZero();
        assertThat(looks.muted()).isZero();
        assertThat(atoms(rxn)).noneMatch(CarbonLooksTest::muted);
    }
}
