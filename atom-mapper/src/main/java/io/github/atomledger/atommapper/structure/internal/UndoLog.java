package io.github.atomledger.atommapper.structure.internal;

import java.util.Arrays;

/**
 * The undo log of an {@link OrderedPartition}: old values of overwritten array elements, with a
 * mark (log length, cell count, trace) per {@link OrderedPartition#individualise} still in force.
 * Not thread-safe; one per partition.
 */
final class UndoLog {

    private int[] which = new int[64];
    private int[] index = new int[64];
    private int[] old = new int[64];
    private int size;
    private int[] markSize = new int[16];
    private int[] markCells = new int[16];
    private long[] markTrace = new long[16];
    private int marks;
    private int lastCells;
    private long lastTrace;

    void record(int array, int i, int value) {
        if (size == old.length) {
            which = Arrays.copyOf(which, size * 2);
            index = Arrays.copyOf(index, size * 2);
            old = Arrays.copyOf(old, size * 2);
        }
        which[size] = array;
        index[size] = i;
        old[size] = value;
        size++;
    }

    void mark(int cells, long trace) {
        if (marks == markSize.length) {
            markSize = Arrays.copyOf(markSize, marks * 2);
            markCells = Arrays.copyOf(markCells, marks * 2);
            markTrace = Arrays.copyOf(markTrace, marks * 2);
        }
        markSize[marks] = size;
        markCells[marks] = cells;
        markTrace[marks] = trace;
        marks++;
    }

    /** Restores the arrays to the last mark and drops it; returns the number of writes undone. */
    int undoTo(int[][] arrays) {
        marks--;
        int target = markSize[marks];
        int undone = size - target;
        while (size > target) {
            size--;
            arrays[which[size]][index[size]] = old[size];
        }
        lastCells = markCells[marks];
        lastTrace = markTrace[marks];
        return undone;
    }

    int savedCells() {
        return lastCells;
    }

    long savedTrace() {
        return lastTrace;
    }

    void clear() {
        size = 0;
        marks = 0;
    }
}
