package io.github.atomledger.atommapper.structure.internal;

import java.util.ArrayDeque;
import java.util.Arrays;

/**
 * The undo log of an {@link OrderedPartition}: old values of overwritten array elements, with a
 * mark (log length, cell count, trace) per {@link OrderedPartition#individualise} still in force.
 * Not thread-safe; one per partition.
 */
final class UndoLog {

    /** The state of the partition when a mark was set. */
    record Mark(int size, int cells, long trace) {
    }

    /** Three ints per write: which array, which index, the old value. */
    private int[] entries = new int[3 * 64];
    private int size;
    private final ArrayDeque<Mark> marks = new ArrayDeque<>();

    void record(int array, int index, int old) {
        if (3 * size == entries.length) {
            entries = Arrays.copyOf(entries, 2 * entries.length);
        }
        entries[3 * size] = array;
        entries[3 * size + 1] = index;
        entries[3 * size + 2] = old;
        size++;
    }

    void mark(int cells, long trace) {
        marks.push(new Mark(size, cells, trace));
    }

    /** Restores the arrays to the last mark and returns that mark, which is dropped. */
    Mark undo(int[][] arrays) {
        Mark mark = marks.pop();
        while (size > mark.size()) {
            size--;
            arrays[entries[3 * size]][entries[3 * size + 1]] = entries[3 * size + 2];
        }
        return mark;
    }

    /** Writes recorded since the last mark. */
    int sinceMark() {
        return marks.isEmpty() ? size : size - marks.peek().size();
    }

    void clear() {
        size = 0;
        marks.clear();
    }
}
