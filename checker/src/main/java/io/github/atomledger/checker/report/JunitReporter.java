package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.GateMarks;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunResult;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import javax.xml.stream.XMLStreamException;

/**
 * Writes {@code junit/TEST-atomledger.xml} in the JUnit XML form CI test views read: one
 * {@code <testsuite>} per model, one {@code <testcase>} per reaction and check family
 * (classname {@code <model>.<family>}, name the reaction id), and one per species or model with
 * model-level findings. A case fails when it has findings at or above the fail threshold
 * ({@code error} when the run never fails) that the release gate lets fail (not accepted in the
 * baseline, within the fail scope); each failure carries the messages. Lower findings go
 * to the case's {@code <system-out>}. Balance cases of reactions whose class is not balance-checked
 * (exchange, demand, sink) are {@code <skipped>} unless they have a failing finding. Times are always 0 so the file is byte-stable.
 */
public final class JunitReporter implements Reporter {

    /** The file written inside {@link ReportFormat#JUNIT}'s directory. */
    public static final String FILE_NAME = "TEST-atomledger.xml";

    @Override
    public ReportFormat format() {
        return ReportFormat.JUNIT;
    }

    @Override
    public Path write(RunResult result, Path directory) throws IOException {
        Path file = directory.resolve(ReportFormat.JUNIT.fileName()).resolve(FILE_NAME);
        ReportFiles.write(file, toXml(result));
        return file;
    }

    /** The document, exactly the bytes {@link #write} puts in the file. */
    public String toXml(RunResult result) {
        try {
            Severity threshold = Families.threshold(result);
            List<Suite> suites = new ArrayList<>();
            for (ModelResult m : result.models()) {
                suites.add(suite(m, threshold, result.gate()));
            }
            XmlOut x = new XmlOut().declaration();
            x.start("testsuites").attr("name", "AtomLedger")
                    .attr("tests", suites.stream().mapToLong(s -> s.cases.size()).sum())
                    .attr("failures", suites.stream().mapToLong(Suite::failures).sum())
                    .attr("errors", 0)
                    .attr("skipped", suites.stream().mapToLong(Suite::skipped).sum())
                    .attr("time", "0");
            for (Suite s : suites) {
                writeSuite(x, s);
            }
            x.nl().end();
            return x.finish();
        } catch (XMLStreamException e) {
            throw new IllegalStateException("cannot write JUnit XML", e);
        }
    }

    private record Case(String classname, String name, List<Finding> failing, List<Finding> other, String skipped) {
    }

    private record Suite(ModelResult model, List<Case> cases) {
        long failures() {
            return cases.stream().filter(c -> !c.failing.isEmpty()).count();
        }

        long skipped() {
            return cases.stream().filter(c -> c.skipped != null && c.failing.isEmpty()).count();
        }
    }

    private static Suite suite(ModelResult m, Severity threshold, GateMarks gate) {
        String stem = stem(m.file());
        List<String> families = Families.inRun(m.allFindings());
        List<Case> cases = new ArrayList<>();
        for (ReactionResult r : m.reactions()) {
            for (String family : families) {
                List<Finding> mine = r.findings().stream().filter(f -> Families.of(f.ruleId()).equals(family)).toList();
                String skipped = null;
                if (family.equals("balance") && !r.reactionClass().balanceComputed()
                        && mine.stream().noneMatch(f -> f.severity().atLeast(threshold) && gate.mayFail(f))) {
                    skipped = r.reactionClass().label() + " reaction: balance is not checked for this class";
                }
                cases.add(newCase(stem + "." + family, r.id(), mine, threshold, gate, skipped));
            }
        }
        Map<String, Map<String, List<Finding>>> byElement = new TreeMap<>();
        for (Finding f : m.modelFindings()) {
            byElement.computeIfAbsent(f.elementId().isEmpty() ? m.model().modelId() : f.elementId(), k -> new TreeMap<>())
                    .computeIfAbsent(Families.of(f.ruleId()), k -> new ArrayList<>()).add(f);
        }
        byElement.forEach((element, perFamily) -> perFamily.forEach((family, list) ->
                cases.add(newCase(stem + "." + family, element, list, threshold, gate, null))));
        return new Suite(m, cases);
    }

    private static Case newCase(String classname, String name, List<Finding> findings, Severity threshold,
                                GateMarks gate, String skipped) {
        List<Finding> failing = findings.stream().filter(f -> f.severity().atLeast(threshold) && gate.mayFail(f))
                .toList();
        List<Finding> other = findings.stream().filter(f -> !failing.contains(f)).toList();
        return new Case(classname, name, failing, other, skipped);
    }

    private static void writeSuite(XmlOut x, Suite s) throws XMLStreamException {
        x.indent(1).start("testsuite").attr("name", s.model.file())
                .attr("tests", s.cases.size())
                .attr("failures", s.failures())
                .attr("errors", 0)
                .attr("skipped", s.skipped())
                .attr("time", "0");
        x.indent(2).start("properties");
        property(x, "modelFile", s.model.file());
        property(x, "modelId", s.model.model().modelId());
        property(x, "sbml", "level " + s.model.model().level() + " version " + s.model.model().version());
        ModelCounts counts = ModelCounts.of(s.model);
        property(x, "balanceChecked", Integer.toString(counts.checked()));
        property(x, "elementImbalanced", Integer.toString(counts.elements().imbalanced()));
        property(x, "elementsNotComputable", Integer.toString(counts.elements().notComputable()));
        property(x, "chargeImbalanced", Integer.toString(counts.charge().imbalanced()));
        property(x, "chargeNotComputable", Integer.toString(counts.charge().notComputable()));
        x.indent(2).end();
        for (Case c : s.cases) {
            x.indent(2).start("testcase").attr("name", c.name).attr("classname", c.classname).attr("time", "0");
            if (!c.failing.isEmpty()) {
                Finding first = c.failing.get(0);
                x.indent(3).start("failure").attr("message", first.message()).attr("type", first.ruleId())
                        .text(lines(c.failing)).end();
            } else if (c.skipped != null) {
                x.indent(3).start("skipped").attr("message", c.skipped).end();
            }
            if (!c.other.isEmpty()) {
                x.indent(3).start("system-out").text(lines(c.other)).end();
            }
            if (!c.failing.isEmpty() || c.skipped != null || !c.other.isEmpty()) {
                x.indent(2);
            }
            x.end();
        }
        x.indent(1).end();
    }

    private static void property(XmlOut x, String name, String value) throws XMLStreamException {
        x.indent(3).start("property").attr("name", name).attr("value", value).end();
    }

    /** "error balance.charge models/m.xml:120 R_PFK: message", one line each. */
    private static String lines(List<Finding> findings) {
        StringBuilder sb = new StringBuilder();
        for (Finding f : findings) {
            sb.append('\n').append(f.severity().label()).append(' ').append(f.ruleId()).append(' ')
                    .append(f.modelFile()).append(f.line() > 0 ? ":" + f.line() : "").append(' ')
                    .append(f.elementId()).append(": ").append(f.message());
        }
        return sb.append('\n').toString();
    }

    /** The file name without directories and .xml/.xml.gz, dots replaced so CI tools do not split it. */
    static String stem(String file) {
        String name = file.substring(file.lastIndexOf('/') + 1);
        for (String ext : new String[] {".xml.gz", ".sbml.gz", ".xml", ".sbml", ".gz"}) {
            if (name.endsWith(ext)) {
                name = name.substring(0, name.length() - ext.length());
                break;
            }
        }
        return name.replace('.', '_');
    }
}
