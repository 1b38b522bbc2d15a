package io.github.atomledger.atommapper.structure.internal;

import io.github.atomledger.atommapper.structure.MoleculeGraph;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;

/** A {@link MoleculeGraph} as the arrays that {@link Orbits} and {@link OrderedPartition} take. */
record GraphArrays(String[] elements, int[][] neighbours, int[][] codes) {

    static GraphArrays of(MoleculeGraph g) {
        int n = g.atomCount();
        String[] elements = new String[n];
        int[][] neighbours = new int[n][];
        int[][] codes = new int[n][];
        for (int i = 0; i < n; i++) {
            elements[i] = g.element(i);
            neighbours[i] = g.neighbours(i);
            codes[i] = g.bondCodes(i);
        }
        return new GraphArrays(elements, neighbours, codes);
    }

    /** Our orbits, with the given budget. */
    int[] orbits(StepBudget budget) throws StepBudget.Exhausted {
        return Orbits.of(elements, neighbours, codes, budget);
    }

    /** Number of cells of the coarsest equitable partition (colour refinement alone). */
    int colourRefinementCells() throws StepBudget.Exhausted {
        List<String> symbols = new ArrayList<>(new TreeSet<>(Arrays.asList(elements)));
        int[] colour = new int[elements.length];
        Arrays.setAll(colour, i -> symbols.indexOf(elements[i]));
        return new OrderedPartition(colour, neighbours, codes, new StepBudget(Long.MAX_VALUE)).cells();
    }
}
