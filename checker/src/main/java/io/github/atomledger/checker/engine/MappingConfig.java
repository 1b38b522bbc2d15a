package io.github.atomledger.checker.engine;

import io.github.atomledger.atommapper.mapping.MapConfidence;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.check.structure.SdFile;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Whether and how reactions are atom-mapped.
 *
 * @param enabled          map reactions (off: no mapping section in the reports)
 * @param structures       the first structure file, or null (kept for callers that name one table;
 *                         always the first of {@code structureSources} when both are given)
 * @param options          mapper options (time budget per reaction, size cap, weights)
 * @param threads          worker threads, at least 1
 * @param cacheDirectory   where results (and SD file indexes) are cached between runs, or null for no cache
 * @param structureSources the structure files and directories in order of precedence (tables,
 *                         SD files, molfiles, molfile directories; see
 *                         {@link io.github.atomledger.checker.check.structure.StructureLibrary})
 * @param sdIdField        the SD data item holding each record's id; default {@value SdFile#DEFAULT_ID_FIELD}
 * @param curatedMaps      a directory of curated RXN maps (file name = reaction id), or null
 * @param reviewMargin     maps whose margin to the runner-up is at most this many weighted bond edits
 *                         get a {@code mapping.review} finding, and a curated map at most this much
 *                         dearer than the optimum is accepted as "criterion undecided" (at least 0;
 *                         default {@link MapConfidence#DEFAULT_REVIEW_MARGIN})
 */
public record MappingConfig(boolean enabled, Path structures, MappingOptions options, int threads, Path cacheDirectory,
                            List<Path> structureSources, String sdIdField, Path curatedMaps, int reviewMargin) {

    public static final MappingConfig OFF = new MappingConfig(false, null, MappingOptions.defaults(), 1, null);

    /** One structure table (or none), no curated map files, the default review margin. */
    public MappingConfig(boolean enabled, Path structures, MappingOptions options, int threads, Path cacheDirectory) {
        this(enabled, structures, options, threads, cacheDirectory, List.of(), SdFile.DEFAULT_ID_FIELD, null);
    }

    /** The default review margin. */
    public MappingConfig(boolean enabled, Path structures, MappingOptions options, int threads, Path cacheDirectory,
                         List<Path> structureSources, String sdIdField, Path curatedMaps) {
        this(enabled, structures, options, threads, cacheDirectory, structureSources, sdIdField, curatedMaps,
                MapConfidence.DEFAULT_REVIEW_MARGIN);
    }

    /** One structure table (or none), no curated map files, this review margin. */
    public MappingConfig(boolean enabled, Path structures, MappingOptions options, int threads, Path cacheDirectory,
                         int reviewMargin) {
        this(enabled, structures, options, threads, cacheDirectory, List.of(), SdFile.DEFAULT_ID_FIELD, null, reviewMargin);
    }

    public MappingConfig {
        Objects.requireNonNull(options, "options");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, was " + threads);
        }
        if (reviewMargin < 0) {
            throw new IllegalArgumentException("reviewMargin must not be negative, was " + reviewMargin);
        }
        List<Path> sources = new ArrayList<>(structureSources == null ? List.of() : structureSources);
        if (structures != null && !sources.contains(structures)) {
            sources.add(0, structures);
        }
        structureSources = List.copyOf(sources);
        structures = sources.isEmpty() ? null : sources.get(0);
        sdIdField = sdIdField == null || sdIdField.isBlank() ? SdFile.DEFAULT_ID_FIELD : sdIdField.strip();
    }

    /** The same settings with these structure files (first to last in precedence) and SD id field. */
    public MappingConfig withStructureSources(List<Path> sources, String idField) {
        return new MappingConfig(enabled, null, options, threads, cacheDirectory, sources, idField, curatedMaps,
                reviewMargin);
    }

    /** The same settings with another SD id field (null or blank: the default). */
    public MappingConfig withSdIdField(String idField) {
        return new MappingConfig(enabled, structures, options, threads, cacheDirectory, structureSources, idField, curatedMaps,
                reviewMargin);
    }

    /** The same settings with curated RXN maps read from {@code directory} (null: none). */
    public MappingConfig withCuratedMaps(Path directory) {
        return new MappingConfig(enabled, structures, options, threads, cacheDirectory, structureSources, sdIdField, directory,
                reviewMargin);
    }

    /** The same settings with another review margin. */
    public MappingConfig withReviewMargin(int margin) {
        return new MappingConfig(enabled, structures, options, threads, cacheDirectory, structureSources, sdIdField,
                curatedMaps, margin);
    }

    /** The same settings with other mapper options. */
    public MappingConfig withOptions(MappingOptions newOptions) {
        return new MappingConfig(enabled, structures, newOptions, threads, cacheDirectory, structureSources, sdIdField,
                curatedMaps, reviewMargin);
    }

    /** The default cache location: {@code ~/.cache/atomledger/maps}, outside any build directory. */
    public static Path defaultCacheDirectory() {
        return Path.of(System.getProperty("user.home"), ".cache", "atomledger", "maps");
    }
}
