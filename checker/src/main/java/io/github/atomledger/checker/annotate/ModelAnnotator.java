package io.github.atomledger.checker.annotate;

import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.checker.transitions.ModelText;
import io.github.atomledger.checker.transitions.AnnotationIndex;
import io.github.atomledger.checker.AtomLedgerException;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Writes AtomLedger annotations into a model file by patching its text: each reaction's
 * {@code atomTransitions} element is added inside its {@code <annotation>} (created after the
 * reaction's {@code <notes>} when absent, as SBML orders them) or replaced in place. Nothing else
 * changes: a curator's diff shows only the added or updated elements. JSBML's writer is not used
 * because it reorders and drops content.
 *
 * <p>Writing is atomic: the new bytes go to a temporary file in the same directory, which takes
 * the original's permissions and is moved over the original; if the file changed since it was read,
 * nothing is written. Curated annotations are kept unless {@code overwriteCurated}. Gzip files stay
 * gzip, and the encoding, byte-order mark, XML declaration and line ends are kept.
 *
 * <p>Thread-safe (stateless); one call per file.
 */
public final class ModelAnnotator {

    /** What happened to one reaction. */
    public enum Action { ADDED, REPLACED, UNCHANGED, KEPT_CURATED, NOT_FOUND, FAILED }

    /** One reaction's outcome. */
    public record Change(String reactionId, Action action) {
    }

    /**
     * The outcome for one file: per-reaction changes, whether the file was (or would be) written,
     * and one sentence per reaction whose annotation could not be made ({@link Action#FAILED}; the
     * others are written all the same).
     */
    public record Outcome(String file, List<Change> changes, boolean written, boolean wouldChange,
                          List<String> failures) {
        public Outcome {
            changes = List.copyOf(changes);
            failures = List.copyOf(failures);
        }
    }

    private final boolean overwriteCurated;
    private final boolean dryRun;
    private final long maxBytes;

    public ModelAnnotator(boolean overwriteCurated, boolean dryRun, long maxBytes) {
        this.overwriteCurated = overwriteCurated;
        this.dryRun = dryRun;
        this.maxBytes = maxBytes;
    }

    /**
     * Annotates one model.
     *
     * @param file        the model file
     * @param display     how messages name it
     * @param annotations reaction id to the annotation it should carry
     * @throws AtomLedgerException when the file cannot be read or written, or changed meanwhile
     */
    public Outcome annotate(Path file, String display, Map<String, TransitionAnnotation> annotations) {
        return annotate(file, display, annotations, () -> { });
    }

    /** As {@link #annotate(Path, String, Map)}; {@code beforeWrite} runs between reading and writing (tests). */
    Outcome annotate(Path file, String display, Map<String, TransitionAnnotation> annotations, Runnable beforeWrite) {
        ModelText original = ModelText.read(file, display, maxBytes);
        String text = original.text();
        AnnotationIndex index = AnnotationIndex.scan(text, display);
        String newline = text.contains("\r\n") ? "\r\n" : "\n";
        List<Patch> patches = new ArrayList<>();
        List<Change> changes = new ArrayList<>();
        List<String> failures = new ArrayList<>();
        for (Map.Entry<String, TransitionAnnotation> e : new java.util.TreeMap<>(annotations).entrySet()) {
            AnnotationIndex.ReactionSpot spot = index.reactions().get(e.getKey());
            if (spot == null) {
                changes.add(new Change(e.getKey(), Action.NOT_FOUND));
                continue;
            }
            if (spot.stored() != null && spot.stored().isCurated() && !overwriteCurated) {
                changes.add(new Change(e.getKey(), Action.KEPT_CURATED));
                continue;
            }
            try {
                changes.add(plan(text, spot, e.getValue(), newline, patches));
            } catch (RuntimeException ex) {
                // Writing one reaction's annotation text failed (our bug or a library's): the
                // other reactions are still annotated; the caller reports this one.
                changes.add(new Change(e.getKey(), Action.FAILED));
                failures.add("the annotation of reaction " + e.getKey() + " could not be written: " + ex);
            }
        }
        String updated = apply(text, patches);
        boolean wouldChange = !updated.equals(text);
        boolean written = false;
        if (wouldChange && !dryRun) {
            beforeWrite.run();
            write(original, original.encode(updated), display);
            written = true;
        }
        return new Outcome(display, changes, written, wouldChange, failures);
    }

    private record Patch(int start, int end, String replacement) {
    }

    private static Change plan(String text, AnnotationIndex.ReactionSpot spot, TransitionAnnotation a, String nl,
                               List<Patch> patches) {
        String reactionIndent = indentBefore(text, spot.tagStart());
        String childIndent = childIndent(text, spot, reactionIndent);
        String unit = childIndent.startsWith(reactionIndent) && childIndent.length() > reactionIndent.length()
                ? childIndent.substring(reactionIndent.length()) : "  ";
        if (spot.oursStart() >= 0) {
            String indent = indentBefore(text, spot.oursStart());
            String xml = a.toXml(indent, unit, nl);
            if (text.substring(spot.oursStart(), spot.oursEnd()).equals(xml)) {
                return new Change(spot.id(), Action.UNCHANGED);
            }
            patches.add(new Patch(spot.oursStart(), spot.oursEnd(), xml));
            return new Change(spot.id(), Action.REPLACED);
        }
        String inner = childIndent + unit;
        String element = a.toXml(inner, unit, nl);
        if (spot.annotationStart() >= 0 && spot.annotationClose() >= 0) {
            int close = spot.annotationClose();
            String before = indentBefore(text, close);
            boolean ownLine = isLineStart(text, close - before.length());
            String insert = ownLine ? unit + element + nl + before : element;
            patches.add(new Patch(close, close, insert));
        } else if (spot.annotationStart() >= 0) {
            // <annotation/>: replace the empty element with a full one.
            int end = AnnotationIndex.tagEnd(text, spot.annotationStart());
            patches.add(new Patch(spot.annotationStart(), end, "<annotation>" + nl + inner + element + nl + childIndent
                    + "</annotation>"));
        } else {
            String block = nl + childIndent + "<annotation>" + nl + inner + element + nl + childIndent + "</annotation>";
            if (spot.selfClosing()) {
                int slash = spot.tagEnd() - 2;
                patches.add(new Patch(slash, spot.tagEnd(), ">" + block + nl + reactionIndent + "</reaction>"));
            } else {
                int at = spot.notesEnd() >= 0 ? spot.notesEnd() : spot.tagEnd();
                patches.add(new Patch(at, at, block));
            }
        }
        return new Change(spot.id(), Action.ADDED);
    }

    private static final Pattern NEXT_CHILD = Pattern.compile("\\A\\r?\\n([ \\t]*)<");

    private static String childIndent(String text, AnnotationIndex.ReactionSpot spot, String reactionIndent) {
        if (!spot.selfClosing()) {
            Matcher m = NEXT_CHILD.matcher(text.subSequence(spot.tagEnd(), Math.min(text.length(), spot.tagEnd() + 200)));
            if (m.find() && m.group(1).length() > reactionIndent.length()) {
                return m.group(1);
            }
        }
        return reactionIndent + (reactionIndent.contains("\t") ? "\t" : "  ");
    }

    /** The spaces and tabs between the start of the line and {@code offset}, or "" if other text is there. */
    static String indentBefore(String text, int offset) {
        int i = offset;
        while (i > 0 && (text.charAt(i - 1) == ' ' || text.charAt(i - 1) == '\t')) {
            i--;
        }
        return isLineStart(text, i) ? text.substring(i, offset) : "";
    }

    private static boolean isLineStart(String text, int i) {
        return i == 0 || text.charAt(i - 1) == '\n' || text.charAt(i - 1) == '\r';
    }

    private static String apply(String text, List<Patch> patches) {
        List<Patch> sorted = new ArrayList<>(patches);
        sorted.sort(Comparator.comparingInt(Patch::start));
        StringBuilder sb = new StringBuilder(text.length() + 256 * patches.size());
        int pos = 0;
        for (Patch p : sorted) {
            sb.append(text, pos, p.start()).append(p.replacement());
            pos = p.end();
        }
        sb.append(text, pos, text.length());
        return sb.toString();
    }

    private static void write(ModelText original, byte[] bytes, String display) {
        Path target = original.path().toAbsolutePath();
        Path dir = target.getParent();
        Path tmp = null;
        try {
            tmp = Files.createTempFile(dir, "." + target.getFileName() + ".", ".atomledger-tmp");
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
                ch.write(java.nio.ByteBuffer.wrap(bytes));
                ch.force(true);
            }
            copyPermissions(target, tmp);
            byte[] now = Files.readAllBytes(target);
            if (!ModelText.digest(now).equals(original.digest())) {
                throw new AtomLedgerException(display + ": the file changed since it was read; nothing was written");
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            tmp = null;
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot write the annotated model: " + e.getMessage(), e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // The temporary file is hidden and named after the model; nothing else depends on it.
                }
            }
        }
    }

    private static void copyPermissions(Path from, Path to) throws IOException {
        PosixFileAttributeView src = Files.getFileAttributeView(from, PosixFileAttributeView.class);
        PosixFileAttributeView dst = Files.getFileAttributeView(to, PosixFileAttributeView.class);
        if (src != null && dst != null) {
            Set<PosixFilePermission> perms = src.readAttributes().permissions();
            dst.setPermissions(perms);
        }
    }
}
