package io.github.atomledger.checker.check.structure;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The structure files of a run ({@code atomledger.structures}), in the configured order, which is
 * their order of precedence among themselves. Each entry is a table, an SD file, a molfile or a
 * directory of molfiles; the format is told by the name or, failing that, by the content.
 *
 * <pre>{@code
 * StructureLibrary lib = StructureLibrary.load(List.of(dir.resolve("chebi.sdf.gz"), dir.resolve("lab.tsv")),
 *         dir, SdFile.DEFAULT_ID_FIELD, cacheDirectory);
 * }</pre>
 */
public final class StructureLibrary {

    public static final StructureLibrary EMPTY = new StructureLibrary(List.of());

    private final List<StructureFile> files;

    private StructureLibrary(List<StructureFile> files) {
        this.files = List.copyOf(files);
    }

    /** A library of files already read (tests, or one table). */
    public static StructureLibrary of(List<StructureFile> files) {
        return new StructureLibrary(files);
    }

    /**
     * Reads (tables) or indexes (SD files) each file; molfiles are listed and read later.
     *
     * @param base           the project directory; files inside it are named relative to it
     * @param sdIdField      the SD data item holding the id ({@link SdFile#DEFAULT_ID_FIELD})
     * @param cacheDirectory where SD indexes are kept between runs, or null
     * @throws io.github.atomledger.checker.AtomLedgerException for a missing or unreadable file, a
     *     malformed table, or a format that cannot be told
     */
    public static StructureLibrary load(List<Path> paths, Path base, String sdIdField, Path cacheDirectory) {
        List<StructureFile> files = new ArrayList<>();
        for (Path p : paths) {
            String display = display(base, p);
            files.add(switch (StructureFiles.format(p, display)) {
                case TABLE -> StructureTable.load(p, display);
                case SD -> SdFile.load(p, display, sdIdField, cacheDirectory);
                case MOLFILE -> MolfileDirectory.single(p, display);
                case MOLFILE_DIRECTORY -> MolfileDirectory.directory(p, display);
            });
        }
        return new StructureLibrary(files);
    }

    private static String display(Path base, Path p) {
        Path abs = p.toAbsolutePath().normalize();
        Path b = base == null ? null : base.toAbsolutePath().normalize();
        return b != null && abs.startsWith(b) && !abs.equals(b) ? b.relativize(abs).toString().replace('\\', '/') : abs.toString();
    }

    public List<StructureFile> files() {
        return files;
    }

    /** Records of the files that cannot be used at all, in file order. */
    public List<SpeciesStructures.Problem> problems() {
        List<SpeciesStructures.Problem> out = new ArrayList<>();
        files.forEach(f -> out.addAll(f.problems()));
        return out;
    }
}
