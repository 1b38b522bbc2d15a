package io.github.atomledger.checker.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * A read-only view of one SBML model: the parts every check reads, in document order.
 *
 * <p>Built by {@link ModelLoader}; checks never see JSBML objects, so they cannot change the
 * document by accident. Immutable and thread-safe.
 *
 * @see ModelLoader
 */
public final class ModelView {

    private final String file;
    private final String modelId;
    private final int level;
    private final int version;
    private final int fbcVersion;
    private final List<CompartmentInfo> compartments;
    private final List<SpeciesInfo> species;
    private final List<ReactionInfo> reactions;
    private final Map<String, SpeciesInfo> speciesById;
    private final Map<String, CompartmentInfo> compartmentById;
    private final List<String> duplicateIds;

    public ModelView(String file, String modelId, int level, int version, int fbcVersion,
                     List<CompartmentInfo> compartments, List<SpeciesInfo> species,
                     List<ReactionInfo> reactions, List<String> duplicateIds) {
        this.file = Objects.requireNonNull(file, "file");
        this.modelId = modelId == null ? "" : modelId;
        this.level = level;
        this.version = version;
        this.fbcVersion = fbcVersion;
        this.compartments = List.copyOf(compartments);
        this.species = List.copyOf(species);
        this.reactions = List.copyOf(reactions);
        this.duplicateIds = List.copyOf(duplicateIds);
        Map<String, SpeciesInfo> s = new LinkedHashMap<>();
        for (SpeciesInfo sp : this.species) {
            s.putIfAbsent(sp.id(), sp);
        }
        this.speciesById = Collections.unmodifiableMap(s);
        Map<String, CompartmentInfo> c = new LinkedHashMap<>();
        for (CompartmentInfo ci : this.compartments) {
            c.putIfAbsent(ci.id(), ci);
        }
        this.compartmentById = Collections.unmodifiableMap(c);
    }

    /** The model file as given to the run, relative to the project base directory, with '/' separators. */
    public String file() {
        return file;
    }

    /** The model id, or "" when it has none. */
    public String modelId() {
        return modelId;
    }

    public int level() {
        return level;
    }

    public int version() {
        return version;
    }

    /** The fbc package version declared by the document (1, 2 or 3), or 0 when fbc is not used. */
    public int fbcVersion() {
        return fbcVersion;
    }

    public List<CompartmentInfo> compartments() {
        return compartments;
    }

    public List<SpeciesInfo> species() {
        return species;
    }

    public List<ReactionInfo> reactions() {
        return reactions;
    }

    /** Ids used by more than one element of the model, sorted; an SBML validity error. */
    public List<String> duplicateIds() {
        return duplicateIds;
    }

    /** The species with this id; the first one when the id is duplicated. */
    public Optional<SpeciesInfo> species(String id) {
        return Optional.ofNullable(speciesById.get(id));
    }

    public Optional<CompartmentInfo> compartment(String id) {
        return Optional.ofNullable(compartmentById.get(id));
    }
}
