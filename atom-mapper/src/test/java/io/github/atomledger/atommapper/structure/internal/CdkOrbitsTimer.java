package io.github.atomledger.atommapper.structure.internal;

import io.github.atomledger.atommapper.structure.Structure;
import org.openscience.cdk.interfaces.IAtomContainer;

/**
 * Not a test: times CDK's automorphism partition of one SMILES (the first argument) in a JVM of
 * its own, so that {@link OrbitsBenchmarkTest} can stop it when CDK does not finish. Prints
 * {@code ms=<milliseconds>}, after one warm-up on benzene.
 */
final class CdkOrbitsTimer {

    private CdkOrbitsTimer() {
    }

    public static void main(String[] args) throws Exception {
        CdkOrbits.orbits(CdkOrbits.container(Structure.fromSmiles("c1ccccc1").graph()));
        IAtomContainer container = CdkOrbits.container(Structure.fromSmiles(args[0]).graph());
        long start = System.nanoTime();
        CdkOrbits.orbits(container);
        System.out.println("ms=" + (System.nanoTime() - start) / 1e6);
    }
}
