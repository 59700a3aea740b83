package org.inkgate.format.refusal;

/** An entry expands more than 100 times: the mark of a zip bomb. */
public final class CompressionRatioExceeded extends FormatRefusal {

    public CompressionRatioExceeded(String file, String entry, long ratio, long limit) {
        super(file, "entry \"" + entry + "\" expands about " + ratio + " times, over the limit of " + limit
                + " (a decompression bomb). Do not use this file.");
    }
}
