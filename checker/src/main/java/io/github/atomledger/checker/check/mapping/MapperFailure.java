package io.github.atomledger.checker.check.mapping;

/**
 * How a reaction the atom mapper threw on is recorded: status {@link MapStatus#SKIPPED} with a
 * reason that starts with {@link #REASON} and names the error, which {@code mapping.mapper-failed}
 * reports. The engine records it instead of ending the run (one structure CDK cannot take must
 * not cost the other reactions their maps and the run its reports); such results are not cached.
 */
public final class MapperFailure {

    /** The start of the reason of every such result. */
    public static final String REASON = "the atom mapper failed";

    private MapperFailure() {
    }

    /**
     * The reason text: "the atom mapper failed [when]: NullPointerException in RingPlacer: message".
     *
     * @param when what it was doing, e.g. "while checking the curated map", or ""
     */
    public static String reason(String when, Throwable e) {
        return REASON + (when.isEmpty() ? "" : " " + when) + ": " + describe(e);
    }

    /** The error's class, the class it was thrown in, and its message; no stack. */
    static String describe(Throwable e) {
        StackTraceElement[] stack = e.getStackTrace();
        String where = stack.length == 0 ? "" : " in " + stack[0].getClassName()
                .substring(stack[0].getClassName().lastIndexOf('.') + 1) + "." + stack[0].getMethodName();
        return e.getClass().getSimpleName() + where + (e.getMessage() == null ? "" : ": " + e.getMessage());
    }

    /** True when this result records a mapper failure. */
    public static boolean is(ReactionMapping m) {
        return m.status() == MapStatus.SKIPPED && m.reason().startsWith(REASON);
    }
}
