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
            for (ReactionResult r : m.reactions()) {
                Chosen c = choose(r, m.mapping());
                if (c == null) {
                    continue;
                }
                ReactionInput input = MappingInputs.inputOf(r.reaction(), r.balance(), m.mapping().structures()).orElse(null);
                if (input == null) {
                    continue;
                }
                List<AtomTransition> atoms = c.carbons();
                String comment = "origin=" + c.origin() + (c.status().isEmpty() ? "" : " status=" + c.status())
                        + (c.cost() >= 0 ? " cost=" + c.cost() : "");
                if (!c.smiles().isEmpty()) {
                    List<AtomTransition> all = MappedSmiles.atomMap(input, c.smiles()).orElse(null);
                    atoms = all != null ? all : atoms;
                    comment += all != null ? " atoms=heavy" : " atoms=carbon";
                } else {
                    comment += " atoms=carbon";
                }
                String text;
                try {
                    text = RxnMaps.write(r.id(), comment, input, atoms);
                } catch (StructureException | RuntimeException e) {
                    failed.add(m.file() + " " + r.id() + ": " + e.getMessage());
                    continue;
                }
                Path f = dir.resolve(r.id() + ".rxn");
                Files.writeString(f, text, StandardCharsets.UTF_8);
                files.add(f);
                if (c.origin().equals(TransitionAnnotation.CURATED)) {
                    curated++;
                } else {
                    inferred++;
                }
                Labels labels = new Labels(input);
                for (AtomTransition t : c.carbons()) {
                    tsv.append(r.id()).append('\t').append(c.origin()).append('\t').append(c.status()).append('\t')
                            .append(t.from().species()).append('\t').append(t.from().copy()).append('\t')
                            .append(t.from().atom()).append('\t').append(labels.of(t.from(), true)).append('\t')
                            .append(t.to().species()).append('\t').append(t.to().copy()).append('\t')
                            .append(t.to().atom()).append('\t').append(labels.of(t.to(), false)).append('\n');
                }
            }
            Path table = dir.resolve(TRANSITIONS);
            Files.writeString(table, tsv.toString(), StandardCharsets.UTF_8);
            files.add(table);
        }
        return new Written(files, inferred, curated, failed);
    }

    private record Chosen(String origin, String status, int cost, List<AtomTransition> carbons, String smiles) {
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
     * Readable positions: the element and the atom's class when the species' SMILES carries atom
     * classes (a curator's own numbering), else the element and the heavy-atom number.
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
            if (p == null || a.atom() > p.structure().heavyAtomCount()) {
                return "";
            }
            String element = p.structure().graph().element(a.atom() - 1);
            int cls = p.structure().mapNumbers()[a.atom() - 1];
            return element + (cls > 0 ? cls : a.atom());
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
