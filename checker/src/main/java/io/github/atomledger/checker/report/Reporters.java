package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.engine.RunResult;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Supplier;

/** Writes the selected report formats, in a fixed order. */
public final class Reporters {

    private static final Map<ReportFormat, Supplier<Reporter>> ALL = new EnumMap<>(ReportFormat.class);

    static {
        ALL.put(ReportFormat.JSON, JsonReporter::new);
        ALL.put(ReportFormat.HTML, () -> new HtmlReporter(MappingSource.FROM_ENGINE));
        ALL.put(ReportFormat.JUNIT, JunitReporter::new);
        ALL.put(ReportFormat.SARIF, SarifReporter::new);
        ALL.put(ReportFormat.MARKDOWN, MarkdownReporter::new);
    }

    private final List<Reporter> reporters;

    private Reporters(List<Reporter> reporters) {
        this.reporters = List.copyOf(reporters);
    }

    /**
     * The reporters for these formats.
     *
     * @throws IllegalArgumentException for a format this build cannot write yet
     */
    public static Reporters forFormats(Set<ReportFormat> formats) {
        return forFormats(formats, MappingSource.FROM_ENGINE);
    }

    /**
     * The reporters for these formats; the HTML report draws the atom maps {@code mappings} gives.
     *
     * @throws IllegalArgumentException for a format this build cannot write yet
     */
    public static Reporters forFormats(Set<ReportFormat> formats, MappingSource mappings) {
        List<Reporter> list = new ArrayList<>();
        for (ReportFormat f : ReportFormat.values()) {
            if (!formats.contains(f)) {
                continue;
            }
            Supplier<Reporter> s = ALL.get(f);
            if (s == null) {
                throw new IllegalArgumentException("report format '" + f.label() + "' is not available in this version");
            }
            list.add(f == ReportFormat.HTML ? new HtmlReporter(mappings) : s.get());
            if (f == ReportFormat.JSON) {
                // The traces' machine files travel with the JSON report (written only when something was traced).
                list.add(new TracesReporter());
                list.add(new ReachReporter());
            }
        }
        return new Reporters(list);
    }

    /**
     * Writes every report; returns the paths written, in format order (reports with nothing to
     * say write nothing).
     *
     * @throws IOException when a report could not be written (after every other report was)
     */
    public List<Path> write(RunResult result, Path directory) throws IOException {
        Outcome out = writeAll(result, directory);
        if (!out.failures().isEmpty()) {
            Failure first = out.failures().get(0);
            if (first.error() instanceof IOException io) {
                throw io;
            }
            throw new IOException(first.message(), first.error());
        }
        return out.written();
    }

    /**
     * Writes every report, each on its own: one that fails (a bug, a disk error) does not keep the
     * others from being written. The caller decides what a failure means.
     */
    public Outcome writeAll(RunResult result, Path directory) {
        // The reports are independent: on atomledger.threads they are written side by side (the
        // JSON and the HTML of yeast-GEM take about the same time). Results stay in format order.
        int threads = Math.min(reporters.size(), result.config().mapping().threads());
        List<Object> outcomes = new ArrayList<>();
        if (threads <= 1) {
            reporters.forEach(r -> outcomes.add(writeOne(r, result, directory)));
        } else {
            ExecutorService pool = Executors.newFixedThreadPool(threads, task -> {
                Thread t = new Thread(task, "atomledger-reports");
                t.setDaemon(true);
                return t;
            });
            try {
                List<Future<Object>> futures = new ArrayList<>();
                reporters.forEach(r -> futures.add(pool.submit(() -> writeOne(r, result, directory))));
                for (int i = 0; i < futures.size(); i++) {
                    outcomes.add(get(futures.get(i), reporters.get(i)));
                }
            } finally {
                pool.shutdownNow();
            }
        }
        List<Path> written = new ArrayList<>();
        List<Failure> failures = new ArrayList<>();
        for (Object o : outcomes) {
            if (o instanceof Path p) {
                written.add(p);
            } else if (o instanceof Failure f) {
                failures.add(f);
            }
        }
        return new Outcome(written, failures);
    }

    /** The file written (null when the report had nothing to write), or the {@link Failure}. */
    private static Object writeOne(Reporter r, RunResult result, Path directory) {
        try {
            return r.write(result, directory);
        } catch (IOException | RuntimeException e) {
            return new Failure(r.format(), e);
        }
    }

    private static Object get(Future<Object> f, Reporter r) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return new Failure(r.format(), new IllegalStateException("interrupted", e));
        } catch (ExecutionException e) {
            // An Error (out of memory, say) is not a report failure: it ends the run.
            if (e.getCause() instanceof Error err) {
                throw err;
            }
            return new Failure(r.format(), new IllegalStateException(e.getCause()));
        }
    }

    /** The reports written (format order) and those that failed. */
    public record Outcome(List<Path> written, List<Failure> failures) {
        public Outcome {
            written = List.copyOf(written);
            failures = List.copyOf(failures);
        }
    }

    /** A report that could not be written, and why. */
    public record Failure(ReportFormat format, Exception error) {

        /** One sentence: which report and the error's own message (which names the item). */
        public String message() {
            String why = error.getMessage() == null ? error.toString() : error.getMessage();
            return "the " + format.label() + " report could not be written: "
                    + (error instanceof IOException ? "" : error.getClass().getSimpleName() + ": ") + why;
        }
    }

    /** The formats that this build can write. */
    public static Set<ReportFormat> available() {
        return Set.copyOf(ALL.keySet());
    }
}
