package dev.proofrun.text;

import java.util.Optional;

/**
 * A problem the user can fix: bad input, a refused request. Carries a {@link MessageKey} and its
 * arguments, and optionally the {@link Location} in a file. The command line prints
 * {@link #getMessage()} on one line and exits with code 2; the wizard shows the same text inline.
 */
public class UserException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final transient MessageKey key;
    private final transient Object[] args;
    private final transient Location location;

    public UserException(MessageKey key, Object... args) {
        this(null, key, args);
    }

    public UserException(Location location, MessageKey key, Object... args) {
        super(compose(location, key, args));
        this.key = key;
        this.args = args.clone();
        this.location = location;
    }

    private static String compose(Location location, MessageKey key, Object... args) {
        String text = key.format(args);
        return location == null ? text : location + ": " + text;
    }

    public MessageKey key() {
        return key;
    }

    public Object[] args() {
        return args.clone();
    }

    public Optional<Location> location() {
        return Optional.ofNullable(location);
    }

    /**
     * The same refusal placed in a file or cell: itself when it already has a place (a cell is more precise
     * than its file), else the same key and arguments at {@code where}.
     */
    public UserException placedIn(Location where) {
        return location != null ? this : new UserException(where, key, args);
    }
}
