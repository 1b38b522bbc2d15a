package io.github.atomledger.checker;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The checker's main code reaches chemistry only through atom-mapper (STYLE.md §1): no source
 * file imports or names CDK's packages. Issue 15 moved MDL file reading into atom-mapper; this
 * keeps it there.
 */
class ModuleBoundaryTest {

    @Test
    void checkerSourcesDoNotUseCdkDirectly() throws IOException {
        Path main = Path.of("src/main/java");
        assertThat(main).isDirectory();
        List<String> offenders;
        try (Stream<Path> files = Files.walk(main)) {
            offenders = files.filter(p -> p.toString().endsWith(".java")).filter(p -> {
                try {
                    return Files.readString(p).contains("org.openscience");
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
            }).map(p -> main.relativize(p).toString()).toList();
        }
        assertThat(offenders).isEmpty();
    }
}
