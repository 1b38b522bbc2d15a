package io.github.atomledger.checker.report;

import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.trace.LabelReach;
import io.github.atomledger.checker.trace.Step;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes {@code reachability.json} (with the JSON format, when label sources are configured and
 * found): per source atom, every (species, position) label can reach through the model's maps, with
 * one shortest chain of reactions each ({@code docs/traces-schema.json}). Byte-stable; a run
 * without label sources removes an earlier run's file.
 */
final class ReachReporter implements Reporter {

    static final String FILE = "reachability.json";

    @Override
    public ReportFormat format() {
        return ReportFormat.JSON;
    }

    /** Writes the file; returns null (and removes an old file) when there is nothing to write. */
    @Override
    public Path write(RunResult result, Path directory) throws IOException {
        if (result.models().stream().allMatch(m -> m.traces().reach().isEmpty())) {
            return ReportFiles.writeJsonOrRemove(directory.resolve(FILE), null);
        }
        List<Object> sources = new ArrayList<>();
        for (ModelResult m : result.models()) {
            SpeciesStructures s = m.mapping().structures();
            for (LabelReach r : m.traces().reach()) {
                Map<String, Object> o = new LinkedHashMap<>();
                o.put("model", m.file());
                o.put("species", r.source().species());
                o.put("atom", r.source().atom());
                o.put("label", s.label(r.source().species(), r.source().atom()));
                List<Object> reached = new ArrayList<>();
                for (LabelReach.Reached x : r.reached()) {
                    Map<String, Object> p = new LinkedHashMap<>();
                    p.put("species", x.position().species());
                    p.put("atom", x.position().atom());
                    p.put("label", s.label(x.position().species(), x.position().atom()));
                    p.put("steps", x.chain().size());
                    p.put("chain", x.chain().stream().map(Step::text).toList());
                    reached.add(p);
                }
                o.put("reached", reached);
                sources.add(o);
            }
        }
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("sources", sources);
        return ReportFiles.writeJsonOrRemove(directory.resolve(FILE), root);
    }
}
