package io.github.atomledger.checker.check.structure;

import io.github.atomledger.checker.AtomLedgerException;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.stream.Stream;

/**
 * MDL molfiles, one molecule per file, named by species id ({@code M_pyr_c.mol}) or by a
 * cross-reference ({@code CHEBI_15361.mol}, {@code kegg.compound_C00022.mol}; see
 * {@link CrossReference#fromName}): a directory of them (not its subdirectories), or one file
 * given on its own. Files are read when a species needs them. Thread-safe after loading.
 */
public final class MolfileDirectory implements StructureFile {

    private final String display;
    private final boolean directory;
    private final Map<String, Path> byName;
    private final Map<CrossReference, String> byReference;

    private MolfileDirectory(String display, boolean directory, Map<String, Path> byName) {
        this.display = display;
        this.directory = directory;
        this.byName = byName;
        Map<CrossReference, String> refs = new TreeMap<>();
        byName.keySet().forEach(n -> CrossReference.fromName(n).ifPresent(x -> refs.putIfAbsent(x, n)));
        this.byReference = refs;
    }

    /** A directory of {@code .mol} files (names compared as written; the extension in any case). */
    public static MolfileDirectory directory(Path dir, String display) {
        Map<String, Path> files = new TreeMap<>();
        try (Stream<Path> list = Files.list(dir)) {
            list.filter(Files::isRegularFile).forEach(p -> {
                String name = p.getFileName().toString();
                if (name.toLowerCase(Locale.ROOT).endsWith(".mol")) {
                    files.put(name.substring(0, name.length() - 4), p);
                }
            });
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot list the molfile directory: " + e.getMessage(), e);
        }
        return new MolfileDirectory(display, true, files);
    }

    /** One molfile, named by its file name without the extension. */
    public static MolfileDirectory single(Path file, String display) {
        String name = file.getFileName().toString();
        int dot = name.toLowerCase(Locale.ROOT).endsWith(".mol") ? name.length() - 4 : name.length();
        return new MolfileDirectory(display, false, new TreeMap<>(Map.of(name.substring(0, dot), file)));
    }

    @Override
    public String display() {
        return display;
    }

    @Override
    public SpeciesStructures.Source speciesSource() {
        return SpeciesStructures.Source.MOLFILE;
    }

    @Override
    public Optional<Entry> species(String id) {
        return Optional.ofNullable(byName.get(id)).map(p -> entry(id));
    }

    @Override
    public Optional<Entry> reference(CrossReference reference) {
        return Optional.ofNullable(byReference.get(reference)).map(this::entry);
    }

    private Entry entry(String name) {
        String shown = directory ? display + "/" + byName.get(name).getFileName() : display;
        return new Entry("molfile", shown, 1, name);
    }

    @Override
    public String text(Entry entry) {
        Path p = byName.get(entry.key());
        try (InputStream in = StructureFiles.open(p)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new AtomLedgerException(entry.origin() + ": cannot read the molfile: " + e.getMessage(), e);
        }
    }
}
