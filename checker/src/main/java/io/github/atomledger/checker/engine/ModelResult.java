package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.model.ModelView;

import java.util.List;
import java.util.Objects;
import java.util.stream.Stream;

/**
 * One model's results.
 *
 * @param model         the model as read
 * @param reactions     one result per reaction, in document order
 * @param modelFindings findings about species or the model itself (not a reaction), sorted
 * @param mapping       atom maps and structures ({@link MappingData#NONE} when mapping was off)
 */
public record ModelResult(ModelView model, List<ReactionResult> reactions, List<Finding> modelFindings,
                          MappingData mapping) {

    public ModelResult {
        Objects.requireNonNull(model, "model");
        reactions = List.copyOf(reactions);
        modelFindings = modelFindings.stream().sorted(Finding.ORDER).toList();
    }

    public String file() {
        return model.file();
    }

    /** Every finding of this model, in {@link Finding#ORDER}. */
    public List<Finding> allFindings() {
        return Stream.concat(modelFindings.stream(), reactions.stream().flatMap(r -> r.findings().stream()))
                .sorted(Finding.ORDER).toList();
    }
}
