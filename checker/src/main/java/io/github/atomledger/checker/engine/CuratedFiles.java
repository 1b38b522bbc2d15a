package io.github.atomledger.checker.engine;

import io.github.atomledger.atommapper.ctfile.RxnFile;
import io.github.atomledger.atommapper.ctfile.RxnMaps;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.StructureException;
import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.check.mapping.ImportedMap;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.ReactionInfo;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Curated maps given as MDL RXN files with atom-atom mapping numbers: a directory of
 * {@code <reaction id>.rxn} files, each read onto the reaction's structures
 * ({@link RxnMaps#onto}). A file that cannot be read, names no reaction of the model, or belongs to
 * a reaction that has nothing to check it against (no structures, not a mapped class) is kept with
 * the reason; nothing else of the run is lost. Files are taken in name order.
 */
final class CuratedFiles {

    private CuratedFiles() {
    }

    static Map<String, ImportedMap> read(Path dir, Path base, ModelView model, Map<String, ReactionInput> inputs,
                                         Map<String, ReactionMapping> results) {
        String shownDir = ModelLocator.relative(base, dir);
        if (!Files.isDirectory(dir)) {
            throw new AtomLedgerException(shownDir + ": the curated maps directory does not exist");
        }
        List<Path> files;
        try (Stream<Path> list = Files.list(dir)) {
            files = list.filter(p -> p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".rxn"))
                    .filter(Files::isRegularFile).sorted().toList();
        } catch (IOException e) {
            throw new AtomLedgerException(shownDir + ": cannot list the curated maps: " + e.getMessage(), e);
        }
        Set<String> reactions = new HashSet<>();
        model.reactions().stream().map(ReactionInfo::id).forEach(reactions::add);
        Map<String, ImportedMap> out = new LinkedHashMap<>();
        for (Path f : files) {
            String name = f.getFileName().toString();
            String id = name.substring(0, name.length() - 4);
            String shown = ModelLocator.relative(base, f);
            if (!reactions.contains(id)) {
                out.put(id, unusable(id, shown, "the file is named after reaction " + id + ", which the model does not define", 0));
                continue;
            }
            String text;
            try {
                text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                        .decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(f))).toString();
            } catch (CharacterCodingException e) {
                out.put(id, unusable(id, shown, "the file is not UTF-8 text", 0));
                continue;
            } catch (IOException e) {
                out.put(id, unusable(id, shown, "cannot read the file: " + e.getMessage(), 0));
                continue;
            }
            RxnFile rxn;
            try {
                rxn = RxnFile.parse(text);
            } catch (StructureException e) {
                out.put(id, unusable(id, shown, e.getMessage(), e.line()));
                continue;
            } catch (RuntimeException e) {
                out.put(id, unusable(id, shown, "the file could not be read: " + e, 0));
                continue;
            }
            ReactionInput input = inputs.get(id);
            if (input == null) {
                ReactionMapping m = results.get(id);
                String why = m == null || m.reason().isEmpty() ? "the reaction is not mapped" : m.reason();
                out.put(id, unusable(id, shown, "nothing to check the map against: " + why, 0));
                continue;
            }
            RxnMaps.Reading reading;
            try {
                reading = RxnMaps.onto(rxn, input);
            } catch (RuntimeException e) {
                out.put(id, unusable(id, shown, "the file's molecules could not be matched to the reaction: " + e, 0));
                continue;
            }
            List<String> problems = reading.problems().stream().map(p -> shown + ": " + p).toList();
            out.put(id, new ImportedMap(id, shown, reading.carbons(), problems, "", 0));
        }
        return out;
    }

    private static ImportedMap unusable(String id, String file, String reason, int line) {
        return new ImportedMap(id, file, List.of(), List.of(), reason, line);
    }
}
