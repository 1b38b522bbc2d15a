package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.depict.ReactionPicture;
import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.MappingStatus;
import io.github.atomledger.atommapper.mapping.ReactionInput;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.model.Participant;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Turns an atom map (the engine's, or an atom-mapper result) into what the HTML report shows ({@link MapPicture}): the
 * status, a one-sentence summary, the notes, and what to draw ({@link PictureRequest}; the report
 * draws it through atom-mapper's {@link ReactionPicture}, so checker itself never touches CDK).
 */
public final class MapPictures {

    private MapPictures() {
    }

    /**
     * The report view of one mapping.
     *
     * @param input  the reaction as given to the mapper
     * @param result the mapper's result for it
     * @param titles molecule titles by species id (usually the species names)
     */
    public static MapPicture of(ReactionInput input, MappingResult result, Map<String, String> titles) {
        PictureRequest drawing = ReactionPicture.drawable(result)
                ? new PictureRequest(result.reactionId(), result.mappedSmiles(), expand(input.reactants()),
                expand(input.products()), titlesOf(titles, input.reactants(), input.products())) : null;
        List<String> notes = new ArrayList<>(result.stereoNotes());
        if (result.status() == MappingStatus.AMBIGUOUS && !result.alternatives().isEmpty()) {
            notes.add(otherMaps(result.alternatives().size()));
        }
        return new MapPicture(result.status().label(), summary(result), drawing, null, notes);
    }

    /**
     * The view of the map the engine computed for this reaction ({@link ReactionResult#mapping()}),
     * or empty when mapping did not run for it. Molecule titles are the species names.
     */
    public static Optional<MapPicture> fromEngine(ModelResult model, ReactionResult reaction) {
        ReactionMapping m = reaction.mapping();
        if (m == null) {
            return Optional.empty();
        }
        PictureRequest drawing = null;
        if (m.hasMap() && !m.mappedSmiles().isEmpty()) {
            List<String> left = molecules(reaction.reaction().reactants());
            List<String> right = molecules(reaction.reaction().products());
            Map<String, String> titles = new HashMap<>();
            for (List<String> side : List.of(left, right)) {
                for (String id : side) {
                    model.model().species(id).ifPresent(s -> titles.put(id, s.name()));
                }
            }
            drawing = new PictureRequest(m.reactionId(), m.mappedSmiles(), left, right, titles);
        }
        List<String> notes = new ArrayList<>(m.stereoNotes());
        if (!m.alternatives().isEmpty()) {
            notes.add(otherMaps(m.alternatives().size()));
        }
        return Optional.of(new MapPicture(m.status().label(), summary(m), drawing, null, notes));
    }

    private static List<String> expand(List<io.github.atomledger.atommapper.mapping.Participant> side) {
        List<String> out = new ArrayList<>();
        for (io.github.atomledger.atommapper.mapping.Participant p : side) {
            for (int k = 0; k < p.coefficient(); k++) {
                out.add(p.species());
            }
        }
        return out;
    }

    private static Map<String, String> titlesOf(Map<String, String> titles,
                                                List<io.github.atomledger.atommapper.mapping.Participant> left,
                                                List<io.github.atomledger.atommapper.mapping.Participant> right) {
        Map<String, String> out = new HashMap<>();
        for (List<io.github.atomledger.atommapper.mapping.Participant> side : List.of(left, right)) {
            for (io.github.atomledger.atommapper.mapping.Participant p : side) {
                String t = titles.get(p.species());
                if (t != null) {
                    out.put(p.species(), t);
                }
            }
        }
        return out;
    }

    /** One entry per molecule the engine gave the mapper: species in document order, merged, copies repeated. */
    private static List<String> molecules(List<Participant> side) {
        Map<String, Integer> merged = new LinkedHashMap<>();
        for (Participant p : side) {
            int n = 1;
            try {
                Rational c = p.stoichiometryText() == null ? Rational.ONE : Rational.parse(p.stoichiometryText());
                n = c.isInteger() && c.signum() > 0 && c.numerator().bitLength() < 16 ? c.numerator().intValue() : 1;
            } catch (NumberFormatException | ArithmeticException e) {
                n = 1;
            }
            merged.merge(p.species(), n, Integer::sum);
        }
        List<String> out = new ArrayList<>();
        merged.forEach((species, n) -> {
            for (int k = 0; k < n; k++) {
                out.add(species);
            }
        });
        return out;
    }

    private static String otherMaps(int n) {
        return n + (n == 1 ? " other co-optimal carbon map exists" : " other co-optimal carbon maps exist")
                + "; the drawing shows one.";
    }

    static String summary(ReactionMapping m) {
        String reason = m.reason().isEmpty() || m.reason().endsWith(".") ? m.reason() : m.reason() + ".";
        int carbons = m.carbons().size();
        return switch (m.status()) {
            case MAPPED -> "Mapped: " + Wording.count(carbons, "carbon") + ", " + Wording.count(m.cost(), "weighted bond edit") + ", proven minimum.";
            case AMBIGUOUS -> "Ambiguous: " + Wording.count(carbons, "carbon") + ", " + Wording.count(m.cost(), "weighted bond edit")
                    + ", proven minimum, but co-optimal maps move some carbons elsewhere.";
            case BEST_FOUND -> "Best found: " + Wording.count(carbons, "carbon") + ", " + Wording.count(m.cost(), "weighted bond edit") + ", lower bound "
                    + m.lowerBound() + " (not proven optimal): " + reason;
            case UNMAPPABLE -> "Not mappable: " + reason;
            case NO_STRUCTURE -> "No structure: " + reason;
            case SKIPPED -> "Not attempted: " + reason;
        };
    }

    static String summary(MappingResult r) {
        int carbons = r.carbonTransitions().size();
        String reason = r.reason().isEmpty() || r.reason().endsWith(".") ? r.reason() : r.reason() + ".";
        return switch (r.status()) {
            case MAPPED -> "Mapped: " + Wording.count(carbons, "carbon") + ", " + Wording.count(r.cost(), "weighted bond edit") + ", proven minimum.";
            case AMBIGUOUS -> "Ambiguous: " + Wording.count(carbons, "carbon") + ", " + Wording.count(r.cost(), "weighted bond edit")
                    + ", proven minimum, but co-optimal maps move some carbons elsewhere.";
            case BEST_FOUND -> "Best found: " + Wording.count(carbons, "carbon") + ", " + Wording.count(r.cost(), "weighted bond edit") + ", lower bound "
                    + r.lowerBound() + " (not proven optimal): " + reason;
            case UNMAPPABLE -> "Not mappable: " + reason;
            case TOO_LARGE -> "Not attempted: " + reason;
        };
    }
}
