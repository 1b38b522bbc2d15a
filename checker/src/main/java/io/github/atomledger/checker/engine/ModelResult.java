package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.trace.TraceResults;

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
 * @param traces        pathway traces, declared-fate outcomes and label reach ({@link TraceResults#NONE}
 *                      when nothing was traced); their findings are among {@code modelFindings}
 */
public record ModelResult(ModelView model, List<ReactionResult> reactions, List<Finding> modelFindings,
                          MappingData mapping, TraceResults traces) {

    /** A result without traces. */
    public ModelResult(ModelView model, List<ReactionResult> reactions, List<Finding> modelFindings, MappingData mapping) {
        this(model, reactions, modelFindings, mapping, TraceResults.NONE);
    }

    public ModelResult {
        Objects.requireNonNull(model, "model");
        traces = traces == null ? TraceResults.NONE : traces;
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
