package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.AtomLedgerException;

import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.PathMatcher;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import java.util.stream.Stream;

/**
 * Resolves model patterns to files, sorted by their path relative to the base directory so that
 * the order never depends on the file system. A pattern without glob characters is one file and
 * must exist; a glob ({@code *}, {@code ?}, {@code [}, <code>{</code>) must match at least one
 * file. {@code **} crosses directories, and {@code dir/**}{@code /x} also matches {@code dir/x}.
 * Directories named {@code target} and hidden directories are not searched.
 */
final class ModelLocator {

    private ModelLocator() {
    }

    static List<Path> locate(Path base, List<String> patterns) {
        TreeSet<String> found = new TreeSet<>();
        for (String raw : patterns) {
            String pattern = raw.strip().replace('\\', '/');
            if (pattern.isEmpty()) {
                continue;
            }
            if (!isGlob(pattern)) {
                Path p = base.resolve(pattern).normalize();
                if (!Files.isRegularFile(p)) {
                    throw new AtomLedgerException(pattern + ": model file not found (looked in " + base + ")"
                            + sibling(p, pattern));
                }
                found.add(relative(base, p));
                continue;
            }
            List<String> matches = glob(base, pattern);
            if (matches.isEmpty()) {
                throw new AtomLedgerException("no model file matches '" + pattern + "' below " + base);
            }
            found.addAll(matches);
        }
        List<Path> out = new ArrayList<>();
        found.forEach(rel -> out.add(base.resolve(rel).normalize()));
        return out;
    }

    /** "; did you mean x.xml.gz?" when a compressed (or uncompressed) twin of the missing file exists. */
    private static String sibling(Path missing, String pattern) {
        String name = missing.getFileName() == null ? "" : missing.getFileName().toString();
        String twin = name.endsWith(".gz") ? name.substring(0, name.length() - 3) : name + ".gz";
        Path other = missing.resolveSibling(twin);
        if (!twin.isEmpty() && Files.isRegularFile(other)) {
            String shown = pattern.endsWith(".gz") ? pattern.substring(0, pattern.length() - 3) : pattern + ".gz";
            return "; " + shown + " exists: did you mean it?";
        }
        return "";
    }

    static String relative(Path base, Path file) {
        Path abs = file.toAbsolutePath().normalize();
        Path b = base.toAbsolutePath().normalize();
        String rel = abs.startsWith(b) ? b.relativize(abs).toString() : abs.toString();
        return rel.replace('\\', '/');
    }

    private static boolean isGlob(String p) {
        return p.indexOf('*') >= 0 || p.indexOf('?') >= 0 || p.indexOf('[') >= 0 || p.indexOf('{') >= 0;
    }

    private static List<String> glob(Path base, String pattern) {
        List<PathMatcher> matchers = new ArrayList<>();
        matchers.add(FileSystems.getDefault().getPathMatcher("glob:" + pattern));
        if (pattern.contains("**/")) {
            matchers.add(FileSystems.getDefault().getPathMatcher("glob:" + pattern.replace("**/", "")));
        }
        List<String> out = new ArrayList<>();
        if (!Files.isDirectory(base)) {
            return out;
        }
        try (Stream<Path> walk = Files.walk(base)) {
            walk.filter(Files::isRegularFile)
                    .filter(p -> !skipped(base, p))
                    .forEach(p -> {
                        Path rel = base.relativize(p);
                        if (matchers.stream().anyMatch(m -> m.matches(rel))) {
                            out.add(rel.toString().replace('\\', '/'));
                        }
                    });
        } catch (IOException e) {
            throw new AtomLedgerException("cannot list model files below " + base + ": " + e.getMessage(), e);
        }
        return out;
    }

    private static boolean skipped(Path base, Path file) {
        Path rel = base.relativize(file);
        for (int i = 0; i < rel.getNameCount() - 1; i++) {
            String name = rel.getName(i).toString();
            if (name.equals("target") || name.startsWith(".")) {
                return true;
            }
        }
        return false;
    }
}
