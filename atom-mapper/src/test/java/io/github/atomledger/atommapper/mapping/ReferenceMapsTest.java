package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Issue 16: the confidence analysis against reference carbon maps from the literature. Two groups:
 * reactions whose enzyme moves a carbon group or rearranges a skeleton (mechanism and labelling
 * studies, each named beside its map), where minimum bond edits is known to go wrong; and
 * controls it gets right (transaminations, decarboxylations, isomerases, aldolases and the
 * central-carbon set of the other tests). A map "agrees" when the reported map sends the
 * reference's carbons where the reference does, up to symmetry (for an ambiguous result, the map it
 * reports). Every map that disagrees must call for review ({@link MapConfidence#reviewReasons} at
 * the default review margin); at most one in twenty that agree may. The table printed
 * here (also written to {@code target/reference-maps.txt}) is the one in BENCHMARKS.md.
 */
class ReferenceMapsTest {

    private static final String COMMON = "common practice (textbook biochemistry, from memory)";

    record Reference(String id, String reaction, String map, boolean rearrangement, String source) {
    }

    /** One reference, mapped. */
    record Outcome(Reference reference, MappingResult result, boolean agrees, int referenceExtraCost) {

        boolean flagged(int reviewMargin) {
            return !result.confidence().reviewReasons(reviewMargin).isEmpty();
        }
    }

    static final List<Reference> REFERENCES = List.of(
        new Reference("chorismate mutase", "chor -> pphn",
                "chor 2>pphn 8; chor 4>pphn 7; chor 5>pphn 11; chor 6>pphn 12; chor 13>pphn 13; chor 15>pphn 15; chor 16>pphn 16; chor 8>pphn 4; chor 9>pphn 6; chor 10>pphn 2",
                true, "Claisen rearrangement: the enol CH2 bonds to ring C1 as the ether C-O breaks; Andrews, Smith & Young, Biochemistry 12:3492 (1973), from memory"),
        new Reference("methylmalonyl-CoA mutase", "mmcoa -> succoa",
                "mmcoa 2>succoa 2; mmcoa 4>succoa 4; mmcoa 5>succoa 5; mmcoa 6>succoa 6", true, "the CoA-thioester group migrates; Retey & Arigoni, Experientia 22:783 (1966), labelling, from memory"),
        new Reference("isobutyryl-CoA mutase", "ibcoa -> btcoa",
                "ibcoa 1>btcoa 1; ibcoa 2>btcoa 2; ibcoa 3>btcoa 3; ibcoa 4>btcoa 4", true, "the carbonyl-CoA group migrates as in methylmalonyl-CoA mutase; Ratnatilleke, Vrijbloed & Robinson, J Biol Chem 274:31679 (1999), from memory"),
        new Reference("glutamate mutase", "glu -> masp",
                "glu 2>masp 2; glu 3>masp 4; glu 4>masp 3; glu 5>masp 5; glu 8>masp 8", true, "the glycyl group moves from C3 to C4; Buckel & Golding, Annu Rev Microbiol 60:27 (2006), review, from memory"),
        new Reference("ketol-acid reductoisomerase, acetolactate", "alac -> dhmb",
                "alac 7>dhmb 7; alac 4>dhmb 5; alac 2>dhmb 2; alac 1>dhmb 1; alac 5>dhmb 3", true, "the C2 methyl migrates to C3 before the reduction; Arfin & Umbarger, J Biol Chem 244:1118 (1969), from memory"),
        new Reference("ketol-acid reductoisomerase, acetohydroxybutanoate", "ahb -> dhmp",
                "ahb 2>dhmp 3; ahb 4>dhmp 6; ahb 8>dhmp 8; ahb 1>dhmp 4; ahb 6>dhmp 2; ahb 7>dhmp 1", true, "the C2 ethyl migrates to C3; Dumas, Biou, Halgand, Douce & Duggleby, Acc Chem Res 34:399 (2001), review, from memory"),
        new Reference("4-hydroxyphenylpyruvate dioxygenase", "hpp + o2 -> hgen + co2",
                "hpp 2>co2 2; hpp 4>hgen 2; hpp 6>hgen 4; hpp 7>hgen 11; hpp 8>hgen 5; hpp 9>hgen 6; hpp 10>hgen 7; hpp 12>hgen 9; hpp 13>hgen 10",
                true, "the side chain moves to the neighbouring ring carbon (NIH shift), C1 leaves as CO2; Moran, Arch Biochem Biophys 433:117 (2005), review, from memory"),
        new Reference("4-hydroxyphenylacetate 1-hydroxylase", "hpac + o2 -> hgen + h2o",
                "hpac 2>hgen 2; hpac 4>hgen 4; hpac 5>hgen 11; hpac 6>hgen 5; hpac 7>hgen 6; hpac 8>hgen 7; hpac 10>hgen 9; hpac 11>hgen 10",
                true, "hydroxylation at C1 with side-chain migration; Hareland, Crawford, Chapman & Dagley, J Bacteriol 121:272 (1975), from memory"),
        new Reference("alanine transaminase", "ala + akg -> pyr + glu",
                "ala 1>pyr 1; ala 2>pyr 2; ala 4>pyr 4; akg 8>glu 8; akg 6>glu 2; akg 5>glu 3; akg 4>glu 4; akg 2>glu 5", false, COMMON),
        new Reference("aspartate transaminase", "asp + akg -> oaa + glu",
                "asp 2>oaa 5; asp 3>oaa 4; asp 4>oaa 2; asp 7>oaa 7; akg 8>glu 8; akg 6>glu 2; akg 5>glu 3; akg 4>glu 4; akg 2>glu 5", false, COMMON),
        new Reference("leucine transaminase", "leu + akg -> kic + glu",
                "leu 1>kic 1; leu 3>kic 3; leu 2>kic 2; leu 4>kic 4; leu 5>kic 5; leu 7>kic 7; akg 8>glu 8; akg 6>glu 2; akg 5>glu 3; akg 4>glu 4; akg 2>glu 5", false, COMMON),
        new Reference("isoleucine transaminase", "ile + akg -> kmv + glu",
                "ile 1>kmv 1; ile 2>kmv 2; ile 3>kmv 3; ile 4>kmv 4; ile 5>kmv 5; ile 7>kmv 7; akg 8>glu 8; akg 6>glu 2; akg 5>glu 3; akg 4>glu 4; akg 2>glu 5", false, COMMON),
        new Reference("pyruvate decarboxylase", "pyr -> acald + co2", "pyr 1>acald 1; pyr 2>acald 2; pyr 4>co2 2", false, COMMON),
        new Reference("oxaloacetate decarboxylase", "oaa -> pyr + co2", "oaa 2>co2 2; oaa 4>pyr 1; oaa 5>pyr 2; oaa 7>pyr 4", false, COMMON),
        new Reference("glutamate decarboxylase", "glu -> gaba + co2", "glu 8>co2 2; glu 2>gaba 2; glu 3>gaba 3; glu 4>gaba 4; glu 5>gaba 5", false, COMMON),
        new Reference("2-oxo-3-methylvalerate dehydrogenase", "kmv + coa -> mbcoa + co2",
                "kmv 1>mbcoa 1; kmv 2>mbcoa 2; kmv 3>mbcoa 3; kmv 4>mbcoa 4; kmv 5>mbcoa 5; kmv 7>co2 2", false, COMMON),
        new Reference("ribose-5-phosphate isomerase", "r5p -> ru5p", "r5p 2>ru5p 2; r5p 13>ru5p 3; r5p 11>ru5p 5; r5p 4>ru5p 7; r5p 5>ru5p 9", false, COMMON),
        new Reference("ribulose-phosphate 3-epimerase", "ru5p -> xu5p", "ru5p 2>xu5p 2; ru5p 3>xu5p 3; ru5p 5>xu5p 5; ru5p 7>xu5p 7; ru5p 9>xu5p 9", false, COMMON),
        new Reference("isopentenyl-diphosphate isomerase", "ipp -> dmpp", "ipp 1>dmpp 1; ipp 2>dmpp 2; ipp 3>dmpp 3; ipp 4>dmpp 4; ipp 5>dmpp 5", false, "the double bond moves, carbons stay (common practice, from memory)"),
        new Reference("phosphoglucomutase", "g6p -> g1p", "g6p 2>g1p 5; g6p 15>g1p 11; g6p 13>g1p 13; g6p 11>g1p 15; g6p 4>g1p 3; g6p 5>g1p 2", false, COMMON),
        new Reference("lysine 2,3-aminomutase", "lys -> blys", "lys 2>blys 2; lys 3>blys 3; lys 4>blys 4; lys 5>blys 5; lys 6>blys 7; lys 8>blys 8", false, "the amino group moves from C2 to C3, carbons stay; Frey, Chem Rev 90:1343 (1990), review, from memory"),
        new Reference("threonine aldolase", "thr -> gly + acald", "thr 1>acald 1; thr 2>acald 2; thr 4>gly 2; thr 6>gly 3", false, COMMON),
        new Reference("KDPG aldolase", "kdpg -> pyr + g3p", "kdpg 2>pyr 4; kdpg 4>pyr 2; kdpg 6>pyr 1; kdpg 7>g3p 2; kdpg 9>g3p 3; kdpg 11>g3p 5", false, COMMON),
        new Reference("deoxyribose-phosphate aldolase", "drp -> g3p + acald", "drp 2>acald 2; drp 3>acald 1; drp 4>g3p 2; drp 6>g3p 3; drp 8>g3p 5", false, COMMON),
        // the central-carbon and catabolism set of CentralCarbonMappingTest and CatabolismMappingTest
        new Reference("hexokinase", "glc + atp -> g6p + adp", "glc 5>g6p 2; glc 7>g6p 15; glc 9>g6p 13; glc 11>g6p 11; glc 3>g6p 4; glc 2>g6p 5", false, COMMON),
        new Reference("phosphoglucose isomerase", "g6p -> f6p", "g6p 2>f6p 2; g6p 15>f6p 3; g6p 13>f6p 15; g6p 11>f6p 13; g6p 4>f6p 6; g6p 5>f6p 7", false, COMMON),
        new Reference("phosphofructokinase", "f6p + atp -> fbp + adp", "f6p 2>fbp 6; f6p 3>fbp 7; f6p 15>fbp 19; f6p 13>fbp 17; f6p 6>fbp 10; f6p 7>fbp 11", false, COMMON),
        new Reference("aldolase", "fbp -> dhap + g3p", "fbp 6>dhap 5; fbp 7>dhap 3; fbp 19>dhap 2; fbp 17>g3p 2; fbp 10>g3p 3; fbp 11>g3p 5", false, COMMON),
        new Reference("triose phosphate isomerase", "dhap -> g3p", "dhap 5>g3p 5; dhap 3>g3p 3; dhap 2>g3p 2", false, COMMON),
        new Reference("GAPDH", "g3p + pi + nad -> bpg + nadh", "g3p 2>bpg 2; g3p 3>bpg 8; g3p 5>bpg 10", false, COMMON),
        new Reference("phosphoglycerate kinase", "bpg + adp -> pg3 + atp", "bpg 2>pg3 2; bpg 8>pg3 4; bpg 10>pg3 6", false, COMMON),
        new Reference("phosphoglycerate mutase", "pg3 -> pg2", "pg3 2>pg2 2; pg3 4>pg2 4; pg3 6>pg2 10", false, COMMON),
        new Reference("enolase", "pg2 -> pep + h2o", "pg2 2>pep 2; pg2 4>pep 4; pg2 10>pep 5", false, COMMON),
        new Reference("pyruvate kinase", "pep + adp -> pyr + atp", "pep 2>pyr 4; pep 4>pyr 2; pep 5>pyr 1", false, COMMON),
        new Reference("transketolase 1", "xu5p + r5p -> g3p + s7p", "xu5p 2>s7p 2; xu5p 3>s7p 3; xu5p 5>g3p 2; xu5p 7>g3p 3; xu5p 9>g3p 5; r5p 2>s7p 5; r5p 13>s7p 7; r5p 11>s7p 9; r5p 4>s7p 11; r5p 5>s7p 13", false, COMMON),
        new Reference("transaldolase", "s7p + g3p -> e4p + f6p", "s7p 2>f6p 2; s7p 3>f6p 3; s7p 5>f6p 15; s7p 7>e4p 2; s7p 9>e4p 3; s7p 11>e4p 5; s7p 13>e4p 7; g3p 2>f6p 13; g3p 3>f6p 6; g3p 5>f6p 7", false, COMMON),
        new Reference("transketolase 2", "xu5p + e4p -> g3p + f6p", "xu5p 2>f6p 2; xu5p 3>f6p 3; xu5p 5>g3p 2; xu5p 7>g3p 3; xu5p 9>g3p 5; e4p 2>f6p 15; e4p 3>f6p 13; e4p 5>f6p 6; e4p 7>f6p 7", false, COMMON),
        new Reference("pyruvate dehydrogenase", "pyr + coa -> accoa + co2", "pyr 1>accoa 1; pyr 2>accoa 2; pyr 4>co2 2", false, COMMON),
        new Reference("isocitrate dehydrogenase", "icit -> akg + co2", "icit 11>co2 2; icit 8>akg 8; icit 6>akg 6; icit 5>akg 5; icit 4>akg 4; icit 2>akg 2", false, COMMON),
        new Reference("2-oxoglutarate dehydrogenase", "akg + coa -> succoa + co2", "akg 8>co2 2; akg 6>succoa 6; akg 5>succoa 5; akg 4>succoa 4; akg 2>succoa 2", false, COMMON),
        new Reference("succinyl-CoA synthetase", "succoa + adp + pi -> succ + atp + coa", "succoa 6>succ 6; succoa 5>succ 5; succoa 4>succ 4; succoa 2>succ 2", false, COMMON),
        new Reference("succinate dehydrogenase", "succ -> fum", "succ 2>fum 2; succ 4>fum 4; succ 5>fum 5; succ 6>fum 6", false, COMMON),
        new Reference("fumarase", "fum + h2o -> mal", "fum 2>mal 2; fum 4>mal 4; fum 5>mal 5; fum 6>mal 7", false, COMMON),
        new Reference("malate dehydrogenase", "mal -> oaa", "mal 2>oaa 2; mal 4>oaa 4; mal 5>oaa 5; mal 7>oaa 7", false, COMMON),
        new Reference("pyruvate carboxylase", "pyr + hco3 + atp -> oaa + adp + pi", "pyr 1>oaa 4; pyr 2>oaa 5; pyr 4>oaa 7; hco3 2>oaa 2", false, COMMON),
        new Reference("PEP carboxylase", "pep + hco3 -> oaa + pi", "pep 2>oaa 7; pep 4>oaa 5; pep 5>oaa 4; hco3 2>oaa 2", false, COMMON),
        new Reference("isocitrate lyase", "icit -> succ + glx", "icit 6>glx 2; icit 8>glx 3; icit 2>succ 2; icit 4>succ 4; icit 5>succ 5; icit 11>succ 6", false, COMMON),
        new Reference("malate synthase", "glx + accoa + h2o -> mal + coa", "accoa 1>mal 4; accoa 2>mal 2; glx 2>mal 5; glx 3>mal 7", false, COMMON),
        new Reference("citrate synthase", "accoa + oaa + h2o -> cit + coa", "accoa 1>cit 4; accoa 2>cit 2; oaa 4>cit 7; oaa 2>cit 8; oaa 5>cit 5; oaa 7>cit 11", false, COMMON),
        new Reference("aconitase", "cit -> icit", "cit 7>icit 6; cit 8>icit 8; cit 5>icit 5; cit 11>icit 11; cit 4>icit 4; cit 2>icit 2", false, COMMON),
        new Reference("2-oxoisocaproate dehydrogenase", "kic + coa -> ivcoa + co2", "kic 7>co2 2; kic 5>ivcoa 5; kic 4>ivcoa 4; kic 2>ivcoa 2; kic 1>ivcoa 1; kic 3>ivcoa 3", false, COMMON),
        new Reference("acetoacetyl-CoA thiolase", "acacoa + coa -> 2 accoa", "acacoa 1>accoa 1; acacoa 2>accoa 2; acacoa 4>accoa#2 1; acacoa 5>accoa#2 2", false, COMMON),
        new Reference("methylcrotonyl-CoA carboxylase", "mcrcoa + hco3 + atp -> mglcoa + adp + pi", "hco3 2>mglcoa 2; mcrcoa 1>mglcoa 4; mcrcoa 3>mglcoa 6; mcrcoa 2>mglcoa 5; mcrcoa 4>mglcoa 7; mcrcoa 5>mglcoa 8", false, COMMON),
        new Reference("succinyl-CoA:acetoacetate CoA-transferase", "succoa + acac -> succ + acacoa", "succoa 2>succ 2; succoa 4>succ 4; succoa 5>succ 5; succoa 6>succ 6; acac 1>acacoa 1; acac 2>acacoa 2; acac 4>acacoa 4; acac 5>acacoa 5", false, COMMON),
        new Reference("phenylalanine hydroxylase", "phe + o2 + bh4 -> tyr + h2o + bh2", "phe 2>tyr 2; phe 3>tyr 3; phe 4>tyr 4; phe 5>tyr 5; phe 6>tyr 6; phe 7>tyr 7; phe 8>tyr 9; phe 9>tyr 10; phe 10>tyr 11", false, COMMON),
        new Reference("2-amino-3-oxobutanoate glycine-lyase", "akb + coa -> gly + accoa", "akb 1>accoa 1; akb 2>accoa 2; akb 4>gly 2; akb 6>gly 3", false, COMMON));

    private static final List<Outcome> OUTCOMES = new ArrayList<>();

    @BeforeAll
    static void mapAll() throws IOException {
        Reactions fixtures = ReferenceMetabolites.all();
        // Generous budgets so that no result depends on the machine's load.
        AtomMapper mapper = new AtomMapper(MappingOptions.defaults().withTimeBudget(Duration.ofSeconds(60))
                .withConfidenceBudget(Duration.ofSeconds(60)));
        StringBuilder table = new StringBuilder();
        for (Reference ref : REFERENCES) {
            ReactionInput input = fixtures.reaction(ref.id(), ref.reaction());
            MappingResult r = mapper.map(input);
            List<AtomTransition> want = Reactions.carbons(ref.map());
            List<AtomRef> from = want.stream().map(AtomTransition::from).toList();
            List<AtomTransition> got = r.carbonTransitions().stream().filter(t -> from.contains(t.from())).toList();
            boolean agrees = got.size() == want.size() && AtomMapper.sameUpToSymmetry(input, got, want);
            int extra = agrees ? 0 : mapper.map(input, want).cost() - r.cost();
            Outcome o = new Outcome(ref, r, agrees, extra);
            OUTCOMES.add(o);
            MapConfidence c = r.confidence();
            List<String> weights = new ArrayList<>();
            c.weights().forEach(w -> weights.add(w.carbonCarbonWeight() + ":" + w.outcome().label()));
            table.append(String.format("| %s | %s | %s | %d | %s%d | %s | %s | %s |%n", ref.id(), r.status().label(),
                    agrees ? "agrees" : "differs (reference +" + extra + ")", r.cost(), c.marginProven() ? "" : ">=",
                    c.margin(), c.rearrangements().stream().map(x -> x.kind().label()).distinct().toList(),
                    String.join(" ", weights), o.flagged(MapConfidence.DEFAULT_REVIEW_MARGIN) ? "review" : ""));
        }
        for (int t = 0; t <= 4; t++) {
            int finalT = t;
            table.append(String.format("review margin %d: %d of %d agreeing flagged, %d of %d differing flagged%n", t,
                    OUTCOMES.stream().filter(o -> o.agrees() && o.flagged(finalT)).count(),
                    OUTCOMES.stream().filter(Outcome::agrees).count(),
                    OUTCOMES.stream().filter(o -> !o.agrees() && o.flagged(finalT)).count(),
                    OUTCOMES.stream().filter(o -> !o.agrees()).count()));
        }
        System.out.print(table);
        Files.createDirectories(Path.of("target"));
        Files.writeString(Path.of("target", "reference-maps.txt"), table.toString());
    }

    @Test
    void flagsEveryMapThatDiffersFromItsReference() {
        assertThat(OUTCOMES.stream().filter(o -> !o.agrees()))
                .isNotEmpty()
                .allSatisfy(o -> assertThat(o.flagged(MapConfidence.DEFAULT_REVIEW_MARGIN)).as("%s", o.reference().id())
                        .isTrue());
    }

    @Test
    void flagsAtMostOneInTwentyMapsThatAgree() {
        long agreeing = OUTCOMES.stream().filter(Outcome::agrees).count();
        long flagged = OUTCOMES.stream().filter(o -> o.agrees() && o.flagged(MapConfidence.DEFAULT_REVIEW_MARGIN)).count();
        assertThat(agreeing).isGreaterThanOrEqualTo(40);
        assertThat(flagged * 20).as("%d of %d agreeing maps flagged", flagged, agreeing).isLessThanOrEqualTo(agreeing);
    }

    @Test
    void getsTheControlsRightAndTheMigrationsWrong() {
        // The premise of the issue, kept honest: minimum bond edits misses the carbon migrations
        // (except the sigmatropic one) and gets every control right.
        assertThat(OUTCOMES.stream().filter(o -> !o.reference().rearrangement())).allSatisfy(o ->
                assertThat(o.agrees()).as("%s", o.reference().id()).isTrue());
        assertThat(OUTCOMES.stream().filter(o -> o.reference().rearrangement() && o.agrees())
                .map(o -> o.reference().id())).containsExactly("chorismate mutase");
    }
}
