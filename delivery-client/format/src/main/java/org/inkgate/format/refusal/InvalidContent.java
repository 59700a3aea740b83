package org.inkgate.format.refusal;

/** The content parsed but breaks a rule of the format (an id that does not resolve, a value out of range). */
public final class InvalidContent extends FormatRefusal {

    public InvalidContent(String file, String detail) {
        super(file, detail);
    }
}
