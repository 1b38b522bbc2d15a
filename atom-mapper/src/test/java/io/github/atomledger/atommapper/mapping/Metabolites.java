package io.github.atomledger.atommapper.mapping;

/**
 * The test metabolites: SMILES written from memory (neutral forms unless noted; ring forms for
 * glucose, glucose 6-phosphate, fructose phosphates and ribose 5-phosphate; open chains for
 * trioses, tetroses, ketopentoses and sedoheptulose 7-phosphate), each checked against the
 * molecular formula of that form (from memory, as in ChEBI for the neutral species). Atom indices
 * used by the tests are noted per molecule (1-based, heavy atoms in SMILES order).
 */
final class Metabolites {

    /** Coenzyme A after its sulfur: acyl-CoA SMILES are the acyl group followed by this. */
    static final String COA = "SCCNC(=O)CCNC(=O)C(O)C(C)(C)COP(=O)(O)OP(=O)(O)OCC1OC(C(O)C1OP(=O)(O)O)n1cnc2c(N)ncnc12";
    private static final String ADENOSINE = "n1cnc2c(N)ncnc12";

    private Metabolites() {
    }

    static Reactions all() {
        return new Reactions()
                .mol("h2o", "O", "H2O")
                .mol("co2", "O=C=O", "CO2")                                  // C 2
                .mol("hco3", "OC(=O)[O-]", "CHO3")                            // C 2; bicarbonate anion
                .mol("o2", "O=O", "O2")
                .mol("pi", "OP(=O)(O)O", "H3O4P")
                .mol("atp", "Nc1ncnc2c1ncn2C1OC(COP(=O)(O)OP(=O)(O)OP(=O)(O)O)C(O)C1O", "C10H16N5O13P3")
                .mol("adp", "Nc1ncnc2c1ncn2C1OC(COP(=O)(O)OP(=O)(O)O)C(O)C1O", "C10H15N5O10P2")
                .mol("nad", "NC(=O)c1ccc[n+](c1)C1OC(COP(=O)(O)OP(=O)(O)OCC2OC(C(O)C2O)" + ADENOSINE + ")C(O)C1O",
                        "C21H28N7O14P2")
                .mol("nadh", "NC(=O)C1=CN(C=CC1)C1OC(COP(=O)(O)OP(=O)(O)OCC2OC(C(O)C2O)" + ADENOSINE + ")C(O)C1O",
                        "C21H29N7O14P2")
                .mol("coa", COA, "C21H36N7O16P3S")                           // S 1
                .mol("accoa", "CC(=O)" + COA, "C23H38N7O17P3S")              // methyl 1, C1 2
                .mol("succoa", "OC(=O)CCC(=O)" + COA, "C25H40N7O19P3S")      // C4 2, C3 4, C2 5, C1 6
                .mol("mmcoa", "OC(=O)C(C)C(=O)" + COA, "C25H40N7O19P3S")     // carboxyl 2, C2 4, methyl 5, C1 6
                .mol("acacoa", "CC(=O)CC(=O)" + COA, "C25H40N7O18P3S")       // C4 1, C3 2, C2 4, C1 5
                .mol("ivcoa", "CC(C)CC(=O)" + COA, "C26H44N7O17P3S")         // methyls 1 3, C3 2, C2 4, C1 5
                .mol("mcrcoa", "CC(C)=CC(=O)" + COA, "C26H42N7O17P3S")       // methyls 1 3, C3 2, C2 4, C1 5
                .mol("mglcoa", "OC(=O)CC(C)=CC(=O)" + COA, "C27H42N7O19P3S") // C5 2, C4 4, C3 5, methyl 6, C2 7, C1 8
                .mol("hmgcoa", "OC(=O)CC(C)(O)CC(=O)" + COA, "C27H44N7O20P3S")
                .mol("mbcoa", "CCC(C)C(=O)" + COA, "C26H44N7O17P3S")
                .mol("tigcoa", "CC=C(C)C(=O)" + COA, "C26H42N7O17P3S")
                .mol("mhbcoa", "CC(O)C(C)C(=O)" + COA, "C26H44N7O18P3S")
                .mol("macoa", "CC(=O)C(C)C(=O)" + COA, "C26H42N7O18P3S")
                .mol("ppcoa", "CCC(=O)" + COA, "C24H40N7O17P3S")
                .mol("pyr", "CC(=O)C(=O)O", "C3H4O3")                         // C3 1, C2 2, C1 4
                .mol("acald", "CC=O", "C2H4O")
                .mol("pep", "OC(=O)C(=C)OP(=O)(O)O", "C3H5O6P")               // C1 2, C2 4, C3 5
                .mol("glc", "OCC1OC(O)C(O)C(O)C1O", "C6H12O6")                // C6 2, C5 3, C1 5, C2 7, C3 9, C4 11
                .mol("g6p", "OC1OC(COP(=O)(O)O)C(O)C(O)C1O", "C6H13O9P")      // C1 2, C5 4, C6 5, C4 11, C3 13, C2 15
                .mol("f6p", "OCC1(O)OC(COP(=O)(O)O)C(O)C1O", "C6H13O9P")      // C1 2, C2 3, C5 6, C6 7, C4 13, C3 15
                .mol("fbp", "OP(=O)(O)OCC1(O)OC(COP(=O)(O)O)C(O)C1O", "C6H14O12P2") // C1 6, C2 7, C5 10, C6 11, C4 17, C3 19
                .mol("dhap", "OCC(=O)COP(=O)(O)O", "C3H7O6P")                 // C3 2, C2 3, C1 5
                .mol("g3p", "O=CC(O)COP(=O)(O)O", "C3H7O6P")                  // C1 2, C2 3, C3 5
                .mol("bpg", "O=C(OP(=O)(O)O)C(O)COP(=O)(O)O", "C3H8O10P2")    // C1 2, C2 8, C3 10
                .mol("pg3", "OC(=O)C(O)COP(=O)(O)O", "C3H7O7P")               // C1 2, C2 4, C3 6
                .mol("pg2", "OC(=O)C(OP(=O)(O)O)CO", "C3H7O7P")               // C1 2, C2 4, C3 10
                .mol("xu5p", "OCC(=O)C(O)C(O)COP(=O)(O)O", "C5H11O8P")        // C1 2, C2 3, C3 5, C4 7, C5 9
                .mol("r5p", "OC1OC(COP(=O)(O)O)C(O)C1O", "C5H11O8P")          // C1 2, C4 4, C5 5, C3 11, C2 13
                .mol("s7p", "OCC(=O)C(O)C(O)C(O)C(O)COP(=O)(O)O", "C7H15O10P") // C1 2, C2 3, C3 5 ... C7 13
                .mol("e4p", "O=CC(O)C(O)COP(=O)(O)O", "C4H9O7P")              // C1 2, C2 3, C3 5, C4 7
                .mol("oaa", "OC(=O)CC(=O)C(=O)O", "C4H4O5")                   // C4 2, C3 4, C2 5, C1 7
                .mol("cit", "OC(=O)CC(O)(CC(=O)O)C(=O)O", "C6H8O7")           // arm a 2 4, C3 5, arm b 7 8, C6 11
                .mol("icit", "OC(=O)CC(C(O)C(=O)O)C(=O)O", "C6H8O7")          // 2, CH2 4, CH 5, CHOH 6, 8, 11
                .mol("akg", "OC(=O)CCC(=O)C(=O)O", "C5H6O5")                  // C5 2, C4 4, C3 5, C2 6, C1 8
                .mol("succ", "OC(=O)CCC(=O)O", "C4H6O4")                      // 2 4 5 6
                .mol("fum", "OC(=O)/C=C/C(=O)O", "C4H4O4")                    // 2 4 5 6
                .mol("mal", "OC(=O)CC(O)C(=O)O", "C4H6O5")                    // C4 2, C3 4, C2 5, C1 7
                .mol("glx", "O=CC(=O)O", "C2H2O3")                            // C2 2, C1 3
                .mol("acac", "CC(=O)CC(=O)O", "C4H6O3")                       // C4 1, C3 2, C2 4, C1 5
                .mol("asp", "NC(CC(=O)O)C(=O)O", "C4H7NO4")                   // C2 2, C3 3, C4 4, C1 7
                .mol("glu", "NC(CCC(=O)O)C(=O)O", "C5H9NO4")                  // C2 2, C3 3, C4 4, C5 5, C1 8
                .mol("gly", "NCC(=O)O", "C2H5NO2")                            // C2 2, C1 3
                .mol("akb", "CC(=O)C(N)C(=O)O", "C4H7NO3")                    // C4 1, C3 2, C2 4, C1 6
                .mol("leu", "CC(C)CC(N)C(=O)O", "C6H13NO2")                   // methyls 1 3, C4 2, C3 4, C2 5, C1 7
                .mol("kic", "CC(C)CC(=O)C(=O)O", "C6H10O3")                   // methyls 1 3, C4 2, C3 4, C2 5, C1 7
                .mol("ile", "CCC(C)C(N)C(=O)O", "C6H13NO2")                   // C5 1, C4 2, C3 3, methyl 4, C2 5, C1 7
                .mol("kmv", "CCC(C)C(=O)C(=O)O", "C6H10O3")
                .mol("phe", "NC(Cc1ccccc1)C(=O)O", "C9H11NO2")                // 2 3, ring 4-9, carboxyl 10
                .mol("tyr", "NC(Cc1ccc(O)cc1)C(=O)O", "C9H11NO3")             // 2 3, ring 4-7 9 10, carboxyl 11
                .mol("bh4", "CC(O)C(O)C1CNc2nc(N)[nH]c(=O)c2N1", "C9H15N5O3")
                .mol("bh2", "CC(O)C(O)C1=Nc2c(NC1)nc(N)[nH]c2=O", "C9H13N5O3");
    }
}
