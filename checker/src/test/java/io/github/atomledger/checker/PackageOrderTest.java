package io.github.atomledger.checker;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Data flows one way through checker (DEVELOPERS.md): model and transitions, then the checks, then
 * the traces, then the engine, then diff, gate and baseline, then annotate, report and export. A source scan
 * fails on any import (or fully qualified use) of a package above the importing one.
 */
class PackageOrderTest {

    private static final String ROOT = "io.github.atomledger.checker";
    private static final Map<String, Integer> RANK = Map.ofEntries(
            Map.entry("model", 0), Map.entry("transitions", 0),
            Map.entry("check", 1),
            Map.entry("trace", 2),
            Map.entry("engine", 3),
            Map.entry("diff", 4), Map.entry("gate", 4), Map.entry("baseline", 4),
            Map.entry("annotate", 5), Map.entry("report", 5), Map.entry("export", 5));
    private static final Pattern USE = Pattern.compile(Pattern.quote(ROOT) + "\\.([a-z]+)\\.");

    private static int rank(String topPackage) {
        Integer r = RANK.get(topPackage);
        if (r == null) {
            throw new AssertionError("package " + topPackage + " has no place in the order; add it to DEVELOPERS.md and here");
        }
        return r;
    }

    @Test
    void noPackageUsesOneAboveIt() throws IOException {
        Path sources = Path.of("src", "main", "java", "io", "github", "atomledger", "checker");
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(sources)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                Path rel = sources.relativize(f);
                if (rel.getNameCount() < 2) {
                    continue;
                }
                String own = rel.getName(0).toString();
                String text = Files.readString(f);
                Matcher m = USE.matcher(text);
                while (m.find()) {
                    String used = m.group(1);
                    if (RANK.containsKey(used) && rank(used) > rank(own)) {
                        violations.add(rel + " uses " + used);
                    }
                }
                rank(own);
            }
        }
        assertThat(violations).isEmpty();
    }
}
