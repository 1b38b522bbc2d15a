package io.github.atomledger.checker.baseline;

import io.github.atomledger.checker.check.Finding;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;

/**
 * A short, stable fingerprint of a finding's {@code data}: the first 16 hex digits of the SHA-256
 * of its entries, one {@code key=value} line each in key order (UTF-8, '\n' after each line; a
 * backslash, a newline, and in keys an '=', are escaped with a backslash, so that no two maps
 * give the same text).
 *
 * <p>It leaves out the message (wording may change) and the line (edits elsewhere in the file
 * move it), and the rule, element and file (a baseline entry lists those in their own columns).
 * So an entry stays valid while the finding's facts stay the same, and stops matching when they
 * change (a reaction accepted with H -1 that now lacks two hydrogens is a new finding).
 */
public final class Fingerprint {

    /** The number of hex digits kept. */
    public static final int LENGTH = 16;

    private Fingerprint() {
    }

    public static String of(Finding finding) {
        return of(finding.data());
    }

    /** The fingerprint of a data map, iterated in key order. */
    public static String of(Map<String, String> data) {
        StringBuilder text = new StringBuilder();
        new java.util.TreeMap<>(data).forEach((k, v) ->
                text.append(escape(k).replace("=", "\\=")).append('=').append(escape(v)).append('\n'));
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(text.toString().getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(digest).substring(0, LENGTH);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    private static String escape(String s) {
        return s.replace("\\", "\\\\").replace("\n", "\\n");
    }

    /** True for 16 lower-case hex digits. */
    public static boolean isValid(String text) {
        return text != null && text.matches("[0-9a-f]{" + LENGTH + "}");
    }
}
