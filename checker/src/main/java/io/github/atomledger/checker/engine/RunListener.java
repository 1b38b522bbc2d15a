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

    /** A line about what fails the run; listeners without an error level show it as a warning. */
    default void error(String line) {
        warn(line);
    }

    default void debug(String line) {
    }
}
