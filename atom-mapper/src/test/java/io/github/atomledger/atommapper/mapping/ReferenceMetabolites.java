package io.github.atomledger.atommapper.mapping;

/**
 * Molecules of the reference-map set ({@link ReferenceMapsTest}) beyond {@link Metabolites}:
 * SMILES written from memory (neutral forms; open chains unless noted), each checked against the
 * molecular formula of that form (from memory, as in ChEBI for the neutral species). Atom indices
 * the references use are noted per molecule (1-based, heavy atoms in SMILES order).
 */
final class ReferenceMetabolites {

    private ReferenceMetabolites() {
    }

    static Reactions all() {
        return Metabolites.all()
                // chorismate: carboxyl 2, ring C1 4, C2 5, C3 6, ether O 7, enol C 8, CH2 9, carboxyl 10, C4 13, C5 15, C6 16
                .mol("chor", "OC(=O)C1=CC(OC(=C)C(=O)O)C(O)C=C1", "C10H10O6")
                // prephenate: side-chain carboxyl 2, keto C 4, CH2 6, ring C1 7, ring carboxyl 8, C2 11, C3 12, C4 13, C5 15, C6 16
                .mol("pphn", "OC(=O)C(=O)CC1(C(=O)O)C=CC(O)C=C1", "C10H10O6")
                // (S)-2-acetolactate: acetyl methyl 1, keto C3 2, C2 4, C2 methyl 5, carboxyl 7
                .mol("alac", "CC(=O)C(C)(O)C(=O)O", "C5H8O4")
                // 2,3-dihydroxy-3-methylbutanoate: methyls 1 3, C3 2, C2 5, carboxyl 7
                .mol("dhmb", "CC(C)(O)C(O)C(=O)O", "C5H10O4")
                // 2-aceto-2-hydroxybutanoate: acetyl methyl 1, keto C 2, C2 4, ethyl 6 7, carboxyl 8
                .mol("ahb", "CC(=O)C(O)(CC)C(=O)O", "C6H10O4")
                // 2,3-dihydroxy-3-methylpentanoate: ethyl 1 2, C3 3, methyl 4, C2 6, carboxyl 8
                .mol("dhmp", "CCC(C)(O)C(O)C(=O)O", "C6H12O4")
                // 4-hydroxyphenylpyruvate: carboxyl 2, keto C 4, CH2 6, ring C1 7, C2 8, C3 9, C4 10 (OH 11), C5 12, C6 13
                .mol("hpp", "OC(=O)C(=O)Cc1ccc(O)cc1", "C9H8O4")
                // 4-hydroxyphenylacetate: carboxyl 2, CH2 4, ring C1 5, C2 6, C3 7, C4 8 (OH 9), C5 10, C6 11
                .mol("hpac", "OC(=O)Cc1ccc(O)cc1", "C8H8O3")
                // homogentisate (2,5-dihydroxyphenylacetate): carboxyl 2, CH2 4, ring C1 5, C6 6, C5 7 (OH 8), C4 9, C3 10, C2 11 (OH 12)
                .mol("hgen", "OC(=O)Cc1cc(O)ccc1O", "C8H8O4")
                // (2S,3S)-3-methylaspartate: C2 2, C3 3, methyl 4, C4 5, C1 8
                .mol("masp", "NC(C(C)C(=O)O)C(=O)O", "C5H9NO4")
                // isobutyryl-CoA: methyls 1 3, C2 2, C1 4
                .mol("ibcoa", "CC(C)C(=O)" + Metabolites.COA, "C25H42N7O17P3S")
                // butyryl-CoA: C4 1, C3 2, C2 3, C1 4
                .mol("btcoa", "CCCC(=O)" + Metabolites.COA, "C25H42N7O17P3S")
                // L-alanine: C3 1, C2 2, C1 4
                .mol("ala", "CC(N)C(=O)O", "C3H7NO2")
                // 4-aminobutanoate: C4 2, C3 3, C2 4, C1 5
                .mol("gaba", "NCCCC(=O)O", "C4H9NO2")
                // D-ribulose 5-phosphate and D-xylulose 5-phosphate differ in stereo only: C1 2, C2 3, C3 5, C4 7, C5 9
                .mol("ru5p", "OCC(=O)C(O)C(O)COP(=O)(O)O", "C5H11O8P")
                // isopentenyl diphosphate: methyl 1, C3 2, =CH2 3, C2 4, C1 5
                .mol("ipp", "CC(=C)CCOP(=O)(O)OP(=O)(O)O", "C5H12O7P2")
                // dimethylallyl diphosphate: methyls 1 3, C3 2, C2 4, C1 5
                .mol("dmpp", "CC(C)=CCOP(=O)(O)OP(=O)(O)O", "C5H12O7P2")
                // alpha-D-glucose 1-phosphate (ring): C6 2, C5 3, C1 5, C2 11, C3 13, C4 15
                .mol("g1p", "OCC1OC(OP(=O)(O)O)C(O)C(O)C1O", "C6H13O9P")
                // L-lysine: C6 2, C5 3, C4 4, C3 5, C2 6, C1 8
                .mol("lys", "NCCCCC(N)C(=O)O", "C6H14N2O2")
                // (3S)-3,6-diaminohexanoate (beta-lysine): C6 2, C5 3, C4 4, C3 5, C2 7, C1 8
                .mol("blys", "NCCCC(N)CC(=O)O", "C6H14N2O2")
                // L-threonine: C4 1, C3 2, C2 4, C1 6
                .mol("thr", "CC(O)C(N)C(=O)O", "C4H9NO3")
                // 2-dehydro-3-deoxy-6-phosphogluconate: C1 2, C2 4, C3 6, C4 7, C5 9, C6 11
                .mol("kdpg", "OC(=O)C(=O)CC(O)C(O)COP(=O)(O)O", "C6H11O9P")
                // 2-deoxy-D-ribose 5-phosphate (aldehyde form): C1 2, C2 3, C3 4, C4 6, C5 8
                .mol("drp", "O=CCC(O)C(O)COP(=O)(O)O", "C5H11O7P");
    }
}
