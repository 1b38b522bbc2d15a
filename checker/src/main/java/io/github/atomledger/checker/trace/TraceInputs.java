package io.github.atomledger.checker.trace;

import io.github.atomledger.checker.AtomLedgerException;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * The parsed trace configuration of a run: pathways, declared fates and label sources.
 *
 * @param pathways the pathways, in file order
 * @param fates    the declared fates, in file order
 * @param tracers  the label sources, as configured ({@code species} or {@code species:position})
 */
public record TraceInputs(List<Pathway> pathways, List<FateExpectation> fates, List<String> tracers) {

    public static final TraceInputs NONE = new TraceInputs(List.of(), List.of(), List.of());

    public TraceInputs {
        pathways = List.copyOf(pathways);
        fates = List.copyOf(fates);
        tracers = List.copyOf(tracers);
    }

    /**
     * Reads the files of a configuration.
     *
     * @param base the project directory; file names in errors and reports are relative to it
     * @throws AtomLedgerException naming the file and line of a malformed file
     */
    public static TraceInputs load(TraceConfig config, Path base) {
        List<Pathway> pathways = config.pathways() == null ? List.of()
                : PathwayFile.read(config.pathways(), display(base, config.pathways()));
        Set<String> names = pathways.stream().map(Pathway::name).collect(Collectors.toSet());
        List<FateExpectation> fates = config.fates() == null ? List.of()
                : FateFile.read(config.fates(), display(base, config.fates()), names);
        return new TraceInputs(pathways, fates, config.tracers());
    }

    public boolean isEmpty() {
        return pathways.isEmpty() && tracers.isEmpty();
    }

    private static String display(Path base, Path file) {
        Path abs = file.toAbsolutePath().normalize();
        Path b = base.toAbsolutePath().normalize();
        return abs.startsWith(b) ? b.relativize(abs).toString().replace('\\', '/') : abs.toString();
    }
}
