package io.github.atomledger.checker.model;

/**
 * Limits for reading a model.
 *
 * @param maxDecompressedBytes the most bytes of XML read from one file (after gzip
 *                             decompression); reading stops with an error beyond it
 */
public record LoadOptions(long maxDecompressedBytes) {

    /** 1 GiB: far above any published genome-scale model (yeast-GEM is 12 MB). */
    public static final long DEFAULT_MAX_BYTES = 1L << 30;

    public LoadOptions {
        if (maxDecompressedBytes <= 0) {
            throw new IllegalArgumentException("maxDecompressedBytes must be positive, was " + maxDecompressedBytes);
        }
    }

    public static LoadOptions defaults() {
        return new LoadOptions(DEFAULT_MAX_BYTES);
    }
}
