package org.inkgate.format.refusal;

/** An entry, the entry count or the total unpacked size is over the reader's limit. */
public final class SizeLimitExceeded extends FormatRefusal {

    public SizeLimitExceeded(String file, String what, long limit) {
        super(file, what + " is over the limit of " + limit
                + ". Inkgate refuses it so that a crafted file cannot fill the disk or memory; if the file is"
                + " genuine, ask the test owner to split the packs or raise the limit.");
    }
}
