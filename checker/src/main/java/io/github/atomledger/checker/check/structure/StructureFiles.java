package io.github.atomledger.checker.check.structure;

import io.github.atomledger.checker.AtomLedgerException;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.zip.GZIPInputStream;

/**
 * Tells the format of a structure file by its name, or by its content when the name does not
 * say ({@code .gz} alone, {@code .txt}, no extension), and opens files plain or gzip alike.
 * Stateless.
 */
final class StructureFiles {

    /** The formats {@code atomledger.structures} accepts. */
    enum Format { TABLE, SD, MOLFILE, MOLFILE_DIRECTORY }

    private static final int SNIFF_BYTES = 1 << 16;

    private StructureFiles() {
    }

    /**
     * @throws AtomLedgerException when the file does not exist or its format cannot be told
     */
    static Format format(Path path, String display) {
        if (Files.isDirectory(path)) {
            return Format.MOLFILE_DIRECTORY;
        }
        if (!Files.isRegularFile(path)) {
            throw new AtomLedgerException(display + ": structure file not found");
        }
        String name = path.getFileName().toString().toLowerCase(Locale.ROOT);
        String bare = name.endsWith(".gz") ? name.substring(0, name.length() - 3) : name;
        if (bare.endsWith(".tsv") || bare.endsWith(".tab")) {
            return Format.TABLE;
        }
        if (bare.endsWith(".sdf") || bare.endsWith(".sd")) {
            return Format.SD;
        }
        if (bare.endsWith(".mol")) {
            return Format.MOLFILE;
        }
        String head;
        try (InputStream in = open(path)) {
            head = new String(in.readNBytes(SNIFF_BYTES), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot read the structure file: " + e.getMessage(), e);
        }
        if (head.contains("\n$$$$")) {
            return Format.SD;
        }
        if (head.contains("\nM  END")) {
            return Format.MOLFILE;
        }
        String first = head.lines().filter(l -> !l.isBlank() && !l.startsWith("#")).findFirst().orElse("");
        if (first.contains("\t")) {
            return Format.TABLE;
        }
        throw new AtomLedgerException(display + ": cannot tell the format of this structure file: name it .tsv, .sdf, "
                + ".sdf.gz or .mol, or give a directory of .mol files");
    }

    /** Opens a file, decompressing it when it starts with the gzip magic number. */
    static InputStream open(Path path) throws IOException {
        InputStream in = new BufferedInputStream(Files.newInputStream(path), 1 << 16);
        in.mark(2);
        int a = in.read();
        int b = in.read();
        in.reset();
        return a == 0x1f && b == 0x8b ? new BufferedInputStream(new GZIPInputStream(in, 1 << 16), 1 << 16) : in;
    }

    /** Whether a file starts with the gzip magic number. */
    static boolean isGzip(Path path) throws IOException {
        try (InputStream in = Files.newInputStream(path)) {
            return in.read() == 0x1f && in.read() == 0x8b;
        }
    }
}
