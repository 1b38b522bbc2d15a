package io.github.atomledger.maven;

import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.report.ConsoleSummary;

import java.util.ArrayList;
import java.util.List;

/**
 * Passes every line on and keeps the warnings and errors, the lines a reused run shows again
 * (progress and debug lines belong to the run that computed them). Thread-safe.
 */
final class RecordingRunListener implements RunListener {

    private final RunListener out;
    private final List<ConsoleSummary.Line> kept = new ArrayList<>();

    RecordingRunListener(RunListener out) {
        this.out = out;
    }

    @Override
    public void info(String line) {
        out.info(line);
    }

    @Override
    public synchronized void warn(String line) {
        kept.add(new ConsoleSummary.Line(ConsoleSummary.Level.WARNING, line));
        out.warn(line);
    }

    @Override
    public synchronized void error(String line) {
        kept.add(new ConsoleSummary.Line(ConsoleSummary.Level.ERROR, line));
        out.error(line);
    }

    @Override
    public void debug(String line) {
        out.debug(line);
    }

    /** The warnings and errors so far, in order. */
    synchronized List<ConsoleSummary.Line> kept() {
        return new ArrayList<>(kept);
    }
}
