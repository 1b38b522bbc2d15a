package io.github.atomledger.checker.model;

import java.nio.file.Path;

/** Test access to the loader without its second thread, for the benchmark's {@code load1} step (issue 8). */
public final class OneThreadLoader {

    private OneThreadLoader() {
    }

    public static ModelView load(Path file, String displayPath) {
        return new ModelLoader(LoadOptions.defaults(), false).load(file, displayPath);
    }
}
