package io.github.atomledger.maven;

import io.github.atomledger.checker.engine.RunListener;

import org.apache.maven.plugin.logging.Log;

/** Adapts the engine's progress interface to Maven's log. */
final class MavenRunListener implements RunListener {

    private final Log log;

    MavenRunListener(Log log) {
        this.log = log;
    }

    @Override
    public void info(String line) {
        log.info(line);
    }

    @Override
    public void warn(String line) {
        log.warn(line);
    }

    @Override
    public void error(String line) {
        log.error(line);
    }

    @Override
    public void debug(String line) {
        if (log.isDebugEnabled()) {
            log.debug(line);
        }
    }
}
