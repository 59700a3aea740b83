package org.inkgate.client.demo;

/** The demo exam source cannot be turned into a bundle; the message says what, where and how to fix it. */
public final class DemoSourceException extends Exception {

    private static final long serialVersionUID = 1L;

    public DemoSourceException(String message) {
        super(message);
    }

    public DemoSourceException(String message, Throwable cause) {
        super(message, cause);
    }
}
