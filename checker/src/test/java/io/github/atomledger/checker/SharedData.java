package io.github.atomledger.checker;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Locates the real public models in {@code ../shared/data} beside the project root. Tests that
 * use them call {@link #require} and skip cleanly when the folder is absent (as on a user's
 * machine). The files are read in place and never copied into the project.
 */
public final class SharedData {

    private SharedData() {
    }

    /** The shared data folder, or null when it is not there. */
    public static Path folder() {
        Path dir = Path.of("").toAbsolutePath();
        for (int i = 0; i < 4 && dir != null; i++) {
            Path candidate = dir.resolve("../shared/data").normalize();
            if (Files.isDirectory(candidate)) {
                return candidate;
            }
            dir = dir.getParent();
        }
        return null;
    }

    /** The named file in the shared data folder; skips the test when it is absent. */
    public static Path require(String name) {
        Path dir = folder();
        assumeTrue(dir != null, "../shared/data is absent; skipping a test on real models");
        Path file = dir.resolve(name);
        assumeTrue(Files.isRegularFile(file), name + " is absent from ../shared/data; skipping");
        return file;
    }
}
