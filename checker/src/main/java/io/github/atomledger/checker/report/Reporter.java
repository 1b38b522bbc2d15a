package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.engine.RunResult;

import java.io.IOException;
import java.nio.file.Path;

/** Writes one report format into a directory. Output is byte-stable for the same result. */
public interface Reporter {

    ReportFormat format();

    /** Writes the report; returns the file (or directory) written. */
    Path write(RunResult result, Path directory) throws IOException;
}
