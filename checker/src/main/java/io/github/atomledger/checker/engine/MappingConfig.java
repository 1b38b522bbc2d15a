package io.github.atomledger.checker.engine;

import io.github.atomledger.atommapper.mapping.MapConfidence;
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
 * @param reviewMargin   maps whose margin to the runner-up is at most this many weighted bond edits
 *                       get a {@code mapping.review} finding, and a curated map at most this much
 *                       dearer than the optimum is accepted as "criterion undecided" (at least 0;
 *                       default {@link MapConfidence#DEFAULT_REVIEW_MARGIN})
 */
public record MappingConfig(boolean enabled, Path structures, MappingOptions options, int threads, Path cacheDirectory,
                            int reviewMargin) {

    public static final MappingConfig OFF = new MappingConfig(false, null, MappingOptions.defaults(), 1, null);

    public MappingConfig {
        Objects.requireNonNull(options, "options");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, was " + threads);
        }
        if (reviewMargin < 0) {
            throw new IllegalArgumentException("reviewMargin must not be negative, was " + reviewMargin);
        }
    }

    /** Settings with the default review margin. */
    public MappingConfig(boolean enabled, Path structures, MappingOptions options, int threads, Path cacheDirectory) {
        this(enabled, structures, options, threads, cacheDirectory, MapConfidence.DEFAULT_REVIEW_MARGIN);
    }

    /** These settings with another review margin. */
    public MappingConfig withReviewMargin(int margin) {
        return new MappingConfig(enabled, structures, options, threads, cacheDirectory, margin);
    }

    /** These settings with other mapper options. */
    public MappingConfig withOptions(MappingOptions newOptions) {
        return new MappingConfig(enabled, structures, newOptions, threads, cacheDirectory, reviewMargin);
    }

    /** The default cache location: {@code ~/.cache/atomledger/maps}, outside any build directory. */
    public static Path defaultCacheDirectory() {
        return Path.of(System.getProperty("user.home"), ".cache", "atomledger", "maps");
    }
}
