package io.github.atomledger.checker.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Writes report files whole: a temporary file beside the target, then a move. */
final class ReportFiles {

    private ReportFiles() {
    }

    /** Temporary files are created owner-only; a report is for everyone who can read the directory. */
    private static void readableByAll(Path tmp) throws IOException {
        if (tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            Files.setPosixFilePermissions(tmp, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
        }
    }

    static void write(Path file, String content) throws IOException {
        write(file, content.getBytes(StandardCharsets.UTF_8));
    }

    static void write(Path file, byte[] content) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + file.getFileName(), ".tmp");
        try {
            Files.write(tmp, content);
            readableByAll(tmp);
            replace(tmp, file);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /**
     * The JSON text of {@code tree} as {@code file}; when {@code tree} is null, removes an earlier
     * run's file instead (so the folder never shows stale output) and returns null.
     */
    static Path writeJsonOrRemove(Path file, Object tree) throws IOException {
        if (tree == null) {
            Files.deleteIfExists(file);
            return null;
        }
        write(file, JsonText.of(tree));
        return file;
    }

    /** A copy of {@code source} as {@code target}, whole: copied beside the target, then moved. */
    static void copy(Path source, Path target) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + target.getFileName(), ".tmp");
        try {
            Files.copy(source, tmp, StandardCopyOption.REPLACE_EXISTING);
            replace(tmp, target);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** Moves a finished temporary file over {@code target}: atomically where the file system can. */
    static void replace(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
