package io.github.atomledger.checker.trace;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import io.github.atomledger.checker.check.mapping.CuratedVerdict;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.model.FormulaSource;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;
import io.github.atomledger.checker.transitions.TransitionAnnotation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * A hand-made model with hand-made maps, for the tracing rules without the mapper: species with
 * SMILES, reactions "a + 2 b -> c", and per reaction a status and carbon maps written as
 * "a:1>c:2 a:2>c:1" (atom indices; copies as "b#2:1"). Invented chemistry, for the rules only.
 */
final class Synthetic {

    private final Map<String, String> smiles = new LinkedHashMap<>();
    private final List<ReactionInfo> reactions = new ArrayList<>();
    private final Map<String, ReactionMapping> mappings = new LinkedHashMap<>();
    private final Map<String, TransitionAnnotation> stored = new LinkedHashMap<>();
    private final Map<String, CuratedVerdict> curated = new LinkedHashMap<>();

    Synthetic species(String id, String smi) {
        smiles.put(id, smi);
        return this;
    }

    /** A reaction "a + 2 b -> c" ("<=>" for reversible) with the given status and maps (first = optimum). */
    Synthetic reaction(String id, String equation, MapStatus status, String... maps) {
        boolean reversible = equation.contains("<=>");
        String[] sides = equation.split(reversible ? "<=>" : "->");
        reactions.add(new ReactionInfo(id, id, reversible, "", side(sides[0]), side(sides[1]), List.of(), reactions.size() + 10));
        List<List<AtomTransition>> parsed = new ArrayList<>();
        for (String m : maps) {
            parsed.add(carbons(m));
        }
        mappings.put(id, new ReactionMapping(id, status, parsed.isEmpty() ? List.of() : parsed.get(0),
                parsed.size() > 1 ? parsed.subList(1, parsed.size()) : List.of(), parsed.isEmpty() ? -1 : 2,
                parsed.isEmpty() ? -1 : 1, "", List.of(), status == MapStatus.UNMAPPABLE ? "heavy atoms differ" : "",
                new TreeMap<>(), List.of(), new TreeMap<>()));
        return this;
    }

    /** A curated map stored for a reaction; {@code valid} is the verdict's. */
    Synthetic curated(String id, String map, boolean valid) {
        stored.put(id, new TransitionAnnotation(TransitionAnnotation.CURATED, "", -1, "", carbons(map), "", List.of()));
        curated.put(id, new CuratedVerdict(id, valid ? List.of() : List.of("x is not a carbon"), valid, 0, List.of()));
        return this;
    }

    private static List<Participant> side(String text) {
        List<Participant> out = new ArrayList<>();
        for (String part : text.split("\\+")) {
            String[] p = part.strip().split("\\s+");
            out.add(p.length == 2 ? new Participant(p[1], p[0], 0) : new Participant(p[0], "1", 0));
        }
        return out;
    }

    private static List<AtomTransition> carbons(String text) {
        List<AtomTransition> out = new ArrayList<>();
        for (String pair : text.strip().split("\\s+")) {
            String[] ab = pair.split(">");
            out.add(new AtomTransition(ref(ab[0]), ref(ab[1]), "C"));
        }
        return out;
    }

    private static AtomRef ref(String text) {
        String[] sa = text.split(":");
        String species = sa[0];
        int copy = 1;
        if (species.contains("#")) {
            copy = Integer.parseInt(species.substring(species.indexOf('#') + 1));
            species = species.substring(0, species.indexOf('#'));
        }
        return new AtomRef(species, copy, Integer.parseInt(sa[1]));
    }

    ModelView model() {
        List<SpeciesInfo> species = new ArrayList<>();
        int line = 2;
        for (String id : smiles.keySet()) {
            species.add(new SpeciesInfo(id, id, "c", false, "", null, FormulaSource.NONE, null, FormulaSource.NONE, List.of(), line++));
        }
        return new ModelView("models/synthetic.xml", "synthetic", 3, 1, 0, List.of(), species, reactions, List.of());
    }

    MappingData data() {
        Map<String, SpeciesStructures.Resolved> resolved = new LinkedHashMap<>();
        smiles.forEach((id, s) -> {
            try {
                resolved.put(id, new SpeciesStructures.Resolved(id, Structure.fromSmiles(s), SpeciesStructures.Source.TABLE, s));
            } catch (StructureException e) {
                throw new IllegalArgumentException(e);
            }
        });
        return new MappingData(true, mappings, curated, stored, new SpeciesStructures(resolved, List.of()));
    }

    PathwayTrace trace(String source, String steps) {
        List<Step> list = new ArrayList<>();
        for (String s : steps.split("\\s+")) {
            list.add(Step.parse(s));
        }
        return new Tracer(model(), data()).trace(new Pathway("p", source, list, "", "models/pathways.tsv", 2));
    }
}
