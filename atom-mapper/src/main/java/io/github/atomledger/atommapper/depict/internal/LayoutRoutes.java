package io.github.atomledger.atommapper.depict.internal;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Function;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IReaction;
import org.openscience.cdk.layout.StructureDiagramGenerator;

/**
 * 2D coordinates for a reaction picture, by the first of these routes that works:
 * <ol>
 *   <li>CDK's layout of the mapped reaction, which turns each product to match its reactants;</li>
 *   <li>each molecule on its own (no alignment across the arrow);</li>
 *   <li>for a molecule that still fails, the same without CDK's ring templates;</li>
 *   <li>a molecule that fails every route is left without coordinates and named, so the
 *       picture shows a frame in its place.</li>
 * </ol>
 * CDK's structure diagram generator throws unchecked exceptions on some structures (a
 * {@code NullPointerException} in {@code RingPlacer} on protoporphyrin aligned to its
 * porphyrinogen, found by the yeast-GEM sweep), so every route catches {@link RuntimeException}
 * and {@link StackOverflowError} as well as {@link CDKException}. Deterministic.
 */
public final class LayoutRoutes {

    /**
     * What the layout did.
     *
     * @param failed molecules left without coordinates
     * @param notes  one sentence per fallback taken, naming the molecule (through {@code names})
     */
    public record Outcome(Set<IAtomContainer> failed, List<String> notes) {
    }

    private LayoutRoutes() {
    }

    /** Lays out every molecule of the reaction; {@code names} says how to call a molecule in a note. */
    public static Outcome layOut(IReaction rxn, Function<IAtomContainer, String> names) {
        List<IAtomContainer> mols = new ArrayList<>();
        rxn.getReactants().atomContainers().forEach(mols::add);
        rxn.getProducts().atomContainers().forEach(mols::add);
        List<String> notes = new ArrayList<>();
        Set<IAtomContainer> failed = new LinkedHashSet<>();
        try {
            StructureDiagramGenerator sdg = new StructureDiagramGenerator();
            sdg.setAlignMappedReaction(true);
            sdg.generateCoordinates(rxn);
            return new Outcome(failed, notes);
        } catch (CDKException | RuntimeException | StackOverflowError e) {
            notes.add("CDK could not lay out the mapped reaction (" + describe(e) + "), so each molecule was laid "
                    + "out on its own and products are not turned to match their reactants.");
        }
        for (IAtomContainer mol : mols) {
            clear(mol);
            if (mol.isEmpty()) {
                continue;
            }
            Throwable first = tryLayout(mol, true);
            if (first == null) {
                continue;
            }
            clear(mol);
            Throwable second = tryLayout(mol, false);
            if (second == null) {
                notes.add("CDK's ring templates failed on " + names.apply(mol) + " (" + describe(first)
                        + "); it was laid out without them.");
                continue;
            }
            clear(mol);
            failed.add(mol);
            notes.add("CDK could not lay out " + names.apply(mol) + " (" + describe(second)
                    + "); it is shown as an empty frame.");
        }
        return new Outcome(failed, notes);
    }

    private static Throwable tryLayout(IAtomContainer mol, boolean templates) {
        try {
            StructureDiagramGenerator sdg = new StructureDiagramGenerator();
            sdg.setUseTemplates(templates);
            sdg.generateCoordinates(mol);
            return null;
        } catch (CDKException | RuntimeException | StackOverflowError e) {
            return e;
        }
    }

    private static void clear(IAtomContainer mol) {
        for (IAtom a : mol.atoms()) {
            a.setPoint2d(null);
        }
    }

    /** The exception class and message, without a stack: what a curator reads in a note. */
    public static String describe(Throwable e) {
        String where = "";
        for (StackTraceElement s : e.getStackTrace()) {
            if (s.getClassName().startsWith("org.openscience.cdk.")) {
                where = " in " + s.getClassName().substring(s.getClassName().lastIndexOf('.') + 1);
                break;
            }
        }
        String message = e.getMessage() == null ? "" : ": " + e.getMessage();
        return e.getClass().getSimpleName() + where + message;
    }
}
