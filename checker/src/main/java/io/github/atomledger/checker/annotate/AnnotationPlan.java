package io.github.atomledger.checker.annotate;

import io.github.atomledger.checker.transitions.StoredStructure;
import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.atommapper.mapping.AtomMapper;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Which annotations a model should carry after a run: one inferred {@link TransitionAnnotation}
 * for every reaction whose map is proven optimal and unique up to symmetry ({@code mapped}).
 * Ambiguous and best-found maps are not written: choosing among equal answers is a curator's call,
 * and a map written into a model is taken as fact by tracer software downstream.
 */
public final class AnnotationPlan {

    private AnnotationPlan() {
    }

    public static Map<String, TransitionAnnotation> of(ModelResult model) {
        Map<String, TransitionAnnotation> out = new LinkedHashMap<>();
        SpeciesStructures structures = model.mapping().structures();
        for (ReactionResult r : model.reactions()) {
            ReactionMapping m = r.mapping();
            if (m == null || m.status() != MapStatus.MAPPED) {
                continue;
            }
            List<StoredStructure> used = new ArrayList<>();
            m.fingerprints().forEach((species, fp) -> {
                String smiles = structures.get(species)
                        .filter(s -> s.structure().source().equals(s.text()) && !s.text().startsWith("InChI="))
                        .map(SpeciesStructures.Resolved::text).orElse("");
                used.add(new StoredStructure(species, fp, smiles));
            });
            out.put(r.id(), new TransitionAnnotation(TransitionAnnotation.INFERRED, m.status().label(), m.cost(),
                    AtomMapper.VERSION, m.carbons(), m.mappedSmiles(), used));
        }
        return out;
    }
}
