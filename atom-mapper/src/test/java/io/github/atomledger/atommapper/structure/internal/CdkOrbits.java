package io.github.atomledger.atommapper.structure.internal;

import io.github.atomledger.atommapper.structure.MoleculeGraph;
import java.util.Arrays;
import org.openscience.cdk.group.Partition;
import org.openscience.cdk.group.PartitionRefinement;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.silent.Atom;
import org.openscience.cdk.silent.AtomContainer;
import org.openscience.cdk.silent.PseudoAtom;

/**
 * The outside reference for the orbit tests: CDK's own automorphism partition
 * ({@code PartitionRefinement.forAtoms().create().getAutomorphismPartition}) of the same coloured
 * graph, built from a {@link MoleculeGraph}: atoms by element symbol only (no charge, no
 * hydrogens), bonds by code, with aromatic (code 4) written as a quadruple bond so that it is an
 * order of its own, as in the mapper.
 */
final class CdkOrbits {

    private CdkOrbits() {
    }

    /** The graph as a CDK container with nothing but elements and bond orders. */
    static IAtomContainer container(MoleculeGraph g) {
        IAtomContainer c = new AtomContainer();
        for (int i = 0; i < g.atomCount(); i++) {
            IAtom a = g.element(i).equals("R") ? new PseudoAtom("R") : new Atom(g.element(i));
            a.setFormalCharge(0);
            a.setImplicitHydrogenCount(0);
            c.addAtom(a);
        }
        IBond.Order[] orders = {null, IBond.Order.SINGLE, IBond.Order.DOUBLE, IBond.Order.TRIPLE,
            IBond.Order.QUADRUPLE};
        for (int i = 0; i < g.atomCount(); i++) {
            int[] nb = g.neighbours(i);
            int[] codes = g.bondCodes(i);
            for (int k = 0; k < nb.length; k++) {
                if (i < nb[k]) {
                    c.addBond(i, nb[k], orders[codes[k]]);
                }
            }
        }
        return c;
    }

    /** CDK's automorphism partition of {@code container}, each atom labelled by the smallest atom of its cell. */
    static int[] orbits(IAtomContainer container) {
        Partition partition = PartitionRefinement.forAtoms().create().getAutomorphismPartition(container);
        int[] orbit = new int[container.getAtomCount()];
        Arrays.fill(orbit, -1);
        for (int cell = 0; cell < partition.size(); cell++) {
            int first = partition.getCell(cell).first();
            for (int atom : partition.getCell(cell)) {
                orbit[atom] = first;
            }
        }
        return orbit;
    }

    /** Our orbits of {@code g}, as {@link MoleculeGraph#orbit} reports them. */
    static int[] ours(MoleculeGraph g) {
        int[] orbit = new int[g.atomCount()];
        Arrays.setAll(orbit, g::orbit);
        return orbit;
    }
}
