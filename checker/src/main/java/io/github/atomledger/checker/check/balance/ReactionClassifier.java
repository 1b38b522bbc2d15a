package io.github.atomledger.checker.check.balance;

import io.github.atomledger.checker.model.CompartmentInfo;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Decides a reaction's {@link ReactionClass}, from its SBO term when the term is specific and
 * from its participants otherwise; both are kept so that disagreements can be reported.
 *
 * <p>SBO terms (Systems Biology Ontology, https://www.ebi.ac.uk/sbo): SBO:0000627 exchange,
 * SBO:0000628 demand, SBO:0000632 sink, SBO:0000631 pseudoreaction, SBO:0000629 biomass
 * production, SBO:0000630 ATP maintenance, SBO:0000395 encapsulating process (the parent of
 * biomass production and ATP maintenance, used by genome-scale models for lumping
 * pseudo-reactions such as "lipid pseudoreaction"; treated as biomass, that is lumping), SBO:0000655 transport reaction and SBO:0000185
 * translocation reaction. Children of SBO:0000655 (SBO:0000654, 0000657 to 0000660) are listed
 * from memory. Generic terms (SBO:0000176 biochemical reaction, SBO:0000375 process, ...) say
 * nothing and leave the decision to the structure.
 *
 * <p>Structural rules, first match wins (common practice in genome-scale curation):
 * <ol>
 *   <li>one side empty, or one side made only of boundary species: exchange when the species is
 *       a boundary species or sits in an extracellular compartment, else sink when reversible,
 *       else demand;</li>
 *   <li>20 or more distinct participants, or "biomass" in the id or name: biomass (lumping);</li>
 *   <li>a reactant and a product that are the same chemical in different compartments (same
 *       name, or same id once the compartment suffix is removed): transport;</li>
 *   <li>otherwise internal.</li>
 * </ol>
 * Stateless and thread-safe.
 */
public final class ReactionClassifier {

    /** Participants at which a reaction counts as a lumping (biomass-like) reaction. */
    public static final int LUMPING_PARTICIPANTS = 20;

    private static final Pattern COMPARTMENT_SUFFIX = Pattern.compile("\\s*\\[[^\\]]*\\]\\s*$");

    private static final Map<String, ReactionClass> SBO = Map.ofEntries(
            Map.entry("SBO:0000627", ReactionClass.EXCHANGE),
            Map.entry("SBO:0000628", ReactionClass.DEMAND),
            Map.entry("SBO:0000632", ReactionClass.SINK),
            Map.entry("SBO:0000631", ReactionClass.PSEUDO),
            Map.entry("SBO:0000629", ReactionClass.BIOMASS),
            Map.entry("SBO:0000395", ReactionClass.BIOMASS),
            Map.entry("SBO:0000630", ReactionClass.ATP_MAINTENANCE),
            Map.entry("SBO:0000655", ReactionClass.TRANSPORT),
            Map.entry("SBO:0000185", ReactionClass.TRANSPORT),
            Map.entry("SBO:0000654", ReactionClass.TRANSPORT),
            Map.entry("SBO:0000657", ReactionClass.TRANSPORT),
            Map.entry("SBO:0000658", ReactionClass.TRANSPORT),
            Map.entry("SBO:0000659", ReactionClass.TRANSPORT),
            Map.entry("SBO:0000660", ReactionClass.TRANSPORT));

    public Classification classify(ModelView model, ReactionInfo reaction) {
        ReactionClass fromSbo = SBO.get(reaction.sboTerm());
        StructuralClass structural = structural(model, reaction);
        ReactionClass used = fromSbo != null ? fromSbo : structural.reactionClass;
        return new Classification(used, fromSbo, structural.reactionClass, structural.reason);
    }

    private record StructuralClass(ReactionClass reactionClass, String reason) {
    }

    private StructuralClass structural(ModelView model, ReactionInfo r) {
        List<Participant> open = null;
        if (r.reactants().isEmpty() && !r.products().isEmpty()) {
            open = r.products();
        } else if (r.products().isEmpty() && !r.reactants().isEmpty()) {
            open = r.reactants();
        } else if (!r.reactants().isEmpty() && allBoundary(model, r.products())) {
            open = r.reactants();
        } else if (!r.products().isEmpty() && allBoundary(model, r.reactants())) {
            open = r.products();
        }
        if (r.reactants().isEmpty() && r.products().isEmpty()) {
            return new StructuralClass(ReactionClass.PSEUDO, "no participants");
        }
        if (open != null) {
            if (anyOutside(model, open)) {
                return new StructuralClass(ReactionClass.EXCHANGE, "one side empty, species at the boundary");
            }
            return r.reversible()
                    ? new StructuralClass(ReactionClass.SINK, "one side empty, reversible, internal species")
                    : new StructuralClass(ReactionClass.DEMAND, "one side empty, irreversible, internal species");
        }
        Set<String> distinct = new HashSet<>();
        for (Participant p : r.participants()) {
            distinct.add(p.species());
        }
        String text = (r.id() + " " + r.name()).toLowerCase(Locale.ROOT);
        if (distinct.size() >= LUMPING_PARTICIPANTS) {
            return new StructuralClass(ReactionClass.BIOMASS, distinct.size() + " participants (lumping reaction)");
        }
        if (text.contains("biomass")) {
            return new StructuralClass(ReactionClass.BIOMASS, "'biomass' in the id or name");
        }
        if (crossesCompartments(model, r)) {
            return new StructuralClass(ReactionClass.TRANSPORT, "the same chemical on both sides in different compartments");
        }
        return new StructuralClass(ReactionClass.INTERNAL, "two-sided, one compartment per chemical");
    }

    private static boolean allBoundary(ModelView model, List<Participant> side) {
        for (Participant p : side) {
            Optional<SpeciesInfo> s = model.species(p.species());
            if (s.isEmpty() || !s.get().boundary()) {
                return false;
            }
        }
        return !side.isEmpty();
    }

    /** A participant that is a boundary species or sits in an extracellular compartment. */
    private static boolean anyOutside(ModelView model, List<Participant> side) {
        for (Participant p : side) {
            Optional<SpeciesInfo> s = model.species(p.species());
            if (s.isPresent() && (s.get().boundary() || isExtracellular(model, s.get().compartment()))) {
                return true;
            }
        }
        return false;
    }

    /** Compartment ids and names commonly used for the extracellular space (common practice). */
    static boolean isExtracellular(ModelView model, String compartmentId) {
        String id = compartmentId.toLowerCase(Locale.ROOT);
        if (id.equals("e") || id.equals("e0") || id.equals("ex") || id.equals("ext") || id.equals("boundary")
                || id.equals("extracellular") || id.equals("c_e")) {
            return true;
        }
        String name = model.compartment(compartmentId).map(CompartmentInfo::name).orElse("").toLowerCase(Locale.ROOT);
        return name.contains("extracellular") || name.contains("external") || name.contains("boundary")
                || name.equals("extra-organism");
    }

    private static boolean crossesCompartments(ModelView model, ReactionInfo r) {
        for (Participant a : r.reactants()) {
            Optional<SpeciesInfo> sa = model.species(a.species());
            if (sa.isEmpty()) {
                continue;
            }
            for (Participant b : r.products()) {
                Optional<SpeciesInfo> sb = model.species(b.species());
                if (sb.isEmpty() || sa.get().compartment().equals(sb.get().compartment())) {
                    continue;
                }
                if (sameChemical(sa.get(), sb.get())) {
                    return true;
                }
            }
        }
        return false;
    }

    private static boolean sameChemical(SpeciesInfo a, SpeciesInfo b) {
        boolean named = !a.name().equals(a.id()) && !b.name().equals(b.id());
        if (named && stripCompartmentName(a).equalsIgnoreCase(stripCompartmentName(b))) {
            return true;
        }
        String stemA = stem(a);
        String stemB = stem(b);
        return !stemA.isEmpty() && stemA.equals(stemB);
    }

    private static String stripCompartmentName(SpeciesInfo s) {
        // Names such as "ATP [cytoplasm]" carry the compartment; compare without it.
        return COMPARTMENT_SUFFIX.matcher(s.name()).replaceAll("").strip();
    }

    private static String stem(SpeciesInfo s) {
        String id = s.id();
        String c = s.compartment();
        if (!c.isEmpty()) {
            for (String suffix : List.of("_" + c, "[" + c + "]", "__" + c)) {
                if (id.endsWith(suffix)) {
                    return id.substring(0, id.length() - suffix.length());
                }
            }
        }
        return "";
    }
}
