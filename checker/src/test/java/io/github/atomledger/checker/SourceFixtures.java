package io.github.atomledger.checker;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.RunConfig;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

/**
 * Structure files for the model {@code structure/sources/cross-references.xml} (issue 15): an SD
 * file in the layout of the public ChEBI dump, a molfile directory named by MetaNetX id, and a
 * table keyed by InChIKey. SMILES from memory (charged forms at pH 7, as ChEBI gives them),
 * written into molfiles by CDK's writer.
 */
public final class SourceFixtures {

    public static final String PEP = "C=C(OP([O-])([O-])=O)C([O-])=O";
    public static final String ATP = "Nc1ncnc2n(cnc12)[C@@H]1O[C@H](COP([O-])(=O)OP([O-])(=O)OP([O-])([O-])=O)[C@@H](O)[C@H]1O";
    public static final String ADP = "Nc1ncnc2n(cnc12)[C@@H]1O[C@H](COP([O-])(=O)OP([O-])([O-])=O)[C@@H](O)[C@H]1O";
    public static final String PYRUVIC_ACID = "CC(=O)C(O)=O";
    public static final String PYRUVATE = "CC(=O)C([O-])=O";

    private SourceFixtures() {
    }

    /** The molfile CDK writes for a SMILES, without map numbers. */
    public static String molfile(String smiles) {
        try {
            Structure s = Structure.fromSmiles(smiles);
            return s.toMolfile("", new int[s.heavyAtomCount()]);
        } catch (Exception e) {
            throw new AssertionError(e);
        }
    }

    /** An SD record in the ChEBI dump's layout. */
    public static String record(String chebiId, String molfile, String name) {
        return molfile + "> <ChEBI ID>\n" + chebiId + "\n\n> <ChEBI Name>\n" + name + "\n\n$$$$\n";
    }

    public static Path write(Path dir, String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.createDirectories(p.getParent());
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    /** chebi.sdf (PEP, ATP, pyruvic acid, pyruvate). */
    public static Path chebiSd(Path dir) throws IOException {
        return write(dir, "chebi.sdf", record("CHEBI:58702", molfile(PEP), "phosphoenolpyruvate")
                + record("CHEBI:30616", molfile(ATP), "ATP(4-)")
                + record("CHEBI:32816", molfile(PYRUVIC_ACID), "pyruvic acid")
                + record("CHEBI:15361", molfile(PYRUVATE), "pyruvate"));
    }

    /** chebi.sdf, mol/ (ADP as MNXM7.mol) and lab.tsv (H+ by InChIKey), in that order. */
    public static List<Path> all(Path dir) throws IOException {
        Path sd = chebiSd(dir);
        write(dir, "mol/MNXM7.mol", molfile(ADP));
        Path table = write(dir, "lab.tsv", "inchikey\tsmiles\nGPRLSGONYQIRFK-UHFFFAOYSA-N\t[H+]\n");
        return List.of(sd, dir.resolve("mol"), table);
    }

    /**
     * A run of the cross-reference fixture with these structure files (one thread, a generous
     * time budget so that statuses do not depend on load, no cache).
     */
    public static RunConfig run(List<Path> structures, Path curatedMaps) {
        Path model = TestModels.fixture("structure/sources/cross-references.xml");
        MappingConfig mapping = new MappingConfig(true, null,
                io.github.atomledger.atommapper.mapping.MappingOptions.defaults().withTimeBudget(Duration.ofSeconds(60)),
                1, null, structures, null, curatedMaps);
        return RunConfig.defaults(model.getParent(), List.of(model.getFileName().toString())).withMapping(mapping);
    }
}
