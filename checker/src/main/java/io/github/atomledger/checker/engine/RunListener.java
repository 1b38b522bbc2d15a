package io.github.atomledger.checker.engine;

/**
 * Progress and log lines from a run. The engine never logs anywhere else; the Maven plugin
 * adapts this to Maven's log, tests collect the lines. Implementations must be thread-safe.
 */
public interface RunListener {

    /** A listener that drops everything. */
    RunListener SILENT = new RunListener() {
    };

    default void info(String line) {
    }

    default void warn(String line) {
    }

    default void debug(String line) {
    }
}
