package io.github.atomledger.checker.trace;

import java.nio.file.Path;
import java.util.List;

/**
 * What to trace in a run.
 *
 * @param pathways the pathways file, or null for none
 * @param fates    the declared fates file, or null for none (needs a pathways file)
 * @param tracers  label sources for the "where label can go" report: {@code species:position}
 *                 (a label such as {@code C1} or a heavy-atom index) or {@code species} alone for
 *                 every carbon of it
 */
public record TraceConfig(Path pathways, Path fates, List<String> tracers) {

    /** Nothing to trace. */
    public static final TraceConfig NONE = new TraceConfig(null, null, List.of());

    public TraceConfig {
        tracers = tracers == null ? List.of() : tracers.stream().map(String::strip).filter(s -> !s.isEmpty()).toList();
        if (fates != null && pathways == null) {
            throw new IllegalArgumentException("fates: declared fates need a pathways file (pathways)");
        }
    }

    /** True when there is anything to trace. */
    public boolean active() {
        return pathways != null || !tracers.isEmpty();
    }
}
