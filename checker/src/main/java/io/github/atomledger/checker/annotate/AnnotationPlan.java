package io.github.atomledger.checker.annotate;

import io.github.atomledger.checker.transitions.StoredStructure;
import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.atommapper.mapping.AtomMapper;
import io.github.atomledger.checker.check.mapping.CuratedVerdict;
import io.github.atomledger.checker.check.mapping.ImportedMap;
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
 * and a map written into a model is taken as fact by tracer software downstream. Curated maps read
 * from RXN files ({@code atomledger.curatedMaps}) that are valid carbon maps of the reaction are
 * planned as curated annotations ({@code origin="curated"}), in place of any inferred one; whether
 * they replace a curated annotation already in the model is the annotator's {@code overwriteCurated}.
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
        for (ReactionResult r : model.reactions()) {
            ImportedMap file = model.mapping().imported().get(r.id());
            CuratedVerdict verdict = model.mapping().curated().get(r.id());
            if (file == null || !file.read() || verdict == null || !verdict.valid()) {
                continue;
            }
            List<StoredStructure> used = new ArrayList<>();
            new java.util.TreeSet<>(r.reaction().participants().stream().map(p -> p.species()).toList()).forEach(species ->
                    structures.get(species).ifPresent(s -> used.add(new StoredStructure(species, s.structure().fingerprint(),
                            s.structure().source().equals(s.text()) && !s.text().startsWith("InChI=") ? s.text() : ""))));
            out.put(r.id(), new TransitionAnnotation(TransitionAnnotation.CURATED, "", -1, "", file.carbons(), "", used));
        }
        return out;
    }
}
