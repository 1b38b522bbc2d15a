package io.github.atomledger.checker.trace;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.model.ModelView;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Traces one model: every pathway meant for it (see {@link Pathway#appliesTo}), the declared fates
 * of those pathways, and the label reach of every configured source atom the model has. A walk
 * over the maps already computed; it maps nothing.
 *
 * <pre>{@code
 * TraceResults r = Traces.run(modelResult.model(), modelResult.mapping(), TraceInputs.load(config, base));
 * }</pre>
 */
public final class Traces {

    private Traces() {
    }

    /**
     * @throws AtomLedgerException when a label source names a position its species does not have
     *     or that is not a carbon
     */
    public static TraceResults run(ModelView model, MappingData data, TraceInputs inputs) {
        if (inputs.isEmpty() || !data.enabled()) {
            return TraceResults.NONE;
        }
        Tracer tracer = new Tracer(model, data);
        Map<String, PathwayTrace> traced = new LinkedHashMap<>();
        for (Pathway p : inputs.pathways()) {
            if (p.appliesTo(model.file(), model.species(p.source()).isPresent())) {
                traced.put(p.name(), tracer.trace(p));
            }
        }
        List<PathwayTrace> traces = List.copyOf(traced.values());
        List<FateOutcome> outcomes = FateCheck.outcomes(model, traced, inputs.fates(), tracer.atoms());
        List<LabelReach> reach = new ArrayList<>();
        Reachability network = null;
        for (String spec : inputs.tracers()) {
            int colon = spec.indexOf(':');
            String species = colon < 0 ? spec : spec.substring(0, colon).strip();
            if (model.species(species).isEmpty()) {
                continue;
            }
            List<Integer> atoms = sourceAtoms(tracer.atoms(), model.file(), spec, species,
                    colon < 0 ? "" : spec.substring(colon + 1).strip());
            if (network == null) {
                network = new Reachability(model, data);
            }
            for (int a : atoms) {
                reach.add(network.from(new Position(species, a)));
            }
        }
        return new TraceResults(traces, outcomes, reach, FateCheck.findings(model, traces, outcomes));
    }

    private static List<Integer> sourceAtoms(Atoms atoms, String file, String spec, String species, String position) {
        List<Integer> carbons = atoms.carbons(species);
        if (carbons.isEmpty()) {
            throw new AtomLedgerException("tracers: " + spec + ": " + species + " has no structure with carbons in " + file);
        }
        if (position.isEmpty()) {
            return carbons;
        }
        int atom = atoms.structures().get(species).orElseThrow().structure().atomNamed(position);
        if (atom == 0 || !carbons.contains(atom)) {
            throw new AtomLedgerException("tracers: " + spec + ": " + species + " has no carbon named " + position
                    + " in " + file + " (carbons: " + String.join(", ",
                    carbons.stream().map(a -> atoms.structures().label(species, a)).toList()) + ")");
        }
        return List.of(atom);
    }
}
