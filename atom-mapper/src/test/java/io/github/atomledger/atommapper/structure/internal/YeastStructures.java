package io.github.atomledger.atommapper.structure.internal;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * The distinct SMILES of yeast-GEM's structure table, {@code ../shared/data/yeast-GEM.structures.tsv}
 * (species id, tab, SMILES), read in place. Tests that use it skip cleanly when the shared data
 * folder is absent, as on a user's machine; the file is never copied into the project.
 */
final class YeastStructures {

    private static final String FILE = "yeast-GEM.structures.tsv";

    private YeastStructures() {
    }

    /** The distinct non-empty SMILES in table order; skips the calling test when the file is absent. */
    static List<String> smiles() throws IOException {
        Path file = null;
        for (Path dir = Path.of("").toAbsolutePath(); dir != null && file == null; dir = dir.getParent()) {
            Path candidate = dir.resolveSibling("shared").resolve("data").resolve(FILE);
            file = Files.isRegularFile(candidate) ? candidate : null;
        }
        assumeTrue(file != null, "../shared/data/" + FILE + " is absent; skipping a test on real structures");
        Set<String> distinct = new LinkedHashSet<>();
        List<String> lines = Files.readAllLines(file);
        for (String line : lines.subList(1, lines.size())) {
            int tab = line.indexOf('\t');
            String smiles = tab < 0 ? "" : line.substring(tab + 1).strip();
            if (!smiles.isEmpty()) {
                distinct.add(smiles);
            }
        }
        return new ArrayList<>(distinct);
    }
}
