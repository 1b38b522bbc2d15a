package io.github.atomledger.atommapper.structure;

import java.util.HashMap;
import java.util.Map;

/**
 * Readable atom names from OpenSMILES atom classes: element symbol plus class ({@code C3}) where
 * that name is unique in the structure, else the 1-based heavy-atom index ({@code 7}). A name that
 * two atoms would share names neither, so a label always picks out one atom.
 */
final class AtomLabels {

    private AtomLabels() {
    }

    static String[] of(MoleculeGraph graph, int[] classes) {
        String[] out = new String[classes.length];
        Map<String, Integer> uses = new HashMap<>();
        for (int k = 0; k < classes.length; k++) {
            if (classes[k] > 0) {
                uses.merge(graph.element(k) + classes[k], 1, Integer::sum);
            }
        }
        for (int k = 0; k < classes.length; k++) {
            String named = classes[k] > 0 ? graph.element(k) + classes[k] : null;
            out[k] = named != null && uses.get(named) == 1 ? named : Integer.toString(k + 1);
        }
        return out;
    }
}
