package org.inkgate.admin.core.rating;

/** A rating request that cannot be met, with a message that says what and how to fix it. */
public class RatingException extends Exception {

    public RatingException(String message) {
        super(message);
    }

    public RatingException(String message, Throwable cause) {
        super(message, cause);
    }
}
