package io.github.atomledger.checker.engine;

import io.github.atomledger.atommapper.mapping.AtomMapper;
import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.MappingStatus;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.transitions.AnnotationIndex;
import io.github.atomledger.checker.transitions.ModelText;
import io.github.atomledger.checker.transitions.StoredStructure;
import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.check.mapping.CuratedVerdict;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.MapperFailure;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.check.structure.StructureResolver;
import io.github.atomledger.checker.check.structure.StructureLibrary;
import io.github.atomledger.checker.check.mapping.ImportedMap;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.ReactionInfo;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;

/**
 * Maps the reactions of one model: resolves structures, builds mapper inputs, takes results from
 * the cache or maps the rest in parallel (progress every few seconds), and validates curated maps
 * stored in the model. Results are in document order and do not depend on the thread count.
 */
final class MappingStage {

    private static final long PROGRESS_MILLIS = 5_000;

    private final MappingConfig config;
    private final Path baseDirectory;
    private final long maxBytes;
    private final RunListener listener;
    private final AtomMapper mapper;
    private final Function<ReactionInput, MappingResult> mapping;
    private final MappingCache cache;

    MappingStage(MappingConfig config, Path baseDirectory, long maxBytes, RunListener listener) {
        this(config, baseDirectory, maxBytes, listener, null);
    }

    /** As above, with {@code mapping} in place of the atom mapper when not null (tests). */
    MappingStage(MappingConfig config, Path baseDirectory, long maxBytes, RunListener listener,
                 Function<ReactionInput, MappingResult> mapping) {
        this.config = config;
        this.baseDirectory = baseDirectory;
        this.maxBytes = maxBytes;
        this.listener = listener;
        this.mapper = new AtomMapper(config.options());
        this.mapping = mapping == null ? mapper::map : mapping;
        this.cache = config.cacheDirectory() == null ? null : new MappingCache(config.cacheDirectory());
    }

    MappingData run(ModelView model, Path file, Map<String, ReactionBalance> balances) {
        // Only a model that carries our annotation element needs the second, positional scan
        // (a tenth of a warm yeast-GEM run); the namespace URI is in every such element.
        String text = ModelText.read(file, model.file(), maxBytes).text();
        AnnotationIndex index = text.contains(TransitionAnnotation.NAMESPACE)
                ? AnnotationIndex.scan(text, model.file()) : null;
        Map<String, TransitionAnnotation> stored = new LinkedHashMap<>();
        Map<String, String> storedSmiles = new TreeMap<>();
        (index == null ? Map.<String, AnnotationIndex.ReactionSpot>of() : index.reactions()).forEach((id, spot) -> {
            if (spot.stored() != null) {
                stored.put(id, spot.stored());
                for (StoredStructure s : spot.stored().structures()) {
                    storedSmiles.putIfAbsent(s.species(), s.smiles());
                }
            }
        });
        StructureLibrary library = StructureLibrary.load(config.structureSources(), baseDirectory, config.sdIdField(),
                config.cacheDirectory() == null ? null : config.cacheDirectory());
        SpeciesStructures structures = new StructureResolver().resolve(model, library, storedSmiles);

        Map<String, ReactionMapping> results = new LinkedHashMap<>();
        Map<String, ReactionInput> inputs = new LinkedHashMap<>();
        List<Job> jobs = new ArrayList<>();
        for (ReactionInfo r : model.reactions()) {
            if (results.containsKey(r.id()) || inputs.containsKey(r.id())) {
                continue;
            }
            ReactionBalance b = balances.get(r.id());
            Prepared p = MappingInputs.prepare(r, b, structures);
            if (p.early() != null) {
                results.put(r.id(), p.early());
                continue;
            }
            inputs.put(r.id(), p.input());
            String key = MappingCache.key("mapper=" + AtomMapper.VERSION + ";options=" + config.options().fingerprint()
                    + ";" + p.canonical());
            ReactionMapping hit = cache == null ? null : cache.get(key, r.id());
            if (hit != null) {
                results.put(r.id(), hit);
            } else {
                results.put(r.id(), null);
                jobs.add(new Job(r.id(), p.input(), key));
            }
        }
        runJobs(model.file(), jobs, results);
        Map<String, CuratedVerdict> curated = new LinkedHashMap<>();
        stored.forEach((id, annotation) -> {
            ReactionInput input = inputs.get(id);
            ReactionMapping optimum = results.get(id);
            if (annotation.isCurated() && input != null && optimum != null) {
                try {
                    curated.put(id, CuratedMaps.judge(mapper, input, optimum, annotation.carbons(),
                            config.reviewMargin()));
                } catch (RuntimeException | StackOverflowError e) {
                    results.put(id, failed(id, "while checking the curated map", e));
                }
            }
        });
        // Curated RXN files: judged like curated maps in the model, and in their place.
        Map<String, ImportedMap> imported = config.curatedMaps() == null ? Map.of()
                : CuratedFiles.read(config.curatedMaps(), baseDirectory, model, inputs, results);
        imported.forEach((id, m) -> {
            if (m.read()) {
                curated.put(id, m.problems().isEmpty() ? CuratedMaps.judge(mapper, inputs.get(id), results.get(id), m.carbons(),
                        config.reviewMargin())
                        : new CuratedVerdict(id, m.problems(), false, -1, List.of()));
            }
        });
        return new MappingData(true, results, curated, stored, structures, imported, config.reviewMargin());
    }

    private record Job(String reactionId, ReactionInput input, String key) {
    }

    /** A reaction ready for the mapper, or the result that makes mapping unnecessary. */
    record Prepared(ReactionInput input, String canonical, ReactionMapping early) {
    }

    private void runJobs(String file, List<Job> jobs, Map<String, ReactionMapping> results) {
        if (jobs.isEmpty()) {
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(config.threads(), r -> {
            Thread t = new Thread(r, "atomledger-mapper");
            t.setDaemon(true);
            return t;
        });
        AtomicInteger done = new AtomicInteger();
        Map<MapStatus, AtomicInteger> counts = new EnumMap<>(MapStatus.class);
        for (MapStatus s : MapStatus.values()) {
            counts.put(s, new AtomicInteger());
        }
        try {
            List<Future<ReactionMapping>> futures = new ArrayList<>();
            for (Job j : jobs) {
                futures.add(pool.submit(() -> {
                    ReactionMapping m = mapOne(j);
                    counts.get(m.status()).incrementAndGet();
                    done.incrementAndGet();
                    return m;
                }));
            }
            long start = System.nanoTime();
            long lastReport = System.currentTimeMillis();
            for (int i = 0; i < jobs.size(); i++) {
                ReactionMapping m = null;
                while (m == null) {
                    try {
                        m = futures.get(i).get(500, TimeUnit.MILLISECONDS);
                    } catch (TimeoutException e) {
                        if (System.currentTimeMillis() - lastReport >= PROGRESS_MILLIS) {
                            lastReport = System.currentTimeMillis();
                            listener.info(progress(file, done.get(), jobs.size(), counts, start));
                        }
                    }
                }
                Job j = jobs.get(i);
                results.put(j.reactionId(), m);
                if (cache != null && !MapperFailure.is(m)) {
                    cache.put(j.key(), m);
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AtomLedgerException(file + ": mapping was interrupted", e);
        } catch (ExecutionException e) {
            throw new AtomLedgerException(file + ": the atom mapper failed: " + AtomLedgerException.reason(e.getCause()), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    /**
     * Maps one reaction. The mapper and CDK below it throwing on one reaction (a structure CDK's
     * SMILES writer or ring perception cannot take, a bug of ours) does not end the run: the
     * reaction is reported as not mapped, with the error, and {@code mapping.mapper-failed}
     * names it (an error by default, so the build still fails).
     */
    private ReactionMapping mapOne(Job j) {
        try {
            return toMapping(mapping.apply(j.input()), fingerprints(j.input()));
        } catch (RuntimeException | StackOverflowError e) {
            return failed(j.reactionId(), "", e);
        }
    }

    private static ReactionMapping failed(String reactionId, String when, Throwable e) {
        return ReactionMapping.without(reactionId, MapStatus.SKIPPED, MapperFailure.reason(when, e), List.of());
    }

    private static String progress(String file, int done, int total, Map<MapStatus, AtomicInteger> counts, long start) {
        double elapsed = (System.nanoTime() - start) / 1e9;
        long left = done == 0 ? -1 : Math.round(elapsed / done * (total - done));
        StringBuilder sb = new StringBuilder("mapping ").append(file).append(": ").append(done).append('/').append(total)
                .append(" reactions (");
        boolean first = true;
        for (Map.Entry<MapStatus, AtomicInteger> e : counts.entrySet()) {
            if (e.getValue().get() > 0) {
                sb.append(first ? "" : ", ").append(e.getValue().get()).append(' ').append(e.getKey().label());
                first = false;
            }
        }
        return sb.append(")").append(left < 0 ? "" : ", about " + left + " s left").toString();
    }

    /**
     * Fingerprints of the structures a reaction was mapped from; computed only for reactions that
     * are mapped now (a cached result carries its own), because a stereo-aware canonical form
     * costs milliseconds per molecule.
     */
    private static Map<String, String> fingerprints(ReactionInput input) {
        Map<String, String> out = new TreeMap<>();
        input.reactants().forEach(p -> out.put(p.species(), p.structure().fingerprint()));
        input.products().forEach(p -> out.put(p.species(), p.structure().fingerprint()));
        return out;
    }

    static ReactionMapping toMapping(MappingResult r, Map<String, String> fingerprints) {
        MapStatus status = switch (r.status()) {
            case MAPPED -> MapStatus.MAPPED;
            case AMBIGUOUS -> MapStatus.AMBIGUOUS;
            case BEST_FOUND -> MapStatus.BEST_FOUND;
            case UNMAPPABLE -> MapStatus.UNMAPPABLE;
            case TOO_LARGE -> MapStatus.SKIPPED;
        };
        String reason = r.status() == MappingStatus.TOO_LARGE ? "too large for the mapper: " + r.reason() : r.reason();
        return new ReactionMapping(r.reactionId(), status, r.carbonTransitions(), r.alternatives(), r.cost(),
                r.lowerBound(), r.mappedSmiles(), r.stereoNotes(), reason, r.elementDifference(), List.of(),
                new TreeMap<>(fingerprints), r.confidence());
    }
}
