package org.inkgate.format.refusal;

/** The signature is valid but made by a key the reader was not told to trust. */
public final class UntrustedSigner extends FormatRefusal {

    private final String fingerprint;

    /** A bundle signed by an owner key that was not given as trusted. */
    public UntrustedSigner(String file, String fingerprint) {
        this(file, fingerprint, "signed by a key that is not trusted here (fingerprint " + fingerprint + "). Compare the"
                + " fingerprint with the one the test owner published; if it matches, add it to the trusted keys.");
    }

    private UntrustedSigner(String file, String fingerprint, String message) {
        super(file, message);
        this.fingerprint = fingerprint;
    }

    /**
     * A response package signed by a client installation that is not enrolled. Test owners publish
     * only their own key, so there is nothing published to compare with: the way forward is to
     * enrol the installation from its own enrolment file, or to accept any installation for one run.
     */
    public static UntrustedSigner installation(String file, String fingerprint) {
        return new UntrustedSigner(file, fingerprint, "the package comes from a client installation that is not"
                + " enrolled (installation fingerprint " + fingerprint + "). To enrol it: the invigilator runs"
                + "  inkgate-client --installation  on that machine and hands over the enrolment file it writes; import"
                + " it with  inkgate-admin installations enrol --list FILE ENROLMENT.inkenrol  and collect again. To"
                + " accept it for this run only: collect with --any-installation, which accepts a package signed by any"
                + " installation (anyone can write a package to your public key) and lists each package's installation"
                + " fingerprint, for you to check against the seat records.");
    }

    /** The fingerprint of the key that signed, as read from the file. */
    public String fingerprint() {
        return fingerprint;
    }
}
