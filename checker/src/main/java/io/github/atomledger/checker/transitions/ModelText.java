package io.github.atomledger.checker.transitions;

import io.github.atomledger.checker.AtomLedgerException;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.GZIPInputStream;
import java.util.zip.GZIPOutputStream;

/**
 * A model file's exact bytes and their text, with what is needed to write it back the same way:
 * gzip or not, byte-order mark, the declared encoding, and a digest of the bytes as read (to
 * refuse writing over a file that changed meanwhile).
 */
public record ModelText(Path path, byte[] bytes, String text, boolean gzip, boolean bom, Charset charset, String digest) {

    private static final Pattern ENCODING = Pattern.compile("^<\\?xml[^>]*encoding\\s*=\\s*[\"']([A-Za-z0-9._-]+)[\"']");

    public static ModelText read(Path path, String display, long maxBytes) {
        byte[] bytes;
        try {
            if (Files.size(path) > maxBytes && !isGzip(path)) {
                throw new AtomLedgerException(display + ": model size exceeds the cap of " + maxBytes
                        + " bytes (set atomledger.maxModelBytes to raise it)");
            }
            bytes = Files.readAllBytes(path);
        } catch (java.nio.file.NoSuchFileException e) {
            throw new AtomLedgerException(display + ": model file not found", e);
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot read the model file: " + e.getMessage(), e);
        }
        boolean gzip = bytes.length > 1 && (bytes[0] & 0xff) == 0x1f && (bytes[1] & 0xff) == 0x8b;
        byte[] xml = gzip ? gunzip(bytes, display, maxBytes) : bytes;
        boolean bom = xml.length >= 3 && (xml[0] & 0xff) == 0xEF && (xml[1] & 0xff) == 0xBB && (xml[2] & 0xff) == 0xBF;
        int skip = bom ? 3 : 0;
        String head = new String(xml, skip, Math.min(200, xml.length - skip), StandardCharsets.ISO_8859_1);
        Charset cs = StandardCharsets.UTF_8;
        Matcher m = ENCODING.matcher(head);
        if (m.find()) {
            try {
                cs = Charset.forName(m.group(1));
            } catch (IllegalArgumentException e) {
                throw new AtomLedgerException(display + ":1: unknown encoding '" + m.group(1) + "' in the XML declaration");
            }
        }
        String text = new String(xml, skip, xml.length - skip, cs);
        return new ModelText(path, bytes, text, gzip, bom, cs, digest(bytes));
    }

    /** The bytes for a new text, encoded as the original was (same charset, BOM, gzip). */
    public byte[] encode(String newText) {
        byte[] body = newText.getBytes(charset);
        byte[] xml = body;
        if (bom) {
            xml = new byte[body.length + 3];
            xml[0] = (byte) 0xEF;
            xml[1] = (byte) 0xBB;
            xml[2] = (byte) 0xBF;
            System.arraycopy(body, 0, xml, 3, body.length);
        }
        if (!gzip) {
            return xml;
        }
        // GZIPOutputStream writes mtime 0 and no file name: the same text gives the same bytes.
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (GZIPOutputStream z = new GZIPOutputStream(out)) {
            z.write(xml);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        return out.toByteArray();
    }

    private static byte[] gunzip(byte[] bytes, String display, long maxBytes) {
        try (GZIPInputStream in = new GZIPInputStream(new ByteArrayInputStream(bytes))) {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            byte[] buf = new byte[1 << 16];
            long total = 0;
            int n;
            while ((n = in.read(buf)) > 0) {
                total += n;
                if (total > maxBytes) {
                    throw new AtomLedgerException(display + ": decompressed size exceeds the cap of " + maxBytes
                            + " bytes (set atomledger.maxModelBytes to raise it)");
                }
                out.write(buf, 0, n);
            }
            return out.toByteArray();
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot decompress: " + e.getMessage(), e);
        }
    }

    private static boolean isGzip(Path path) throws IOException {
        try (java.io.InputStream in = Files.newInputStream(path)) {
            return in.read() == 0x1f && in.read() == 0x8b;
        }
    }

    public static String digest(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
