package io.github.atomledger.checker.bench;

import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.StandardChecks;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;
import io.github.atomledger.checker.model.WithoutPackageElements;
import io.github.atomledger.checker.model.internal.SafeXml;
import io.github.atomledger.checker.report.JsonReporter;

import com.ctc.wstx.stax.WstxInputFactory;

import java.io.BufferedInputStream;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.GZIPInputStream;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamReader;
import org.sbml.jsbml.SBMLDocument;

/**
 * One benchmark step in its own JVM: {@code <mode> <model file> <repeats> <report dir>}. Prints one
 * line {@code ms <t1> <t2> ...} with the in-process time of each repeat, {@code cpu ...} with the main
 * thread's CPU time of each, and {@code processCpuMs} with the CPU time of the whole process (all
 * threads, JIT compilers and GC included) at the end. Modes: {@code stax} (a bare hardened StAX pass,
 * the floor), {@code jsbml} (JSBML's own reader, nothing else, shown the whole document but for SBML
 * package elements, which jsbml-core cannot read), {@code load} (our ModelLoader),
 * {@code balance} (load, every check but the consistency LP, the JSON report), {@code engine} (load,
 * every check, the JSON report).
 */
public final class BalanceBenchMain {

    private BalanceBenchMain() {
    }

    public static void main(String[] args) throws Exception {
        String mode = args[0];
        Path file = Path.of(args[1]);
        int repeats = Integer.parseInt(args[2]);
        Path reportDir = Path.of(args[3]);
        StringBuilder out = new StringBuilder("ms");
        StringBuilder cpu = new StringBuilder("cpu");
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        long sink = 0;
        for (int i = 0; i < repeats; i++) {
            long t0 = System.nanoTime();
            long c0 = threads.getCurrentThreadCpuTime();
            sink += once(mode, file, reportDir);
            out.append(' ').append((System.nanoTime() - t0) / 100_000 / 10.0);
            cpu.append(' ').append((threads.getCurrentThreadCpuTime() - c0) / 100_000 / 10.0);
        }
        System.out.println(out);
        System.out.println(cpu);
        Runtime rt = Runtime.getRuntime();
        System.out.println("heapUsedMb " + (rt.totalMemory() - rt.freeMemory()) / (1 << 20));
        // CPU of every thread of the process so far (JIT compilers and GC included), as user + system time would show.
        java.lang.management.OperatingSystemMXBean os = java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        if (os instanceof com.sun.management.OperatingSystemMXBean sun) {
            System.out.println("processCpuMs " + sun.getProcessCpuTime() / 1_000_000);
        }
        System.out.println("sink " + sink);
    }

    static long once(String mode, Path file, Path reportDir) throws Exception {
        switch (mode) {
            case "stax" -> {
                XMLInputFactory f = new WstxInputFactory();
                f.setProperty(XMLInputFactory.SUPPORT_DTD, Boolean.FALSE);
                f.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, Boolean.FALSE);
                long n = 0;
                try (InputStream in = open(file)) {
                    XMLStreamReader r = f.createXMLStreamReader(in);
                    while (r.hasNext()) {
                        if (r.next() == XMLStreamConstants.START_ELEMENT) {
                            n += r.getAttributeCount();
                        }
                    }
                }
                return n;
            }
            case "jsbml" -> {
                try (InputStream in = open(file)) {
                    XMLInputFactory f = SafeXml.factory();
                    SBMLDocument doc = new org.sbml.jsbml.xml.stax.SBMLReader().readSBML(
                            f.createFilteredReader(f.createXMLEventReader(in), new WithoutPackageElements()));
                    return doc.getModel().getReactionCount();
                }
            }
            case "load" -> {
                return new ModelLoader(LoadOptions.defaults()).load(file, file.getFileName().toString()).reactions().size();
            }
            case "engine", "balance" -> {
                RunConfig config = RunConfig.defaults(file.getParent(), List.of(file.getFileName().toString()));
                config = new RunConfig(config.baseDirectory(), config.models(), reportDir, config.failOn(),
                        config.formats(), config.policy(), config.maxModelBytes(), config.mapping());
                List<ModelCheck> checks = StandardChecks.all();
                if (mode.equals("balance")) {
                    checks = checks.stream().filter(c -> !c.ruleId().equals("balance.mass-inconsistent")
                            && !c.ruleId().equals("balance.consistency-undecided")).toList();
                }
                RunResult result = new Engine(checks).run(config, RunListener.SILENT);
                Files.createDirectories(reportDir);
                new JsonReporter().write(result, reportDir);
                return result.allFindings().size();
            }
            default -> throw new IllegalArgumentException("unknown mode " + mode);
        }
    }

    private static InputStream open(Path file) throws java.io.IOException {
        InputStream raw = new BufferedInputStream(Files.newInputStream(file), 1 << 16);
        return file.toString().endsWith(".gz") ? new BufferedInputStream(new GZIPInputStream(raw, 1 << 16), 1 << 16) : raw;
    }
}
