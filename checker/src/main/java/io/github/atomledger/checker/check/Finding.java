package io.github.atomledger.checker.check;

import java.util.Collections;
import java.util.Comparator;
import java.util.Map;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * One problem (or note) found in a model. Immutable.
 *
 * <p>{@code ruleId} and the keys and values of {@code data} are the machine interface and stay
 * stable; {@code message} is for people and may change. Numbers in {@code data} are exact
 * canonical strings ({@code "-1"}, {@code "3/2"}), never doubles.
 *
 * @param ruleId    the rule that produced it, {@code <area>.<kebab-name>}
 * @param severity  the effective severity after configuration
 * @param modelFile the file the finding points at, relative to the project base directory, '/'
 *                  separated: the model file, or the structure table for a problem in one of its
 *                  rows ({@code structure.invalid}, {@code structure.unknown-species})
 * @param elementId the SBML id of the species or reaction, or the model id for model-level findings
 * @param line      1-based line of the element in the file, 0 when unknown
 * @param message   one sentence, no line breaks
 * @param data      structured details, copied into an unmodifiable sorted map
 */
public record Finding(String ruleId, Severity severity, String modelFile, String elementId, int line,
                      String message, SortedMap<String, String> data) implements Comparable<Finding> {

    /** File, line, element id, rule id, message: the one order every report uses. */
    public static final Comparator<Finding> ORDER = Comparator.comparing(Finding::modelFile)
            .thenComparingInt(Finding::line)
            .thenComparing(Finding::elementId)
            .thenComparing(Finding::ruleId)
            .thenComparing(Finding::message);

    public Finding {
        Objects.requireNonNull(ruleId, "ruleId");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(modelFile, "modelFile");
        Objects.requireNonNull(message, "message");
        elementId = elementId == null ? "" : elementId;
        if (line < 0) {
            throw new IllegalArgumentException("line must be >= 0, was " + line);
        }
        if (message.indexOf('\n') >= 0 || message.indexOf('\r') >= 0) {
            throw new IllegalArgumentException("a finding message is one line: " + message);
        }
        data = Collections.unmodifiableSortedMap(new TreeMap<>(data == null ? Map.of() : data));
    }

    /** The same finding with another severity (the engine applies configuration this way). */
    public Finding withSeverity(Severity newSeverity) {
        return newSeverity == severity ? this
                : new Finding(ruleId, newSeverity, modelFile, elementId, line, message, data);
    }

    @Override
    public int compareTo(Finding o) {
        return ORDER.compare(this, o);
    }
}
