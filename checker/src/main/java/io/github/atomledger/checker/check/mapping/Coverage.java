package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.FormulaParser;
import io.github.atomledger.atommapper.formula.FormulaSyntaxException;
import io.github.atomledger.checker.check.balance.ReactionClass;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.function.Function;

/**
 * How far a model's structures reach: of the reactions that could be mapped (internal, transport,
 * ATP maintenance), how many have a structure for every participant, which missing structures
 * would unblock most reactions, and which species are generic or polymers (R groups, {@code *}
 * atoms, {@code (...)n} formulas: no single structure exists for them, so they are reported as
 * such, not as missing). Deterministic.
 *
 * @param considered          reactions of a class that is mapped
 * @param mappable            of those, reactions with a structure for every participant
 * @param blocked             reactions held back by at least one missing structure
 * @param blockedByGenericOnly of the blocked ones, those whose only missing participants are generic
 * @param missing             species without a structure that are not generic, most unblocking first
 * @param generic             generic and polymer species taking part in a considered reaction, by id
 * @param sources             structures found per source label ({@code table}, {@code cross-reference}, ...)
 */
public record Coverage(int considered, int mappable, int blocked, int blockedByGenericOnly, List<Missing> missing,
                       List<Generic> generic, Map<String, Integer> sources) {

    /** The classes of reactions that are mapped (they conserve atoms by nature). */
    public static final Set<ReactionClass> MAPPED_CLASSES =
            Set.of(ReactionClass.INTERNAL, ReactionClass.TRANSPORT, ReactionClass.ATP_MAINTENANCE);

    /**
     * A species without a structure.
     *
     * @param unblocks reactions it is the only missing structure of (adding it makes them mappable)
     * @param blocks   reactions it is missing from
     * @param reactions those reactions, sorted
     */
    public record Missing(String species, int unblocks, int blocks, List<String> reactions) {
        public Missing {
            reactions = List.copyOf(reactions);
        }
    }

    /**
     * A generic or polymer species.
     *
     * @param reason "R group in formula", "polymer formula" or "R atom in structure"
     * @param blocks considered reactions held back because it has no structure
     */
    public record Generic(String species, String reason, int blocks) {
    }

    public Coverage {
        missing = List.copyOf(missing);
        generic = List.copyOf(generic);
        sources = Map.copyOf(sources);
    }

    /**
     * @param classOf the class of each reaction of the model
     */
    public static Coverage of(ModelView model, MappingData mapping, Function<String, ReactionClass> classOf) {
        Map<String, String> genericReasons = new TreeMap<>();
        SpeciesStructures structures = mapping.structures();
        for (SpeciesInfo s : model.species()) {
            String reason = genericReason(s, structures);
            if (reason != null) {
                genericReasons.put(s.id(), reason);
            }
        }
        int considered = 0;
        int blocked = 0;
        int genericOnly = 0;
        Map<String, TreeSet<String>> blocks = new TreeMap<>();
        Map<String, Integer> unblocks = new TreeMap<>();
        Map<String, Integer> genericBlocks = new TreeMap<>();
        Set<String> involved = new TreeSet<>();
        Set<String> seen = new TreeSet<>();
        for (ReactionInfo r : model.reactions()) {
            if (!seen.add(r.id()) || !MAPPED_CLASSES.contains(classOf.apply(r.id()))) {
                continue;
            }
            considered++;
            r.participants().forEach(p -> involved.add(p.species()));
            ReactionMapping m = mapping.mappings().get(r.id());
            if (m == null || m.status() != MapStatus.NO_STRUCTURE) {
                continue;
            }
            blocked++;
            List<String> real = m.missingStructures().stream().filter(s -> !genericReasons.containsKey(s)).toList();
            if (real.isEmpty()) {
                genericOnly++;
            }
            for (String s : m.missingStructures()) {
                if (genericReasons.containsKey(s)) {
                    genericBlocks.merge(s, 1, Integer::sum);
                } else {
                    blocks.computeIfAbsent(s, k -> new TreeSet<>()).add(r.id());
                }
            }
            if (m.missingStructures().size() == 1 && real.size() == 1) {
                unblocks.merge(real.get(0), 1, Integer::sum);
            }
        }
        List<Missing> missing = new ArrayList<>();
        blocks.forEach((s, rs) -> missing.add(new Missing(s, unblocks.getOrDefault(s, 0), rs.size(), List.copyOf(rs))));
        missing.sort(Comparator.comparingInt(Missing::unblocks).reversed().thenComparing(Comparator.comparingInt(Missing::blocks).reversed())
                .thenComparing(Missing::species));
        List<Generic> generic = new ArrayList<>();
        genericReasons.forEach((s, why) -> {
            if (involved.contains(s)) {
                generic.add(new Generic(s, why, genericBlocks.getOrDefault(s, 0)));
            }
        });
        Map<String, Integer> sources = new LinkedHashMap<>();
        for (SpeciesStructures.Source src : SpeciesStructures.Source.values()) {
            long n = structures.bySpecies().values().stream().filter(x -> x.source() == src).count();
            if (n > 0) {
                sources.put(src.label(), (int) n);
            }
        }
        return new Coverage(considered, considered - blocked, blocked, genericOnly, missing, generic, sources);
    }

    private static String genericReason(SpeciesInfo s, SpeciesStructures structures) {
        SpeciesStructures.Resolved r = structures.get(s.id()).orElse(null);
        if (r != null) {
            return r.structure().formula().count("R") > 0 ? "R atom in structure" : null;
        }
        if (s.formulaText() == null || s.formulaText().isBlank()) {
            return null;
        }
        try {
            Formula f = FormulaParser.parse(s.formulaText());
            if (f.isPolymer()) {
                return "polymer formula";
            }
            return f.pseudoElements().isEmpty() ? null : "R group in formula";
        } catch (FormulaSyntaxException | RuntimeException e) {
            return null;
        }
    }
}
