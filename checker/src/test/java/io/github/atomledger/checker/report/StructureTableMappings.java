package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.mapping.AtomMapper;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A test stand-in for the engine's mapping step (issue 4): reads a {@code species<TAB>smiles}
 * table, maps every two-sided reaction whose participants all have structures and integer
 * coefficients with atom-mapper, and hands the results to the HTML report.
 */
final class StructureTableMappings implements MappingSource {

    /** Mapping the demo takes half a minute; the test classes of one JVM share the results. */
    private static final Map<String, ReactionMapping> CACHE = new java.util.concurrent.ConcurrentHashMap<>();

    static final long NODE_LIMIT = 300_000;

    private final Map<String, Structure> structures = new HashMap<>();
    /**
     * A node budget instead of the default two-second time budget, so the pictures (and the
     * report's bytes) do not depend on how busy the machine is.
     */
    private final AtomMapper mapper = new AtomMapper(MappingOptions.defaults()
            .withTimeBudget(java.time.Duration.ofMinutes(2)).withNodeLimit(NODE_LIMIT));
    int mapped;

    StructureTableMappings(Path table) throws IOException, StructureException {
        for (String line : Files.readAllLines(table)) {
            String[] cols = line.split("\t");
            if (cols.length < 2 || cols[0].equals("species") || line.startsWith("#")) {
                continue;
            }
            structures.put(cols[0], Structure.fromSmiles(cols[1]));
        }
    }

    @Override
    public Optional<ReactionMapping> mapping(ModelResult model, ReactionResult reaction) {
        if (reaction.reaction().isOneSided()) {
            return Optional.empty();
        }
        List<Participant> left = side(reaction.reaction().reactants());
        List<Participant> right = side(reaction.reaction().products());
        if (left == null || right == null) {
            return Optional.empty();
        }
        mapped++;
        return Optional.of(CACHE.computeIfAbsent(model.file() + "#" + reaction.id(), k -> {
            ReactionInput input = new ReactionInput(reaction.id(), left, right);
            MappingResult result = mapper.map(input);
            Map<String, String> titles = new HashMap<>();
            for (SpeciesInfo s : model.model().species()) {
                titles.put(s.id(), s.name());
            }
            return ReactionMappings.of(input, result, titles);
        }));
    }

    private List<Participant> side(List<io.github.atomledger.checker.model.Participant> refs) {
        List<Participant> out = new ArrayList<>();
        for (io.github.atomledger.checker.model.Participant p : refs) {
            Structure s = structures.get(p.species());
            if (s == null || p.stoichiometryText() == null) {
                return null;
            }
            BigDecimal c = new BigDecimal(p.stoichiometryText().strip());
            if (c.signum() <= 0 || c.stripTrailingZeros().scale() > 0) {
                return null;
            }
            out.add(new Participant(p.species(), s, c.intValueExact()));
        }
        return out;
    }
}
