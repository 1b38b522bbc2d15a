package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Pictures drawn once (issue #12): content-addressed files in the report's pictures/ folder, a
 * cache below the mapping cache directory that later runs read instead of drawing, CDK failures
 * kept as notes (and cached), and stale files of earlier runs removed. Reactions: methanol to
 * methanol and ethanol to acetaldehyde with their carbons and oxygen mapped (SMILES common practice).
 */
class PictureFilesTest {

    @TempDir
    Path tmp;

    private static PictureRequest request(String id, String smiles) {
        return new PictureRequest(id, smiles, List.of("a"), List.of("b"), Map.of("a", "substrate", "b", "product"));
    }

    static final PictureRequest METHANOL = request("R_ONE", "[CH3:1][OH:2]>>[CH3:1][OH:2]");
    static final PictureRequest ETHANOL = request("R_TWO", "[CH3:1][CH2:2][OH:3]>>[CH3:1][CH:2]=[O:3]");

    private static List<Path> files(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.sorted().toList();
        }
    }

    @Test
    void drawsEachDistinctPictureOnceUnderItsContentAddress() throws IOException {
        PictureRequest twin = request("R_ONE_AGAIN", METHANOL.mappedSmiles());
        Map<String, PictureFile> out = new PictureFiles(null, 2).draw(List.of(METHANOL, twin, ETHANOL), tmp);
        assertThat(out).hasSize(2);
        assertThat(out.get(METHANOL.key())).isEqualTo(out.get(twin.key()));
        assertThat(files(tmp.resolve("pictures"))).extracting(p -> p.getFileName().toString())
                .allMatch(n -> n.matches("[0-9a-f]{32}\\.svg")).hasSize(2)
                .contains(METHANOL.key().substring(0, 32) + ".svg");
        assertThat(out.get(ETHANOL.key()).width()).isPositive();
        assertThat(Files.readString(tmp.resolve("pictures").resolve(out.get(ETHANOL.key()).file())))
                .contains(">substrate</text>");
    }

    @Test
    void aSecondRunTakesThePictureFromTheCacheInsteadOfDrawing() throws IOException {
        Path cache = tmp.resolve("cache");
        new PictureFiles(cache, 1).draw(List.of(ETHANOL), tmp.resolve("first"));
        String key = ETHANOL.key();
        Path cached = cache.resolve("pictures").resolve(key.substring(0, 2)).resolve(key + ".svg");
        assertThat(cached).isRegularFile();
        // Mark the cached drawing: a run that drew again would not carry the mark.
        Files.writeString(cached, Files.readString(cached).replace("</svg>", "<!-- from the cache --></svg>"));
        PictureFile again = new PictureFiles(cache, 1).draw(List.of(ETHANOL), tmp.resolve("second")).get(key);
        assertThat(Files.readString(tmp.resolve("second/pictures").resolve(again.file()))).contains("from the cache");
    }

    @Test
    void cdkFailureIsANoteAndIsCachedToo() throws IOException {
        Path cache = tmp.resolve("cache");
        PictureRequest broken = request("R_BROKEN", "C1CC>>CC");
        PictureFile p = new PictureFiles(cache, 1).draw(List.of(broken), tmp).get(broken.key());
        assertThat(p.drawn()).isFalse();
        assertThat(p.notes()).singleElement().asString().startsWith("CDK cannot read the mapped SMILES of R_BROKEN");
        Path meta = cache.resolve("pictures").resolve(broken.key().substring(0, 2)).resolve(broken.key() + ".json");
        assertThat(Files.readString(meta)).contains("\"drawn\":false");
        assertThat(new PictureFiles(cache, 1).draw(List.of(broken), tmp).get(broken.key())).isEqualTo(p);
    }

    @Test
    void removesOnlyOurStalePictures() throws IOException {
        Path folder = Files.createDirectories(tmp.resolve("pictures"));
        Path stale = Files.writeString(folder.resolve("0123456789abcdef0123456789abcdef.svg"), "<svg/>");
        Path theirs = Files.writeString(folder.resolve("notes.txt"), "kept");
        new PictureFiles(null, 1).draw(List.of(METHANOL), tmp);
        assertThat(stale).doesNotExist();
        assertThat(theirs).exists();
        assertThat(folder.resolve(METHANOL.key().substring(0, 32) + ".svg")).exists();
    }
}
