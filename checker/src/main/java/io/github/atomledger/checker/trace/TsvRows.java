package io.github.atomledger.checker.trace;

import io.github.atomledger.checker.AtomLedgerException;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The rows of a small UTF-8 TSV file with a header line: blank lines and lines starting with
 * {@code #} are skipped, header names are matched without regard to case, other columns are
 * ignored. Errors name the file and line.
 */
final class TsvRows {

    /** One data row: its cells by (lower-case) column name and its 1-based line. */
    record Row(Map<String, String> cells, int line) {
        String get(String column) {
            return cells.getOrDefault(column, "");
        }
    }

    private TsvRows() {
    }

    static List<Row> read(Path path, String display, String what, List<String> required, List<String> optional) {
        List<String> lines;
        try (BufferedReader in = new BufferedReader(new InputStreamReader(Files.newInputStream(path),
                StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)))) {
            lines = in.lines().toList();
        } catch (UncheckedIOException e) {
            if (e.getCause() instanceof CharacterCodingException) {
                throw new AtomLedgerException(display + ": the " + what + " file is not UTF-8 text", e);
            }
            throw new AtomLedgerException(display + ": cannot read the " + what + " file: " + e.getMessage(), e);
        } catch (NoSuchFileException e) {
            throw new AtomLedgerException(display + ": " + what + " file not found", e);
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot read the " + what + " file: " + e.getMessage(), e);
        }
        int header = -1;
        for (int i = 0; i < lines.size() && header < 0; i++) {
            if (!lines.get(i).isBlank() && !lines.get(i).startsWith("#")) {
                header = i;
            }
        }
        if (header < 0) {
            throw new AtomLedgerException(display + ": the " + what + " file is empty (expected a header line with "
                    + String.join(", ", required) + ")");
        }
        String[] names = lines.get(header).replace("\uFEFF", "").split("\t", -1);
        Map<String, Integer> column = new HashMap<>();
        for (int i = 0; i < names.length; i++) {
            String n = names[i].strip().toLowerCase(Locale.ROOT);
            if (required.contains(n) || optional.contains(n)) {
                column.putIfAbsent(n, i);
            }
        }
        for (String r : required) {
            if (!column.containsKey(r)) {
                throw new AtomLedgerException(display + ":" + (header + 1) + ": the header needs the tab-separated columns "
                        + String.join(", ", required) + "; '" + r + "' is missing (found: " + String.join(", ", names) + ")");
            }
        }
        List<Row> rows = new ArrayList<>();
        for (int i = header + 1; i < lines.size(); i++) {
            String l = lines.get(i);
            if (l.isBlank() || l.startsWith("#")) {
                continue;
            }
            String[] cells = l.split("\t", -1);
            Map<String, String> byName = new HashMap<>();
            column.forEach((n, c) -> byName.put(n, c < cells.length ? cells[c].strip() : ""));
            rows.add(new Row(byName, i + 1));
        }
        return rows;
    }
}
