package io.github.atomledger.atommapper.structure;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.silent.Atom;
import org.openscience.cdk.silent.AtomContainer;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;

/**
 * Structures built to make a symmetry computation blow up (issue 7), each with the number of
 * automorphism orbits of its heavy-atom graph. The counts follow from the drawings and are
 * explained per entry (common practice: counting symmetry-equivalent positions).
 */
public final class HostileStructures {

    /** A named hostile structure and its orbit count. */
    public record Case(String name, String smiles, int orbits) {
        @Override
        public String toString() {
            return name;
        }
    }

    /** C60 (buckminsterfullerene) as a Kekulé SMILES, from memory (as in AdversarialMappingTest). */
    public static final String C60 = "C12=C3C4=C5C6=C1C7=C8C9=C1C%10=C%11C(=C29)C3=C2C3=C4C4=C5C5=C9C6=C7C6=C7C8=C1C1=C8"
            + "C%10=C%10C%11=C2C2=C3C3=C4C4=C5C5=C%11C%12=C(C6=C95)C7=C1C1=C%12C5=C%11C4=C3C3=C5C(=C81)C%10=C23";

    private HostileStructures() {
    }

    /** All cases, smallest first. */
    public static List<Case> all() {
        return List.of(
                // One methyl, then units carrying two methyls: the first unit's three methyls are
                // one orbit, every backbone atom is alone, and each later unit's two methyls pair up.
                new Case("polyisobutylene-like, 60 units", "C" + "C(C)(C)".repeat(60), 1 + 60 + 59),
                new Case("polyisobutylene-like, 200 units", "C" + "C(C)(C)".repeat(200), 1 + 200 + 199),
                // Real polyisobutylene, (CH2-C(CH3)2)n with a methyl end: three methyls on the first
                // quaternary carbon, then per unit a CH2, a quaternary carbon and a methyl pair.
                new Case("polyisobutylene, 60 units", "CC(C)(C)".repeat(60), 1 + 60 + 59 + 59),
                new Case("star of 60 methyls", "C" + "(C)".repeat(60), 2),
                new Case("130 methanes", copies("C", 130), 1),
                new Case("12 benzenes", copies("c1ccccc1", 12), 1),
                new Case("50 cyclohexanes", copies("C1CCCCC1", 50), 1),
                new Case("200-membered carbon ring", "C1" + "C".repeat(198) + "C1", 1),
                // A ladder of 100 rungs: left-right and top-bottom flips, so rung i and rung
                // 101-i are one orbit.
                new Case("ladder of 100 rungs", ladder(100, false), 50),
                // The prism over a 100-gon is vertex-transitive.
                new Case("prism over a 100-gon", ladder(100, true), 1),
                new Case("C60", C60, 1),
                // Four generations of three identical branches per node: one orbit per generation.
                new Case("dendrimer, 4 generations of 3 branches", dendrimer(4), 5));
    }

    /** {@code n} copies of {@code piece} as one disconnected structure. */
    public static String copies(String piece, int n) {
        return String.join(".", Collections.nCopies(n, piece));
    }

    /** A node with three identical subtrees of {@code generations - 1} generations each. */
    public static String dendrimer(int generations) {
        if (generations == 0) {
            return "C";
        }
        String branch = dendrimer(generations - 1);
        return "C(" + branch + ")(" + branch + ")" + branch;
    }

    /** Two paths of {@code rungs} carbons joined rung by rung; closed into a prism when asked. */
    public static String ladder(int rungs, boolean closed) {
        List<int[]> bonds = new ArrayList<>();
        for (int i = 0; i < rungs; i++) {
            bonds.add(new int[] {i, rungs + i});
            if (i + 1 < rungs || closed) {
                bonds.add(new int[] {i, (i + 1) % rungs});
                bonds.add(new int[] {rungs + i, rungs + (i + 1) % rungs});
            }
        }
        return carbonSmiles(2 * rungs, bonds);
    }

    /** SMILES of a saturated carbon graph with the given single bonds (written by CDK). */
    public static String carbonSmiles(int atoms, List<int[]> bonds) {
        IAtomContainer c = new AtomContainer();
        int[] degree = new int[atoms];
        for (int[] b : bonds) {
            degree[b[0]]++;
            degree[b[1]]++;
        }
        for (int i = 0; i < atoms; i++) {
            IAtom a = new Atom("C");
            a.setImplicitHydrogenCount(Math.max(0, 4 - degree[i]));
            c.addAtom(a);
        }
        for (int[] b : bonds) {
            c.addBond(b[0], b[1], IBond.Order.SINGLE);
        }
        try {
            return new SmilesGenerator(SmiFlavor.Generic).create(c);
        } catch (CDKException e) {
            throw new IllegalStateException(e);
        }
    }
}
