package io.github.atomledger.checker.export;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.ctfile.RxnFile;
import io.github.atomledger.atommapper.ctfile.RxnMaps;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.checker.SourceFixtures;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingInputs;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15: maps out. Each exported RXN file read back (our reader, which CDK's own RXN reader and
 * writer check in atom-mapper's RxnRoundTripTest) gives the run's carbon transitions, and the
 * transition table lists them with readable positions.
 */
class MapExportTest {

    @TempDir
    Path dir;

    @Test
    void writesOneRxnFilePerMappedReactionAndTheCarbonTransitionTable() throws Exception {
        RunResult run = new Engine().run(SourceFixtures.run(SourceFixtures.all(dir), null), RunListener.SILENT);
        Path out = dir.resolve("maps");
        Files.createDirectories(out);
        Files.writeString(out.resolve("R_OLD.rxn"), "from an earlier run");
        MapExport.Written w = MapExport.write(run, out);
        assertThat(w.inferred()).isEqualTo(2);
        assertThat(w.failed()).isEmpty();
        assertThat(out.resolve("R_OLD.rxn")).doesNotExist();
        ModelResult m = run.models().get(0);
        int rows = 0;
        for (String id : List.of("R_PYK", "R_ENO")) {
            ReactionResult r = m.reactions().stream().filter(x -> x.id().equals(id)).findFirst().orElseThrow();
            ReactionInput input = MappingInputs.inputOf(r.reaction(), r.balance(), m.mapping().structures()).orElseThrow();
            RxnFile rxn = RxnFile.parse(Files.readString(out.resolve(id + ".rxn")));
            assertThat(rxn.comment()).isEqualTo("origin=inferred status=mapped cost=" + r.mapping().cost() + " atoms=heavy");
            assertThat(RxnMaps.onto(rxn, input).carbons()).isEqualTo(r.mapping().carbons());
            rows += r.mapping().carbons().size();
        }
        List<String> tsv = Files.readAllLines(out.resolve(MapExport.TRANSITIONS));
        assertThat(tsv).hasSize(rows + 1);
        assertThat(tsv.get(0)).startsWith("reaction\torigin\tstatus\tfrom_species");
        assertThat(tsv).anySatisfy(l -> assertThat(l).startsWith("R_ENO\tinferred\tmapped\tM_2pg_c\t1\t"));
        // Without atom classes in the structures, the readable position is the heavy-atom number.
        assertThat(tsv.subList(1, tsv.size())).allSatisfy(l -> assertThat(l.split("\t")[6]).isEqualTo(l.split("\t")[5]));

        byte[] first = Files.readAllBytes(out.resolve("R_PYK.rxn"));
        MapExport.write(run, out);
        assertThat(Files.readAllBytes(out.resolve("R_PYK.rxn"))).as("deterministic").isEqualTo(first);
    }
}
