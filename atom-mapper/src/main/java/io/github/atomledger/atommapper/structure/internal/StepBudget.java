package io.github.atomledger.atommapper.structure.internal;

/**
 * A deterministic work counter for the symmetry computation: every array element copied and
 * every neighbour looked at counts one step, so the same input stops at the same point on any
 * machine and under any load (a wall-clock limit would not). Not thread-safe; one per structure.
 */
final class StepBudget {

    /** Thrown when the count passes the limit; the computation is then abandoned. */
    static final class Exhausted extends Exception {

        private static final long serialVersionUID = 1L;

        Exhausted(long limit) {
            super("more than " + limit + " steps", null, false, false);
        }
    }

    private final long limit;
    private long used;

    StepBudget(long limit) {
        this.limit = limit;
    }

    /** Counts {@code steps} more; throws once the total passes the limit. */
    void spend(long steps) throws Exhausted {
        used += steps;
        if (used > limit) {
            throw new Exhausted(limit);
        }
    }

    /** Steps counted so far. */
    long used() {
        return used;
    }
}
