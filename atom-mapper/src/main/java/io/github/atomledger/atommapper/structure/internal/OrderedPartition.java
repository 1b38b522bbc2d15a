package io.github.atomledger.atommapper.structure.internal;

import java.util.Arrays;

/**
 * An ordered partition of the atoms of a coloured graph, kept equal to the coarsest equitable
 * partition below the cells it was given (colour refinement, the one-dimensional
 * Weisfeiler–Leman method, in the splitter-queue form of McKay, Congressus Numerantium 30:45,
 * 1981). Equitable: any two atoms of one cell have, for every cell and every bond code, the same
 * number of neighbours in that cell joined by that code.
 *
 * <p>Cells are contiguous ranges of positions; a cell is named by its first position. The
 * refinement never looks at atom numbers, only at positions, cell sizes and neighbour counts, so
 * it commutes with relabelling: if an automorphism maps one ordered partition onto another, it
 * maps their refinements onto each other cell by cell, and both refinements leave the same
 * {@link #trace()}. The search relies on this.
 *
 * <p>One mutable object serves a whole depth-first search: {@link #individualise} records every
 * array write in an undo log, and {@link #undo()} takes back everything since the matching
 * {@link #individualise}, so a node costs what its refinement did rather than a copy of all
 * arrays. Every scan, sort and write counts against the {@link StepBudget}. Not thread-safe.
 */
final class OrderedPartition {

    /** Bond codes 1 (single) to 4 (aromatic); each is refined against separately. */
    private static final int CODES = 4;
    /** Indices into {@link #arrays}, for the undo log. */
    private static final int LAB = 0;
    private static final int POS = 1;
    private static final int CELL_OF = 2;
    private static final int CELL_END = 3;

    private final int n;
    private final int[][] nbr;
    private final int[][] code;
    private final StepBudget budget;

    /** Atoms in cell order. */
    private final int[] lab;
    /** Position of each atom in {@link #lab}. */
    private final int[] pos;
    /** First position of each atom's cell. */
    private final int[] cellOf;
    /** For the first position of a cell: one past its last position. */
    private final int[] cellEnd;
    private final int[][] arrays;
    private int cells;
    private long trace;

    private final UndoLog log = new UndoLog();

    private final int[] count;
    private final int[] touched;
    private final int[] inCell;
    private final int[] cellList;
    private final long[] keys;
    private final int[] queue;
    private final boolean[] inQueue;
    private int head;
    private int queued;

    /**
     * The coarsest equitable partition below the partition into colour classes, ordered by colour.
     *
     * @param colour a colour per atom, 0-based; the order of the colours must not depend on atom
     *     numbers (element symbols in alphabetical order, for instance)
     * @param nbr neighbours per atom, ascending
     * @param code bond codes 1 to 4 parallel to {@code nbr}
     */
    OrderedPartition(int[] colour, int[][] nbr, int[][] code, StepBudget budget) throws StepBudget.Exhausted {
        this.n = colour.length;
        this.nbr = nbr;
        this.code = code;
        this.budget = budget;
        lab = new int[n];
        pos = new int[n];
        cellOf = new int[n];
        cellEnd = new int[n];
        arrays = new int[][] {lab, pos, cellOf, cellEnd};
        count = new int[n];
        touched = new int[n];
        inCell = new int[n];
        cellList = new int[n];
        keys = new long[n];
        queue = new int[n];
        inQueue = new boolean[n];
        budget.spend(n);
        for (int v = 0; v < n; v++) {
            keys[v] = ((long) colour[v] << 32) | v;
        }
        Arrays.sort(keys);
        int start = 0;
        for (int i = 0; i < n; i++) {
            lab[i] = (int) keys[i];
            pos[lab[i]] = i;
            if (i > 0 && keys[i] >>> 32 != keys[i - 1] >>> 32) {
                cellEnd[start] = i;
                enqueue(start);
                start = i;
                cells++;
            }
            cellOf[lab[i]] = start;
        }
        if (n > 0) {
            cellEnd[start] = n;
            enqueue(start);
            cells++;
        }
        refine();
        log.clear();
    }

    /** Number of atoms. */
    int size() {
        return n;
    }

    /** The atom at position {@code i}. */
    int atomAt(int i) {
        return lab[i];
    }

    /** A copy of the atoms in cell order. */
    int[] order() {
        return lab.clone();
    }

    /** Number of cells. */
    int cells() {
        return cells;
    }

    /** True when every cell has one atom. */
    boolean discrete() {
        return cells == n;
    }

    /** True when position {@code i} starts a cell of more than one atom. */
    boolean startsNonSingleton(int i) {
        return i >= 0 && i < n && cellOf[lab[i]] == i && cellEnd[i] - i > 1;
    }

    /** First position, {@code from} or later, of a cell with more than one atom, or -1. */
    int nextNonSingleton(int from) {
        int i = from;
        while (i < n && cellOf[lab[i]] != i) {
            i++;
        }
        for (; i < n; i = cellEnd[i]) {
            if (cellEnd[i] - i > 1) {
                return i;
            }
        }
        return -1;
    }

    /** First position of the cell of atom {@code v}. */
    int cellOf(int v) {
        return cellOf[v];
    }

    /** One past the last position of the cell that starts at {@code start}. */
    int cellEnd(int start) {
        return cellEnd[start];
    }

    /**
     * A hash of the splits made since the partition was built or last individualised: positions,
     * fragment sizes and neighbour counts, none of them atom numbers. Equal for partitions that an
     * automorphism maps onto each other; different traces prove that none does.
     */
    long trace() {
        return trace;
    }

    /**
     * Makes {@code v} (in a cell of at least two atoms) a cell of its own, placed at the end of its
     * old cell, and refines to the coarsest equitable partition again. {@link #undo()} reverts.
     */
    void individualise(int v) throws StepBudget.Exhausted {
        log.mark(cells, trace);
        int s = cellOf[v];
        int e = cellEnd[s];
        trace = mix(0x9e3779b97f4a7c15L, s * 31L + e);
        swap(v, e - 1);
        set(CELL_END, s, e - 1);
        set(CELL_OF, v, e - 1);
        set(CELL_END, e - 1, e);
        cells++;
        // The old cell was equitable already; by Hopcroft's argument the singleton suffices.
        enqueue(e - 1);
        refine();
    }

    /** Reverts the last {@link #individualise} not yet reverted. */
    void undo() throws StepBudget.Exhausted {
        budget.spend(log.sinceMark());
        UndoLog.Mark mark = log.undo(arrays);
        cells = mark.cells();
        trace = mark.trace();
    }

    private void refine() throws StepBudget.Exhausted {
        while (queued > 0) {
            int w = dequeue();
            if (cells == n) {
                continue;
            }
            int we = cellEnd[w];
            for (int c = 1; c <= CODES; c++) {
                splitBy(w, we, c);
            }
        }
    }

    /** Splits every cell whose atoms differ in their number of code-{@code c} neighbours in [w, we). */
    private void splitBy(int w, int we, int c) throws StepBudget.Exhausted {
        int found = 0;
        long work = we - w;
        for (int i = w; i < we; i++) {
            int v = lab[i];
            int[] nv = nbr[v];
            int[] cv = code[v];
            work += nv.length;
            for (int k = 0; k < nv.length; k++) {
                if (cv[k] == c && count[nv[k]]++ == 0) {
                    touched[found++] = nv[k];
                }
            }
        }
        budget.spend(work + found);
        if (found == 0) {
            return;
        }
        // Group the touched atoms by cell (cells in position order), each group sorted by count.
        int groups = 0;
        for (int i = 0; i < found; i++) {
            int cell = cellOf[touched[i]];
            if (inCell[cell]++ == 0) {
                cellList[groups++] = cell;
            }
        }
        Arrays.sort(cellList, 0, groups);
        int offset = 0;
        for (int g = 0; g < groups; g++) {
            int cell = cellList[g];
            int size = inCell[cell];
            inCell[cell] = offset;
            offset += size;
        }
        for (int i = 0; i < found; i++) {
            int v = touched[i];
            keys[inCell[cellOf[v]]++] = ((long) count[v] << 32) | v;
        }
        for (int i = 0; i < found; i++) {
            count[touched[i]] = 0;
        }
        int from = 0;
        for (int g = 0; g < groups; g++) {
            int cell = cellList[g];
            int to = inCell[cell];
            inCell[cell] = 0;
            split(cell, from, to, w, c);
            from = to;
        }
    }

    /** Splits the cell at {@code start} by the counts in {@code keys[from, to)}. */
    private void split(int start, int from, int to, int w, int c) throws StepBudget.Exhausted {
        int end = cellEnd[start];
        int g = to - from;
        Arrays.sort(keys, from, to);
        budget.spend(g);
        if (g == end - start && keys[from] >>> 32 == keys[to - 1] >>> 32) {
            return;
        }
        // The touched atoms go to the end of the cell in ascending count; the atoms with no such
        // neighbour stay in front and keep the cell's name.
        int base = end - g;
        for (int k = 0; k < g; k++) {
            swap((int) keys[to - 1 - k], end - 1 - k);
        }
        boolean wasQueued = inQueue[start];
        int largest = start;
        int largestSize = base - start;
        int fragments = base > start ? 1 : 0;
        long h = mix(trace, ((long) w << 34) ^ ((long) c << 31) ^ start);
        h = mix(h, base - start);
        for (int k = 0; k < g; ) {
            long cnt = keys[from + k] >>> 32;
            int k2 = k;
            while (k2 < g && keys[from + k2] >>> 32 == cnt) {
                k2++;
            }
            int fs = base + k;
            int fe = base + k2;
            set(CELL_END, fs, fe);
            if (fs != start) {
                for (int i = fs; i < fe; i++) {
                    set(CELL_OF, lab[i], fs);
                }
            }
            fragments++;
            h = mix(h, (cnt << 32) | (fe - fs));
            if (fe - fs > largestSize) {
                largest = fs;
                largestSize = fe - fs;
            }
            k = k2;
        }
        if (base > start) {
            set(CELL_END, start, base);
        }
        cells += fragments - 1;
        trace = h;
        // Hopcroft's argument as McKay uses it: counts against the largest fragment follow from
        // counts against the old cell and the other fragments, so it need not be queued unless
        // the old cell was still waiting in the queue.
        for (int i = start; i < end; i = cellEnd[i]) {
            if (wasQueued ? i != start : i != largest) {
                enqueue(i);
            }
        }
    }

    /** Moves atom {@code v} to position {@code target}, and the atom there to v's old position. */
    private void swap(int v, int target) {
        int from = pos[v];
        if (from == target) {
            return;
        }
        int other = lab[target];
        set(LAB, from, other);
        set(POS, other, from);
        set(LAB, target, v);
        set(POS, v, target);
    }

    private void set(int which, int index, int value) {
        int[] array = arrays[which];
        log.record(which, index, array[index]);
        array[index] = value;
    }

    private void enqueue(int cell) {
        if (!inQueue[cell]) {
            inQueue[cell] = true;
            queue[(head + queued) % n] = cell;
            queued++;
        }
    }

    private int dequeue() {
        int cell = queue[head];
        head = (head + 1) % n;
        queued--;
        inQueue[cell] = false;
        return cell;
    }

    private static long mix(long h, long x) {
        long z = h * 0x9e3779b97f4a7c15L + x;
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }
}
