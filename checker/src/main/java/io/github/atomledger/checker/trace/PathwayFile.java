package io.github.atomledger.checker.trace;

import io.github.atomledger.checker.AtomLedgerException;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads a pathways file ({@code models/pathways.tsv}): UTF-8, tab-separated, a header line with
 * the columns {@code pathway} (a name), {@code source} (the species whose carbons are followed)
 * and {@code steps} (reaction ids in order, separated by spaces; a leading {@code -} runs a
 * reaction backwards), and optionally {@code model} (the model file the row belongs to, as
 * reports name it; empty: every model that has the source species). Blank lines and lines
 * starting with {@code #} are skipped.
 *
 * <pre>
 * pathway	source	steps
 * leucine	leu__L_c	R_LEUTA R_BCKDH R_IVD R_MCC R_MGCH R_HMGL
 * </pre>
 */
public final class PathwayFile {

    private PathwayFile() {
    }

    /**
     * @throws AtomLedgerException naming the file and line: missing columns, an empty name,
     *     source or step list, a step that is only {@code -}, a name used twice
     */
    public static List<Pathway> read(Path path, String display) {
        List<Pathway> out = new ArrayList<>();
        Map<String, Integer> seen = new HashMap<>();
        for (TsvRows.Row row : TsvRows.read(path, display, "pathways", List.of("pathway", "source", "steps"),
                List.of("model"))) {
            String where = display + ":" + row.line() + ": ";
            String name = row.get("pathway");
            String source = row.get("source");
            if (name.isEmpty() || source.isEmpty()) {
                throw new AtomLedgerException(where + "a pathway needs a name and a source species");
            }
            List<Step> steps = new ArrayList<>();
            for (String token : row.get("steps").split("\\s+")) {
                if (token.isEmpty()) {
                    continue;
                }
                if (token.equals("-")) {
                    throw new AtomLedgerException(where + "a lone '-' in the steps of pathway " + name
                            + " (write -R_X, without a space, to run R_X backwards)");
                }
                steps.add(Step.parse(token));
            }
            if (steps.isEmpty()) {
                throw new AtomLedgerException(where + "pathway " + name + " has no steps");
            }
            Integer first = seen.putIfAbsent(name, row.line());
            if (first != null) {
                throw new AtomLedgerException(where + "pathway " + name + " is defined twice (first at line " + first + ")");
            }
            out.add(new Pathway(name, source, steps, row.get("model"), display, row.line()));
        }
        return out;
    }
}
