package org.ferromap.errors;

/**
 * The one unchecked exception of ferromap. Carries a {@link MessageKey} so tests check the key,
 * not the wording, and the command line can map every failure to a clear message and exit code.
 */
public class FerromapException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final MessageKey key;

    public FerromapException(MessageKey key, String message) {
        super(message);
        this.key = key;
    }

    public FerromapException(MessageKey key, String message, Throwable cause) {
        super(message, cause);
        this.key = key;
    }

    /** The catalogue entry that names what went wrong. */
    public MessageKey key() {
        return key;
    }
}
