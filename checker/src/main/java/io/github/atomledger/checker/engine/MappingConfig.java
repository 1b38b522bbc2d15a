package io.github.atomledger.checker.engine;

import io.github.atomledger.atommapper.mapping.MappingOptions;

import java.nio.file.Path;
import java.util.Objects;

/**
 * Whether and how reactions are atom-mapped.
 *
 * @param enabled        map reactions (off: no mapping section in the reports)
 * @param structures     the species structure side table, or null
 * @param options        mapper options (time budget per reaction, size cap, weights)
 * @param threads        worker threads, at least 1
 * @param cacheDirectory where results are cached between runs, or null for no cache
 */
public record MappingConfig(boolean enabled, Path structures, MappingOptions options, int threads, Path cacheDirectory) {

    public static final MappingConfig OFF = new MappingConfig(false, null, MappingOptions.defaults(), 1, null);

    public MappingConfig {
        Objects.requireNonNull(options, "options");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, was " + threads);
        }
    }

    /** The default cache location: {@code ~/.cache/atomledger/maps}, outside any build directory. */
    public static Path defaultCacheDirectory() {
        return Path.of(System.getProperty("user.home"), ".cache", "atomledger", "maps");
    }
}
