package io.github.atomledger.checker.export;

import io.github.atomledger.atommapper.ctfile.RxnMaps;
import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.mapping.MappedSmiles;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.StructureException;
import io.github.atomledger.checker.check.mapping.CuratedVerdict;
import io.github.atomledger.checker.check.mapping.ImportedMap;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.engine.MappingInputs;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.transitions.TransitionAnnotation;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.Stream;

/**
 * Writes the maps of a finished run in standard files ({@code atomledger.exportMaps}), for tracer
 * software: per reaction with a map, an MDL RXN file {@code <reaction id>.rxn} with atom-atom
 * mapping numbers (CTfile standard, V2000), and per model one tab-separated file
 * {@value #TRANSITIONS} of all carbon transitions with readable positions.
 *
 * <p>Which map: a valid curated map (from an RXN file of {@code atomledger.curatedMaps} or an
 * annotation with {@code origin="curated"}) wins over the inferred one, as {@code annotate} would
 * keep it; otherwise the inferred map of a reaction that has one (mapped, ambiguous, best-found:
 * the status says how far to trust it). The RXN comment line and the TSV's {@code origin} column
 * mark which: {@code origin=curated} or {@code origin=inferred status=<status> cost=<edits>}.
 * Inferred RXN files number every mapped heavy atom; curated ones number carbons only (a curated
 * map is a carbon map). Molecules are the participant copies in the reaction's order, atoms in
 * each structure's own order, so atom k of a molecule is heavy atom k in the reports.
 *
 * <p>Layout: {@code <directory>/<reaction>.rxn} for one model; with several models, one
 * subdirectory per model named after its file (without {@code .xml}/{@code .xml.gz}). Files this
 * export wrote before ({@code *.rxn}, {@value #TRANSITIONS}) are removed first, so the directory
 * shows this run only. Deterministic. A reaction whose RXN file cannot be written (a molecule CDK
 * cannot lay out as a molfile) is skipped and named in {@link Written#failed()}.
 *
 * <p>A map is the tool's answer under a stated criterion, or a curator's claim; neither replaces
 * expert review of the chemistry.
 */
public final class MapExport {

    /** The name of the carbon transition table. */
    public static final String TRANSITIONS = "carbon-transitions.tsv";

    /**
     * What was written.
     *
     * @param files    every file written, in order
     * @param inferred reactions exported with an inferred map
     * @param curated  reactions exported with a curated map
     * @param failed   reactions skipped, with the reason
     */
    public record Written(List<Path> files, int inferred, int curated, List<String> failed) {
        public Written {
            files = List.copyOf(files);
            failed = List.copyOf(failed);
        }
    }

    private MapExport() {
    }

    /**
     * @throws IOException when the directory or a file cannot be written
     */
    public static Written write(RunResult result, Path directory) throws IOException {
        List<Path> files = new ArrayList<>();
        List<String> failed = new ArrayList<>();
        int inferred = 0;
        int curated = 0;
        boolean several = result.models().size() > 1;
        for (ModelResult m : result.models()) {
            if (!m.mapping().enabled()) {
                continue;
            }
            Path dir = several ? directory.resolve(stem(m.file())) : directory;
            clean(dir);
            Files.createDirectories(dir);
            StringBuilder tsv = new StringBuilder("reaction\torigin\tstatus\tfrom_species\tfrom_copy\tfrom_atom\tfrom_label"
                    + "\tto_species\tto_copy\tto_atom\tto_label\n");
            // Layout and molfile writing cost milliseconds per reaction: prepared on the run's mapping
            // threads, written in document order.
            List<Callable<Prepared>> jobs = new ArrayList<>();
            for (ReactionResult r : m.reactions()) {
                jobs.add(() -> prepare(r, m));
            }
            for (Prepared p : all(jobs, Math.max(1, result.config().mapping().threads()))) {
                if (p == null) {
                    continue;
                }
                if (p.failure() != null) {
                    failed.add(m.file() + " " + p.id() + ": " + p.failure());
                    continue;
                }
                Path f = dir.resolve(p.id() + ".rxn");
                Files.writeString(f, p.rxn(), StandardCharsets.UTF_8);
                files.add(f);
                if (p.curated()) {
                    curated++;
                } else {
                    inferred++;
                }
                tsv.append(p.rows());
            }
            Path table = dir.resolve(TRANSITIONS);
            Files.writeString(table, tsv.toString(), StandardCharsets.UTF_8);
            files.add(table);
        }
        return new Written(files, inferred, curated, failed);
    }

    private record Chosen(String origin, String status, int cost, List<AtomTransition> carbons, String smiles) {
    }

    /** One reaction's file text and table rows, or why it could not be written; null when it has no map. */
    private record Prepared(String id, boolean curated, String rxn, String rows, String failure) {
    }

    private static Prepared prepare(ReactionResult r, ModelResult m) {
        Chosen c = choose(r, m.mapping());
        if (c == null) {
            return null;
        }
        ReactionInput input = MappingInputs.inputOf(r.reaction(), r.balance(), m.mapping().structures()).orElse(null);
        if (input == null) {
            return null;
        }
        List<AtomTransition> atoms = c.carbons();
        String comment = "origin=" + c.origin() + (c.status().isEmpty() ? "" : " status=" + c.status())
                + (c.cost() >= 0 ? " cost=" + c.cost() : "");
        List<AtomTransition> all = c.smiles().isEmpty() ? null : MappedSmiles.atomMap(input, c.smiles()).orElse(null);
        atoms = all != null ? all : atoms;
        comment += all != null ? " atoms=heavy" : " atoms=carbon";
        String text;
        try {
            text = RxnMaps.write(r.id(), comment, input, atoms);
        } catch (StructureException | RuntimeException e) {
            return new Prepared(r.id(), false, "", "", String.valueOf(e.getMessage()));
        }
        Labels labels = new Labels(input);
        StringBuilder rows = new StringBuilder();
        for (AtomTransition t : c.carbons()) {
            rows.append(r.id()).append('\t').append(c.origin()).append('\t').append(c.status()).append('\t')
                    .append(t.from().species()).append('\t').append(t.from().copy()).append('\t')
                    .append(t.from().atom()).append('\t').append(labels.of(t.from(), true)).append('\t')
                    .append(t.to().species()).append('\t').append(t.to().copy()).append('\t')
                    .append(t.to().atom()).append('\t').append(labels.of(t.to(), false)).append('\n');
        }
        return new Prepared(r.id(), c.origin().equals(TransitionAnnotation.CURATED), text, rows.toString(), null);
    }

    /** Runs the jobs on {@code threads} threads; results in job order. */
    private static List<Prepared> all(List<Callable<Prepared>> jobs, int threads) throws IOException {
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "atomledger-export");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Prepared> out = new ArrayList<>();
            for (Future<Prepared> f : pool.invokeAll(jobs)) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("the map export was interrupted", e);
        } catch (ExecutionException e) {
            throw new IOException("the map export failed: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    /** The curated map when it is valid, else the inferred one when there is one, else null. */
    private static Chosen choose(ReactionResult r, MappingData data) {
        CuratedVerdict v = data.curated().get(r.id());
        if (v != null && v.valid()) {
            ImportedMap file = data.imported().get(r.id());
            if (file != null && file.read()) {
                return new Chosen(TransitionAnnotation.CURATED, "", -1, file.carbons(), "");
            }
            TransitionAnnotation stored = data.stored().get(r.id());
            if (stored != null && stored.isCurated()) {
                return new Chosen(TransitionAnnotation.CURATED, "", -1, stored.carbons(), "");
            }
        }
        ReactionMapping m = r.mapping();
        if (m == null || !m.hasMap()) {
            return null;
        }
        return new Chosen(TransitionAnnotation.INFERRED, m.status().label(), m.cost(), m.carbons(), m.mappedSmiles());
    }

    /**
     * Readable positions, as the other reports name atoms ({@code Structure.atomLabel}): the
     * element and the atom class when the species' SMILES carries a class no other atom of the same
     * element shares ({@code C3} for {@code [CH2:3]}), else the heavy-atom number.
     */
    private static final class Labels {
        private final Map<String, Participant> left = new HashMap<>();
        private final Map<String, Participant> right = new HashMap<>();

        Labels(ReactionInput input) {
            input.reactants().forEach(p -> left.put(p.species(), p));
            input.products().forEach(p -> right.put(p.species(), p));
        }

        String of(AtomRef a, boolean reactant) {
            Participant p = (reactant ? left : right).get(a.species());
            return p == null || a.atom() > p.structure().heavyAtomCount() ? Integer.toString(a.atom())
                    : p.structure().atomLabel(a.atom());
        }
    }

    private static String stem(String file) {
        String name = file.replace('\\', '/');
        name = name.substring(name.lastIndexOf('/') + 1);
        for (String ext : new String[] {".xml.gz", ".sbml.gz", ".xml", ".sbml", ".gz"}) {
            if (name.toLowerCase(Locale.ROOT).endsWith(ext)) {
                return name.substring(0, name.length() - ext.length());
            }
        }
        return name;
    }

    /** Removes what an earlier export wrote here: RXN files and the transition table. */
    private static void clean(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return;
        }
        try (Stream<Path> list = Files.list(dir)) {
            for (Path p : list.toList()) {
                String name = p.getFileName().toString();
                if (Files.isRegularFile(p) && (name.endsWith(".rxn") || name.equals(TRANSITIONS))) {
                    Files.delete(p);
                }
            }
        }
    }
}
