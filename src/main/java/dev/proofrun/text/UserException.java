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
}
