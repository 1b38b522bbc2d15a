package io.github.atomledger.checker.trace;

import java.util.List;
import java.util.Objects;

/**
 * A pathway whose source carbons are followed: a name, the source species and the steps in order.
 *
 * @param name   the pathway's name, unique in its file
 * @param source the species whose carbons are followed
 * @param steps  the reactions in order, at least one
 * @param model  the model file it belongs to (as reports show it, {@code models/x.xml}), or "" for
 *               every model that has the source species
 * @param file   the file it was read from, as reports show it
 * @param line   its 1-based line there
 */
public record Pathway(String name, String source, List<Step> steps, String model, String file, int line) {

    public Pathway {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(source, "source");
        steps = List.copyOf(steps);
        model = model == null ? "" : model;
        file = file == null ? "" : file;
    }

    /** True when the pathway is meant for this model file and the model has the source species. */
    public boolean appliesTo(String modelFile, boolean hasSource) {
        return model.isEmpty() ? hasSource : model.equals(modelFile);
    }

    /** Where it is written, {@code models/pathways.tsv:3}. */
    public String where() {
        return file + ":" + line;
    }
}
