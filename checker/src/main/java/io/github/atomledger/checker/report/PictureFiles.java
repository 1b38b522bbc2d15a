package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.depict.ReactionPicture;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.regex.Pattern;

/**
 * Turns picture requests into SVG files in the report's {@code pictures/} folder: each distinct
 * picture once, taken from the {@link PictureCache} when it is there and drawn otherwise, on a
 * pool of threads. File names are the first 32 hex digits of the request's key, so the folder is
 * the same for the same input; a file already in the folder is not written again, and SVG files
 * of earlier runs that this run no longer uses are removed. CDK failing on a picture is a note in
 * its {@link PictureFile}; any other exception while drawing names the reaction and fails.
 */
final class PictureFiles {

    /** The report's picture folder, relative to report.html. */
    static final String FOLDER = "pictures";
    private static final Pattern OURS = Pattern.compile("[0-9a-f]{32}\\.svg");

    private final PictureCache cache;
    private final int threads;

    /**
     * @param cacheDirectory the mapping cache directory (pictures go below it), or null for none
     * @param threads        drawing threads, at least 1
     */
    PictureFiles(Path cacheDirectory, int threads) {
        this.cache = cacheDirectory == null ? null : new PictureCache(cacheDirectory);
        this.threads = Math.max(1, threads);
    }

    /**
     * The picture of every request, drawn or taken from the cache; written into
     * {@code reportDirectory/pictures/} unless {@code reportDirectory} is null.
     *
     * @throws IllegalStateException naming the reaction, when drawing fails for a reason other than CDK
     * @throws UncheckedIOException  when a picture cannot be written into the report folder
     */
    Map<String, PictureFile> draw(List<PictureRequest> requests, Path reportDirectory) {
        Map<String, PictureRequest> byKey = new LinkedHashMap<>();
        for (PictureRequest r : requests) {
            byKey.putIfAbsent(r.key(), r);
        }
        Path folder = reportDirectory == null ? null : reportDirectory.resolve(FOLDER);
        if (folder != null && !byKey.isEmpty()) {
            try {
                Files.createDirectories(folder);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot create " + folder, e);
            }
        }
        Map<String, PictureFile> out = new LinkedHashMap<>();
        if (byKey.size() <= 1 || threads == 1) {
            byKey.forEach((key, r) -> out.put(key, one(key, r, folder)));
        } else {
            ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, byKey.size()), r -> {
                Thread t = new Thread(r, "atomledger-pictures");
                t.setDaemon(true);
                return t;
            });
            try {
                Map<String, Future<PictureFile>> futures = new LinkedHashMap<>();
                byKey.forEach((key, r) -> futures.put(key, pool.submit(() -> one(key, r, folder))));
                for (Map.Entry<String, Future<PictureFile>> e : futures.entrySet()) {
                    out.put(e.getKey(), e.getValue().get());
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("drawing the pictures was interrupted", e);
            } catch (ExecutionException e) {
                if (e.getCause() instanceof RuntimeException re) {
                    throw re;
                }
                throw new IllegalStateException(e.getCause());
            } finally {
                pool.shutdownNow();
            }
        }
        if (folder != null) {
            removeStale(folder, out);
        }
        return out;
    }

    private PictureFile one(String key, PictureRequest r, Path folder) {
        String name = key.substring(0, 32) + ".svg";
        PictureCache.Entry hit = cache == null ? null : cache.get(key);
        try {
            if (hit != null) {
                if (hit.svg() == null) {
                    return new PictureFile("", 0, 0, hit.notes());
                }
                if (folder != null && !Files.isRegularFile(folder.resolve(name))) {
                    place(hit.svg(), folder.resolve(name));
                }
                return new PictureFile(name, hit.width(), hit.height(), hit.notes());
            }
            ReactionPicture.Drawing d;
            try {
                d = r.draw();
            } catch (RuntimeException e) {
                throw new IllegalStateException("drawing the picture of reaction " + r.reactionId() + " failed: " + e, e);
            }
            byte[] svg = d.drawn() ? d.svg().getBytes(StandardCharsets.UTF_8) : null;
            if (cache != null) {
                cache.put(key, svg, d.width(), d.height(), d.notes());
            }
            if (svg == null) {
                return new PictureFile("", 0, 0, d.notes());
            }
            if (folder != null) {
                ReportFiles.write(folder.resolve(name), svg);
            }
            return new PictureFile(name, d.width(), d.height(), d.notes());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the picture of reaction " + r.reactionId() + " into " + folder, e);
        }
    }

    /**
     * Puts a cached picture into the report folder: a hard link when the cache and the report are
     * on one file system (after {@code mvn clean}, copying 1,800 files was half of the HTML
     * report's warm time), a copy otherwise. Neither the cache nor the report is ever changed in
     * place (both are written to a temporary file and moved), so the shared file stays as drawn.
     */
    private static void place(Path cached, Path target) throws IOException {
        try {
            Files.createLink(target, cached);
        } catch (IOException | UnsupportedOperationException | SecurityException e) {
            ReportFiles.write(target, Files.readAllBytes(cached));
        }
    }

    /** Deletes our SVG files (32 hex digits) that this run does not use; nothing else is touched. */
    private static void removeStale(Path folder, Map<String, PictureFile> used) {
        if (!Files.isDirectory(folder)) {
            return;
        }
        Set<String> keep = new HashSet<>();
        used.values().forEach(p -> keep.add(p.file()));
        List<Path> stale = new ArrayList<>();
        try (DirectoryStream<Path> files = Files.newDirectoryStream(folder)) {
            for (Path p : files) {
                String n = p.getFileName().toString();
                if (OURS.matcher(n).matches() && !keep.contains(n)) {
                    stale.add(p);
                }
            }
            for (Path p : stale) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot tidy " + folder, e);
        }
    }
}
