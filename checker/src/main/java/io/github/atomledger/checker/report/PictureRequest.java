package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.depict.ReactionPicture;
import io.github.atomledger.checker.Version;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * What to draw for one reaction: its mapped reaction SMILES (as the engine stores it) and, for
 * each molecule of the SMILES in order, the species it is (copies repeated) and their titles.
 *
 * @param reactionId   the reaction, for notes and errors
 * @param mappedSmiles the mapped reaction SMILES, not empty
 * @param reactants    species id per reactant molecule
 * @param products     species id per product molecule
 * @param titles       title per species id of the reaction (usually its name)
 */
public record PictureRequest(String reactionId, String mappedSmiles, List<String> reactants, List<String> products,
                             Map<String, String> titles) {

    public PictureRequest {
        Objects.requireNonNull(reactionId, "reactionId");
        if (mappedSmiles == null || mappedSmiles.isEmpty()) {
            throw new IllegalArgumentException("reaction " + reactionId + " has no mapped SMILES to draw");
        }
        reactants = List.copyOf(reactants);
        products = List.copyOf(products);
        titles = Map.copyOf(titles);
    }

    /**
     * The content address of the picture: a SHA-256 over everything the drawing depends on (the
     * mapped SMILES, species and titles in order, the drawing style and CDK version, the
     * AtomLedger version). The reaction id is not part of it: equal reactions share a picture.
     */
    String key() {
        StringBuilder sb = new StringBuilder("atomledger=").append(Version.get()).append(';')
                .append(ReactionPicture.styleKey()).append(";smiles=").append(mappedSmiles);
        for (List<String> side : List.of(reactants, products)) {
            sb.append(side == reactants ? ";left=" : ";right=");
            for (String s : side) {
                sb.append(s).append('\u0001').append(titles.getOrDefault(s, s)).append('\u0002');
            }
        }
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(sb.toString().getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this JDK", e);
        }
    }

    /** The drawing, with map numbers shown only when the file is opened at {@code #indices}. */
    ReactionPicture.Drawing draw() {
        return ReactionPicture.of(reactionId, mappedSmiles, reactants, products).titles(new TreeMap<>(titles))
                .atomIndices(true).indicesOnRequest(true).draw();
    }
}
