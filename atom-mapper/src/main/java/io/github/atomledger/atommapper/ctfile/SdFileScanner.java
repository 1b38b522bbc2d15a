package io.github.atomledger.atommapper.ctfile;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;

/**
 * Walks an MDL SD file (structure-data file) once and reports, per record, where it is and the
 * values of one data item, without parsing any molecule: the step that indexes a file of a
 * hundred thousand records. A record is a molfile, then data items ({@code > <Field Name>} line,
 * value lines, a blank line), then a line {@code $$$$} (BIOVIA "CTfile Formats", from memory for
 * the edition). Field names compare exactly, as the format has them.
 *
 * <pre>{@code
 * SdFileScanner.scan(in, "ChEBI ID", r -> index.put(r.values().get(0), r.offset()));
 * }</pre>
 *
 * <p>Offsets and lengths are in bytes of the stream as given (the decompressed stream for a
 * gzip file); lines are 1-based and end at {@code \n} ({@code \r\n} is fine). Text is read as
 * UTF-8. Not thread-safe per call; the class is stateless.
 */
public final class SdFileScanner {

    /**
     * One record.
     *
     * @param number  1-based record number in the file
     * @param line    1-based line of its first line
     * @param offset  byte offset of its first byte
     * @param length  bytes up to and including its {@code $$$$} line
     * @param values  the non-blank value lines of the requested data item, in order (empty when
     *                the record has none)
     * @param problem why the record cannot be used (no {@code M  END} before the data items, or
     *                the requested data item missing), or null
     */
    public record Record(int number, long line, long offset, long length, List<String> values, String problem) {
        public Record {
            values = List.copyOf(values);
        }
    }

    private SdFileScanner() {
    }

    /**
     * Reads {@code in} to its end, calling {@code sink} once per record in file order. A record
     * starts right after the previous {@code $$$$} (its name line may be blank). Blank lines
     * after the last {@code $$$$} are not a record; a last record without {@code $$$$} is
     * reported like the others.
     *
     * @param field the data item whose values are wanted, e.g. {@code ChEBI ID}
     * @throws IOException from the stream
     */
    public static void scan(InputStream in, String field, Consumer<Record> sink) throws IOException {
        Objects.requireNonNull(field, "field");
        LineReader lines = new LineReader(in);
        int number = 0;
        long line = 0;
        long start = 0;
        long recordLine = 1;
        boolean content = false;
        boolean end = false;
        boolean inData = false;
        boolean wanted = false;
        boolean seenField = false;
        List<String> values = new ArrayList<>();
        while (lines.next()) {
            line++;
            // A record starts right after the previous $$$$: its first (name) line may be blank.
            content |= !lines.isBlank();
            if (lines.startsWith("$$$$")) {
                sink.accept(record(++number, recordLine, start, lines.end() - start, values, end, seenField, field));
                values = new ArrayList<>();
                content = false;
                end = false;
                inData = false;
                wanted = false;
                seenField = false;
                start = lines.end();
                recordLine = line + 1;
                continue;
            }
            if (!inData && lines.startsWith("M  END")) {
                end = true;
            } else if (lines.startsWith(">") && (end || inData)) {
                inData = true;
                wanted = field.equals(lines.fieldName());
                seenField |= wanted;
            } else if (wanted) {
                if (lines.isBlank()) {
                    wanted = false;
                } else {
                    values.add(lines.text().strip());
                }
            }
        }
        if (content) {
            sink.accept(record(++number, recordLine, start, lines.end() - start, values, end, seenField, field));
        }
    }

    private static Record record(int number, long line, long start, long length, List<String> values, boolean end,
                                 boolean seenField, String field) {
        String problem = !end ? "the molfile part has no 'M  END' line"
                : !seenField ? "no data item '" + field + "'"
                : values.isEmpty() ? "the data item '" + field + "' is empty" : null;
        return new Record(number, line, start, length, values, problem);
    }

    /**
     * The molfile part of one record's text: everything up to and including its {@code M  END}
     * line (the whole text when there is none, so that the molfile reader names the problem).
     */
    public static String molfilePart(String recordText) {
        int at = 0;
        while (at < recordText.length()) {
            int nl = recordText.indexOf('\n', at);
            int next = nl < 0 ? recordText.length() : nl + 1;
            if (recordText.startsWith("M  END", at)) {
                return recordText.substring(0, next);
            }
            at = next;
        }
        return recordText;
    }

    /** Lines of bytes with their end offsets; one reusable line buffer. */
    private static final class LineReader {
        private final InputStream in;
        private final byte[] buffer = new byte[1 << 16];
        private int position;
        private int limit;
        private long consumed;
        private byte[] line = new byte[256];
        private int length;
        private long end;

        LineReader(InputStream in) {
            this.in = in;
        }

        boolean next() throws IOException {
            length = 0;
            boolean any = false;
            while (true) {
                if (position == limit) {
                    consumed += limit;
                    limit = in.read(buffer, 0, buffer.length);
                    position = 0;
                    if (limit <= 0) {
                        limit = 0;
                        end = consumed;
                        return any;
                    }
                }
                any = true;
                int from = position;
                while (position < limit && buffer[position] != '\n') {
                    position++;
                }
                append(from, position);
                if (position < limit) {
                    position++;
                    end = consumed + position;
                    if (length > 0 && line[length - 1] == '\r') {
                        length--;
                    }
                    return true;
                }
            }
        }

        private void append(int from, int to) {
            int n = to - from;
            if (length + n > line.length) {
                line = java.util.Arrays.copyOf(line, Math.max(line.length * 2, length + n));
            }
            System.arraycopy(buffer, from, line, length, n);
            length += n;
        }

        /** Byte offset just after this line's end. */
        long end() {
            return end;
        }

        boolean isBlank() {
            for (int i = 0; i < length; i++) {
                if (line[i] != ' ' && line[i] != '\t') {
                    return false;
                }
            }
            return true;
        }

        boolean startsWith(String prefix) {
            if (length < prefix.length()) {
                return false;
            }
            for (int i = 0; i < prefix.length(); i++) {
                if (line[i] != prefix.charAt(i)) {
                    return false;
                }
            }
            return true;
        }

        String text() {
            return new String(line, 0, length, StandardCharsets.UTF_8);
        }

        /** The name between the first {@code <} and the next {@code >} of a data header, or "". */
        String fieldName() {
            int open = -1;
            for (int i = 1; i < length; i++) {
                if (line[i] == '<' && open < 0) {
                    open = i;
                } else if (line[i] == '>' && open >= 0) {
                    return new String(line, open + 1, i - open - 1, StandardCharsets.UTF_8);
                }
            }
            return "";
        }
    }
}
