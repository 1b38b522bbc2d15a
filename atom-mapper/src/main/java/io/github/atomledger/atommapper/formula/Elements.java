package io.github.atomledger.atommapper.formula;

import java.util.List;
import java.util.Set;

/**
 * The chemical element symbols of the periodic table (IUPAC, elements 1 to 118).
 *
 * <p>A formula symbol outside this set (R, X, Protein, ...) is a "user defined compound" in the
 * sense of the SBML fbc package: a pseudo-element that balances by count like any element.
 */
public final class Elements {

    private static final List<String> SYMBOLS = List.of(
            "H", "He", "Li", "Be", "B", "C", "N", "O", "F", "Ne",
            "Na", "Mg", "Al", "Si", "P", "S", "Cl", "Ar", "K", "Ca",
            "Sc", "Ti", "V", "Cr", "Mn", "Fe", "Co", "Ni", "Cu", "Zn",
            "Ga", "Ge", "As", "Se", "Br", "Kr", "Rb", "Sr", "Y", "Zr",
            "Nb", "Mo", "Tc", "Ru", "Rh", "Pd", "Ag", "Cd", "In", "Sn",
            "Sb", "Te", "I", "Xe", "Cs", "Ba", "La", "Ce", "Pr", "Nd",
            "Pm", "Sm", "Eu", "Gd", "Tb", "Dy", "Ho", "Er", "Tm", "Yb",
            "Lu", "Hf", "Ta", "W", "Re", "Os", "Ir", "Pt", "Au", "Hg",
            "Tl", "Pb", "Bi", "Po", "At", "Rn", "Fr", "Ra", "Ac", "Th",
            "Pa", "U", "Np", "Pu", "Am", "Cm", "Bk", "Cf", "Es", "Fm",
            "Md", "No", "Lr", "Rf", "Db", "Sg", "Bh", "Hs", "Mt", "Ds",
            "Rg", "Cn", "Nh", "Fl", "Mc", "Lv", "Ts", "Og");

    private static final Set<String> SET = Set.copyOf(SYMBOLS);

    private Elements() {
    }

    /** True when {@code symbol} is a chemical element (case-sensitive: "Co" yes, "CO" no). */
    public static boolean isElement(String symbol) {
        return SET.contains(symbol);
    }

    /** The atomic number of an element, or 0 for a pseudo-element. */
    public static int atomicNumber(String symbol) {
        return SYMBOLS.indexOf(symbol) + 1;
    }

    /** The symbol for an atomic number between 1 and 118. */
    public static String symbol(int atomicNumber) {
        if (atomicNumber < 1 || atomicNumber > SYMBOLS.size()) {
            throw new IllegalArgumentException("no element with atomic number " + atomicNumber);
        }
        return SYMBOLS.get(atomicNumber - 1);
    }
}
