package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.mapping.MapConfidence;
import io.github.atomledger.atommapper.mapping.Rearrangement;
import io.github.atomledger.atommapper.mapping.WeightCheck;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.transitions.CarbonMapText;

import java.util.ArrayList;
import java.util.List;
import javax.xml.stream.XMLStreamException;

/**
 * How sure the map is, under the drawing of a reaction card: the margin to the runner-up, the
 * rearrangement patterns, the alternative weightings, and the runner-up's carbon transitions in
 * the annotation's text form with the reports' atom labels. Open when the reaction has a {@code mapping.review} finding.
 */
final class HtmlConfidence {

    private HtmlConfidence() {
    }

    static void write(XmlOut x, ReactionMapping m, List<Finding> findings, SpeciesStructures structures)
            throws XMLStreamException {
        if (m == null || !m.confidence().computed()) {
            return;
        }
        MapConfidence c = m.confidence();
        x.start("details", "confidence");
        if (findings.stream().anyMatch(f -> f.ruleId().equals("mapping.review"))) {
            x.attr("open", "open");
        }
        String margin = !c.hasMargin() ? "no other carbon fate is possible"
                : "margin " + (c.marginProven() ? "" : "at least ")
                + io.github.atomledger.checker.Wording.count(c.margin(), "weighted bond edit") + " to the runner-up";
        x.leaf("summary", null, "confidence: " + margin);
        List<String> lines = new ArrayList<>();
        for (Rearrangement r : c.rearrangements()) {
            lines.add("Optimum: " + r.description() + ".");
        }
        List<String> weights = new ArrayList<>();
        for (WeightCheck w : c.weights()) {
            weights.add("C\u2013C weight " + w.carbonCarbonWeight() + ": " + w.outcome().label());
        }
        if (!weights.isEmpty()) {
            lines.add("Alternative weightings: " + String.join(", ", weights) + ".");
        }
        for (String line : lines) {
            x.leaf("p", "nomap", line).nl();
        }
        if (!c.runnerUp().isEmpty()) {
            x.leaf("p", "nomap", "Runner-up (" + c.runnerUpCost() + " weighted bond edits), carbon transitions:").nl();
            x.leaf("pre", null, String.join("\n", CarbonMapText.format(c.runnerUp(), structures::label))).nl();
            for (Rearrangement r : c.runnerUpRearrangements()) {
                x.leaf("p", "nomap", "Runner-up: " + r.description() + ".").nl();
            }
        }
        x.end().nl();
    }
}
