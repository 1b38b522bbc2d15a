package io.github.atomledger.checker.trace;

import io.github.atomledger.checker.AtomLedgerException;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads a fates file ({@code models/fates.tsv}): UTF-8, tab-separated, a header line with the
 * columns {@code pathway} (a name from the pathways file), {@code carbon} (the source carbon as
 * reports name it: {@code C1} from an atom class, or a heavy-atom index) and {@code fate} (a
 * species id, optionally {@code :position}). Blank lines and lines starting with {@code #} are
 * skipped.
 *
 * <pre>
 * pathway	carbon	fate
 * leucine	C1	co2_c
 * leucine	C5	acac_c
 * </pre>
 */
public final class FateFile {

    private FateFile() {
    }

    /**
     * @param pathways the names the pathways file defines
     * @throws AtomLedgerException naming the file and line: missing columns or cells, a pathway
     *     the pathways file does not define, the same carbon of one pathway twice
     */
    public static List<FateExpectation> read(Path path, String display, Set<String> pathways) {
        List<FateExpectation> out = new ArrayList<>();
        Map<String, Integer> seen = new HashMap<>();
        for (TsvRows.Row row : TsvRows.read(path, display, "fates", List.of("pathway", "carbon", "fate"), List.of())) {
            String where = display + ":" + row.line() + ": ";
            String pathway = row.get("pathway");
            String carbon = row.get("carbon");
            String fate = row.get("fate");
            if (pathway.isEmpty() || carbon.isEmpty() || fate.isEmpty()) {
                throw new AtomLedgerException(where + "an expectation needs a pathway, a carbon and a fate");
            }
            if (!pathways.contains(pathway)) {
                throw new AtomLedgerException(where + "pathway " + pathway + " is not defined in the pathways file"
                        + (pathways.isEmpty() ? "" : " (defined: " + String.join(", ", new java.util.TreeSet<>(pathways)) + ")"));
            }
            int colon = fate.indexOf(':');
            String species = colon < 0 ? fate : fate.substring(0, colon).strip();
            String position = colon < 0 ? "" : fate.substring(colon + 1).strip();
            if (species.isEmpty() || (colon >= 0 && position.isEmpty())) {
                throw new AtomLedgerException(where + "the fate '" + fate + "' is not 'species' or 'species:position'");
            }
            Integer first = seen.putIfAbsent(pathway + "\u0000" + carbon, row.line());
            if (first != null) {
                throw new AtomLedgerException(where + "carbon " + carbon + " of pathway " + pathway
                        + " has an expectation already (line " + first + ")");
            }
            out.add(new FateExpectation(pathway, carbon, species, position, display, row.line()));
        }
        return out;
    }
}
