package org.branchsim.core.error;

import java.text.MessageFormat;
import java.util.List;
import java.util.Locale;

/**
 * The one exception type branchsim throws for expected failures. It carries a {@link ErrorKey}, the
 * arguments of that key's message, and for scenario errors the list of {@link Problem}s found.
 */
public final class BranchsimException extends RuntimeException {

    private final ErrorKey key;
    private final transient Object[] arguments;
    private final transient List<Problem> problems;

    /**
     * @param key message key
     * @param arguments arguments of the key's pattern
     */
    public BranchsimException(ErrorKey key, Object... arguments) {
        this(key, List.of(), null, arguments);
    }

    /**
     * @param key message key
     * @param problems problems found in a scenario (may be empty)
     * @param cause underlying cause, or null
     * @param arguments arguments of the key's pattern
     */
    public BranchsimException(ErrorKey key, List<Problem> problems, Throwable cause, Object... arguments) {
        this(format(key, arguments), key, problems, cause, arguments);
    }

    private BranchsimException(String message, ErrorKey key, List<Problem> problems, Throwable cause,
                               Object[] arguments) {
        super(message, cause);
        this.key = key;
        this.arguments = arguments.clone();
        this.problems = List.copyOf(problems);
    }

    /**
     * The same failure seen from where it was met, e.g. the option that carried a parameter path: same key,
     * arguments and problems, the message prefixed by {@code context + ": "}.
     *
     * @param context where the failure was met, e.g. {@code --vary}
     * @return the failure in that context (its cause is this exception)
     */
    public BranchsimException within(String context) {
        return new BranchsimException(context + ": " + getMessage(), key, problems, this, arguments);
    }

    private static String format(ErrorKey key, Object[] arguments) {
        return new MessageFormat(key.pattern(), Locale.ROOT).format(arguments);
    }

    /** @return the message key */
    public ErrorKey key() {
        return key;
    }

    /** @return a copy of the message arguments */
    public Object[] arguments() {
        return arguments.clone();
    }

    /** @return the scenario problems (empty unless {@link ErrorKey#SCENARIO_INVALID}) */
    public List<Problem> problems() {
        return problems;
    }

    /** @return the message followed by one line per problem */
    public String fullReport() {
        StringBuilder sb = new StringBuilder(getMessage());
        for (Problem p : problems) {
            sb.append(System.lineSeparator()).append("  ").append(p.describe());
        }
        return sb.toString();
    }
}
