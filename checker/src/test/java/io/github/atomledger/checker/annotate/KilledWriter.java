package io.github.atomledger.checker.annotate;

import java.nio.file.Path;

/**
 * The child process of {@code AnnotateSafetyTest}: annotates one model over and over, alternating
 * between two annotation sets, so that every cycle rewrites the whole file, until it is killed.
 * Prints {@code STARTED} once the JVM is up. Not a test; run with the test class path.
 */
final class KilledWriter {

    private KilledWriter() {
    }

    public static void main(String[] args) {
        Path file = Path.of(args[0]);
        int reactions = Integer.parseInt(args[1]);
        ModelAnnotator annotator = new ModelAnnotator(false, false, Long.MAX_VALUE);
        System.out.println("STARTED");
        System.out.flush();
        for (long cycle = 0; ; cycle++) {
            annotator.annotate(file, file.getFileName().toString(),
                    AnnotateSafetyTest.annotations(reactions, cycle % 2 == 0 ? "a" : "b"));
        }
    }
}
