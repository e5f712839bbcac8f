package org.treeproof.data;

/**
 * A problem a user caused and can fix: a malformed file, an impossible option, data a method cannot take.
 *
 * <p>The message is one complete line meant for the user; it names the file with line and column, the
 * option, or the sample or feature concerned. The command line prints it and exits with code 2, never a
 * stack trace. Core code throws it only for conditions a user can cause; bugs stay ordinary exceptions.
 */
public class InputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public InputException(String message) {
        super(message, null, false, false);
    }

    public InputException(String message, Throwable cause) {
        super(message, cause, false, false);
    }
}
