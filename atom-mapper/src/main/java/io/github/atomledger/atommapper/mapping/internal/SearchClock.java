package io.github.atomledger.atommapper.mapping.internal;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;

/**
 * The clock of the time budget: CPU time of the current thread where the JVM measures it, wall
 * time otherwise. CPU time keeps a busy machine (other builds, more threads than cores) from
 * turning proofs into timeouts; the budget then means "this much computing per reaction".
 */
public final class SearchClock {

    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
    private static final boolean CPU = THREADS.isCurrentThreadCpuTimeSupported() && THREADS.isThreadCpuTimeEnabled();

    private SearchClock() {
    }

    /** Nanoseconds on this thread's budget clock; only differences are meaningful. */
    public static long now() {
        return CPU ? THREADS.getCurrentThreadCpuTime() : System.nanoTime();
    }
}
