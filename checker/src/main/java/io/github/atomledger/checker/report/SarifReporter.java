package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.Version;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.StandardChecks;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunResult;


import java.io.IOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Writes {@code report.sarif}, a SARIF 2.1.0 log (OASIS Static Analysis Results Interchange Format
 * Version 2.1.0) with one run: {@code tool.driver.rules} lists every standard rule (sorted by id,
 * with its description and default level) and each finding becomes one result with its
 * {@code ruleId}, {@code level} ({@code error}, {@code warning}, {@code note}), message and the
 * model file as a relative URI against {@code %SRCROOT%} (the project base directory); the
 * region's {@code startLine} is left out when the line is unknown. The finding's element id is
 * the result's logical location and its data go to the result's property bag. No absolute paths,
 * no timestamps.
 */
public final class SarifReporter implements Reporter {

    public static final String SCHEMA_URI = "https://json.schemastore.org/sarif-2.1.0.json";
    static final String BASE_ID = "%SRCROOT%";

    @Override
    public ReportFormat format() {
        return ReportFormat.SARIF;
    }

    @Override
    public Path write(RunResult result, Path directory) throws IOException {
        Path file = directory.resolve(ReportFormat.SARIF.fileName());
        ReportFiles.write(file, JsonText.utf8(tree(result)));
        return file;
    }

    /** The log, exactly the bytes {@link #write} puts in the file. */
    public String toSarif(RunResult result) throws IOException {
        return JsonText.of(tree(result));
    }

    static Map<String, Object> tree(RunResult result) {
        List<Finding> findings = result.allFindings();
        Map<String, Map<String, Object>> rules = rules(findings);
        List<String> ruleIds = new ArrayList<>(rules.keySet());

        Map<String, Object> driver = new LinkedHashMap<>();
        driver.put("name", "AtomLedger");
        driver.put("version", Version.get());
        driver.put("semanticVersion", Version.get().replace("-SNAPSHOT", ""));
        driver.put("rules", new ArrayList<>(rules.values()));

        Map<String, Object> base = new LinkedHashMap<>();
        base.put("description", Map.of("text", "The project base directory; model files are relative to it."));

        List<Object> results = new ArrayList<>();
        for (Finding f : findings) {
            results.add(result(f, ruleIds.indexOf(f.ruleId())));
        }

        Map<String, Object> run = new LinkedHashMap<>();
        run.put("tool", Map.of("driver", driver));
        run.put("originalUriBaseIds", Map.of(BASE_ID, base));
        run.put("columnKind", "unicodeCodePoints");
        run.put("results", results);
        List<Object> models = new ArrayList<>();
        for (ModelResult m : result.models()) {
            models.add(obj("file", m.file(), "balance", ModelCounts.of(m).json()));
        }
        run.put("properties", Map.of("models", models));

        Map<String, Object> root = new LinkedHashMap<>();
        root.put("$schema", SCHEMA_URI);
        root.put("version", "2.1.0");
        root.put("runs", List.of(run));
        return root;
    }

    private static Map<String, Map<String, Object>> rules(List<Finding> findings) {
        Map<String, Map<String, Object>> rules = new TreeMap<>();
        for (ModelCheck c : StandardChecks.all()) {
            rules.put(c.ruleId(), rule(c.ruleId(), c.description(), c.defaultSeverity()));
        }
        for (Finding f : findings) {
            rules.computeIfAbsent(f.ruleId(), id -> rule(id, io.github.atomledger.checker.trace.FateCheck.DESCRIPTIONS
                    .getOrDefault(id, "AtomLedger rule " + id + "."), f.severity()));
        }
        return rules;
    }

    private static Map<String, Object> rule(String id, String description, Severity defaultSeverity) {
        Map<String, Object> r = new LinkedHashMap<>();
        r.put("id", id);
        r.put("shortDescription", Map.of("text", description));
        r.put("defaultConfiguration", Map.of("level", level(defaultSeverity)));
        r.put("properties", Map.of("family", Families.title(Families.of(id))));
        return r;
    }

    private static Map<String, Object> result(Finding f, int ruleIndex) {
        Map<String, Object> artifact = new LinkedHashMap<>();
        artifact.put("uri", uri(f.modelFile()));
        artifact.put("uriBaseId", BASE_ID);
        Map<String, Object> physical = new LinkedHashMap<>();
        physical.put("artifactLocation", artifact);
        if (f.line() > 0) {
            physical.put("region", Map.of("startLine", f.line()));
        }
        Map<String, Object> location = new LinkedHashMap<>();
        location.put("physicalLocation", physical);
        if (!f.elementId().isEmpty()) {
            location.put("logicalLocations", List.of(obj("name", f.elementId(), "kind", "element")));
        }
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("ruleId", f.ruleId());
        o.put("ruleIndex", ruleIndex);
        o.put("level", level(f.severity()));
        o.put("message", Map.of("text", f.message()));
        o.put("locations", List.of(location));
        if (!f.data().isEmpty()) {
            o.put("properties", new TreeMap<>(f.data()));
        }
        return o;
    }

    /** An object with keys in the order given (Map.of has no stable iteration order across JVM runs). */
    static Map<String, Object> obj(Object... keysAndValues) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i < keysAndValues.length; i += 2) {
            m.put((String) keysAndValues[i], keysAndValues[i + 1]);
        }
        return m;
    }

    /** SARIF 2.1.0 §3.27.10: error, warning, note. */
    static String level(Severity s) {
        return switch (s) {
            case ERROR -> "error";
            case WARNING -> "warning";
            case INFO -> "note";
        };
    }

    /** A relative URI reference for a '/' separated relative path (spaces and the like percent-encoded). */
    static String uri(String relativePath) {
        try {
            return new URI(null, null, relativePath, null).toASCIIString();
        } catch (URISyntaxException e) {
            throw new IllegalArgumentException("model file path cannot be a URI: " + relativePath, e);
        }
    }
}
