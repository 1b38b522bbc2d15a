package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.depict.ReactionPicture;
import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.MappingStatus;
import io.github.atomledger.atommapper.mapping.ReactionInput;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Turns an atom-mapper result into what the HTML report shows ({@link ReactionMapping}): the
 * status, a one-sentence summary, the notes, and the drawing with atom indices (the report hides them
 * until asked)
 * (drawn by atom-mapper's {@link ReactionPicture}; checker itself never touches CDK).
 */
public final class ReactionMappings {

    private ReactionMappings() {
    }

    /**
     * The report view of one mapping.
     *
     * @param input  the reaction as given to the mapper
     * @param result the mapper's result for it
     * @param titles molecule titles by species id (usually the species names)
     */
    public static ReactionMapping of(ReactionInput input, MappingResult result, Map<String, String> titles) {
        String svg = ReactionPicture.drawable(result)
                ? ReactionPicture.of(input, result).titles(titles).atomIndices(true).svg() : "";
        List<String> notes = new ArrayList<>(result.stereoNotes());
        if (result.status() == MappingStatus.AMBIGUOUS && !result.alternatives().isEmpty()) {
            notes.add(result.alternatives().size() + " other co-optimal carbon map(s) exist; the drawing shows one.");
        }
        return new ReactionMapping(result.status().label(), summary(result), svg, notes);
    }

    static String summary(MappingResult r) {
        int carbons = r.carbonTransitions().size();
        String reason = r.reason().isEmpty() || r.reason().endsWith(".") ? r.reason() : r.reason() + ".";
        return switch (r.status()) {
            case MAPPED -> "Mapped: " + carbons + " carbon(s), " + r.cost() + " weighted bond edit(s), proven minimum.";
            case AMBIGUOUS -> "Ambiguous: " + carbons + " carbon(s), " + r.cost()
                    + " weighted bond edit(s), proven minimum, but co-optimal maps move some carbons elsewhere.";
            case BEST_FOUND -> "Best found: " + carbons + " carbon(s), " + r.cost() + " weighted bond edit(s), lower bound "
                    + r.lowerBound() + " (not proven optimal): " + reason;
            case UNMAPPABLE -> "Not mappable: " + reason;
            case TOO_LARGE -> "Not attempted: " + reason;
        };
    }
}
