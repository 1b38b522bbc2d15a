package io.github.atomledger.checker.check.structure;

import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * A database cross-reference that can name a species' structure, as an identifiers.org prefix
 * and an id in that collection's own form: {@code chebi CHEBI:15361}, {@code metanetx.chemical
 * MNXM23}, {@code kegg.compound C00022}, {@code bigg.metabolite pyr}, {@code inchikey
 * LCTONWCANYUPML-UHFFFAOYSA-M}.
 *
 * <p>Read from the forms real models use (METHODS.md §3): {@code https://identifiers.org/chebi/CHEBI:15361},
 * the compact {@code https://identifiers.org/CHEBI:15361}, {@code urn:miriam:chebi:CHEBI%3A15361},
 * {@code http://purl.obolibrary.org/obo/CHEBI_15361}, and the {@code http://identifiers.org/inchi_key/...}
 * spelling some exports use for {@code inchikey}. Ids are checked against the registry patterns
 * (identifiers.org registry: chebi {@code ^CHEBI:\d+$}, metanetx.chemical {@code ^(MNXM\d+|BIOMASS)$}
 * plus {@code WATER} of newer MNXref releases (from memory), kegg.compound {@code ^C\d+$}, inchikey
 * {@code ^[A-Z]{14}-[A-Z]{10}(-[A-Z])?$}); a bigg.metabolite id is letters, digits and underscores.
 * Case is normalised where the collection is case-insensitive (all but bigg.metabolite).
 *
 * @param prefix one of {@link #PREFIXES}
 * @param id     the id in its canonical form
 */
public record CrossReference(String prefix, String id) implements Comparable<CrossReference> {

    /** The collections a structure can be looked up by, in the order they are tried. */
    public static final List<String> PREFIXES = List.of("chebi", "metanetx.chemical", "kegg.compound", "bigg.metabolite",
            "inchikey");

    private static final Pattern CHEBI = Pattern.compile("(?i)(?:CHEBI[:_])?(\\d+)");
    private static final Pattern MNX = Pattern.compile("(?i)MNXM\\d+|BIOMASS|WATER");
    private static final Pattern KEGG = Pattern.compile("(?i)C\\d{5}");
    private static final Pattern BIGG = Pattern.compile("[A-Za-z0-9_]+");
    private static final Pattern INCHIKEY = Pattern.compile("(?i)[A-Z]{14}-[A-Z]{10}(-[A-Z])?");

    public CrossReference {
        Objects.requireNonNull(prefix, "prefix");
        Objects.requireNonNull(id, "id");
    }

    /**
     * The cross-reference for an id of a known collection, or empty when the prefix is not one
     * of {@link #PREFIXES} (or an alias, see {@link #prefixNamed}) or the id
     * does not have the collection's form.
     */
    public static Optional<CrossReference> of(String prefix, String rawId) {
        if (prefix == null || rawId == null) {
            return Optional.empty();
        }
        String p = prefixNamed(prefix).orElse("");
        String id = rawId.strip();
        return switch (p) {
            case "chebi" -> matches(CHEBI, id).map(m -> new CrossReference("chebi", "CHEBI:" + CHEBI.matcher(id).replaceAll("$1")));
            case "metanetx.chemical" -> matches(MNX, id).map(m -> new CrossReference(p, id.toUpperCase(Locale.ROOT)));
            case "kegg.compound" -> matches(KEGG, id).map(m -> new CrossReference(p, id.toUpperCase(Locale.ROOT)));
            case "bigg.metabolite" -> matches(BIGG, id).map(m -> new CrossReference(p, id));
            case "inchikey" -> matches(INCHIKEY, id).map(m -> new CrossReference(p, id.toUpperCase(Locale.ROOT)));
            default -> Optional.empty();
        };
    }

    /**
     * The prefix of {@link #PREFIXES} a name stands for: the prefix itself in any case, or an alias
     * ({@code inchi_key}, {@code obo.chebi}, {@code ChEBI ID} as the ChEBI dump names its id field).
     */
    public static Optional<String> prefixNamed(String name) {
        String given = name.strip().toLowerCase(Locale.ROOT);
        String p = switch (given) {
            case "inchi_key" -> "inchikey";
            case "obo.chebi", "chebi id" -> "chebi";
            default -> given;
        };
        return PREFIXES.contains(p) ? Optional.of(p) : Optional.empty();
    }

    private static Optional<String> matches(Pattern pattern, String id) {
        return pattern.matcher(id).matches() ? Optional.of(id) : Optional.empty();
    }

    /**
     * A cross-reference from a MIRIAM URI as written in an annotation; empty for URIs of other
     * collections or of no identifiers.org form.
     */
    public static Optional<CrossReference> fromUri(String uri) {
        if (uri == null) {
            return Optional.empty();
        }
        String u = uri.strip();
        String lower = u.toLowerCase(Locale.ROOT);
        if (lower.startsWith("urn:miriam:")) {
            String rest = u.substring("urn:miriam:".length());
            int colon = rest.indexOf(':');
            return colon < 0 ? Optional.empty() : of(rest.substring(0, colon), decode(rest.substring(colon + 1)));
        }
        int at = lower.indexOf("identifiers.org/");
        if (at >= 0) {
            String rest = u.substring(at + "identifiers.org/".length());
            int slash = rest.indexOf('/');
            if (slash > 0) {
                return of(rest.substring(0, slash), decode(rest.substring(slash + 1)));
            }
            int colon = rest.indexOf(':');
            if (colon > 0) {
                String p = rest.substring(0, colon);
                // Compact identifiers: chebi keeps its prefix inside the id ("CHEBI:15361").
                return p.equalsIgnoreCase("chebi") ? of("chebi", decode(rest)) : of(p, decode(rest.substring(colon + 1)));
            }
            return Optional.empty();
        }
        int obo = lower.indexOf("purl.obolibrary.org/obo/chebi_");
        if (obo >= 0) {
            return of("chebi", u.substring(obo + "purl.obolibrary.org/obo/".length()));
        }
        return Optional.empty();
    }

    /**
     * A cross-reference from a bare name, as molfiles are named ({@code CHEBI_15361.mol}) or SD
     * id fields hold ids: {@code <prefix>_<id>} or {@code <prefix>:<id>} with a known prefix, or
     * an id whose form tells its collection ({@code CHEBI:15361}, {@code C00022}, {@code MNXM23},
     * an InChIKey). A bigg.metabolite id needs its prefix, as any word could be one.
     */
    public static Optional<CrossReference> fromName(String name) {
        if (name == null || name.isBlank()) {
            return Optional.empty();
        }
        String n = name.strip();
        for (String p : PREFIXES) {
            for (char sep : new char[] {'_', ':'}) {
                if (n.length() > p.length() + 1 && n.regionMatches(true, 0, p, 0, p.length()) && n.charAt(p.length()) == sep) {
                    Optional<CrossReference> x = of(p, n.substring(p.length() + 1));
                    if (x.isPresent()) {
                        return x;
                    }
                }
            }
        }
        if (n.regionMatches(true, 0, "CHEBI", 0, 5) && n.length() > 6) {
            return of("chebi", n);
        }
        if (MNX.matcher(n).matches() && n.regionMatches(true, 0, "MNXM", 0, 4)) {
            return of("metanetx.chemical", n);
        }
        if (KEGG.matcher(n).matches()) {
            return of("kegg.compound", n);
        }
        if (INCHIKEY.matcher(n).matches()) {
            return of("inchikey", n);
        }
        return Optional.empty();
    }

    private static String decode(String s) {
        // Percent-decoding only: '+' is not an encoded space in these ids.
        return s.contains("%") ? URLDecoder.decode(s.replace("+", "%2B"), StandardCharsets.UTF_8) : s;
    }

    /** Orders by the position of the prefix in {@link #PREFIXES}, then by id. */
    @Override
    public int compareTo(CrossReference o) {
        int c = Integer.compare(PREFIXES.indexOf(prefix), PREFIXES.indexOf(o.prefix));
        return c != 0 ? c : id.compareTo(o.id);
    }

    /** {@code prefix:id}, for example {@code chebi:CHEBI:15361} or {@code kegg.compound:C00022}. */
    @Override
    public String toString() {
        return prefix + ":" + id;
    }
}
