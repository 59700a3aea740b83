package org.inkgate.client.sitting;

import java.util.Objects;
import java.util.Optional;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.CandidateNumber;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.RosterEntry;

/**
 * What a sitting is: which bundle, which candidate at which seat, which form, how much extra
 * time. Built by {@link #forCandidate} from the bundle's roster, so the form and accommodation
 * always come from the signed manifest.
 *
 * @param manifest         the verified bundle manifest
 * @param manifestSha256   SHA-256 of its bytes (names the bundle in the response)
 * @param bundleFile       the bundle's file, as opened (so recovery can open it again)
 * @param candidateNumber  the number the candidate signed in with
 * @param seat             the seat or machine label the invigilator set
 * @param formId           the form sat
 * @param extraTimePercent the roster's extra time (0 without a roster)
 * @param largePrint       the roster's large-print accommodation
 * @param highContrast     the roster's high-contrast accommodation
 * @param clientVersion    version of this client, for the response
 */
public record SittingPlan(BundleManifest manifest, String manifestSha256, String bundleFile, String candidateNumber,
        String seat, String formId, int extraTimePercent, boolean largePrint, boolean highContrast, String clientVersion) {

    public SittingPlan {
        Objects.requireNonNull(manifest, "manifest");
        Objects.requireNonNull(manifestSha256, "manifestSha256");
        Objects.requireNonNull(bundleFile, "bundleFile");
        Objects.requireNonNull(candidateNumber, "candidateNumber");
        seat = Objects.requireNonNullElse(seat, "");
        Objects.requireNonNull(formId, "formId");
        clientVersion = Objects.requireNonNullElse(clientVersion, "unknown");
        if (manifest.form(formId).isEmpty()) {
            throw new IllegalArgumentException("form \"" + formId + "\" is not in bundle " + bundleFile);
        }
    }

    /**
     * The plan for a candidate: with a roster, the candidate must be on it and the form and
     * accommodations are the roster's; without one (open sitting), {@code openForm} names the form.
     *
     * The number is matched as the roster's rules say ({@link CandidateNumber}).
     *
     * @throws NotOnRoster when the number is empty or not on the roster, worded for the candidate who typed it
     * @throws IllegalArgumentException when the invigilator must choose a form
     */
    public static SittingPlan forCandidate(BundleManifest manifest, String manifestSha256, String bundleFile,
            String candidateNumber, String seat, String openForm, String clientVersion) {
        String number = Objects.requireNonNull(candidateNumber, "candidateNumber").strip();
        if (number.isEmpty()) {
            throw new NotOnRoster("Type your candidate number first. It is on your admission details.");
        }
        if (!org.inkgate.format.bundle.CandidateNumber.isValid(number)) {
            throw new IllegalArgumentException("a candidate number has " + org.inkgate.format.bundle.CandidateNumber.RULE
                    + "; check the number with the candidate's admission details");
        }
        if (!manifest.roster().isEmpty()) {
            Optional<RosterEntry> entry = CandidateNumber.find(manifest.roster(), number);
            if (entry.isEmpty()) {
                throw new NotOnRoster("The number " + number + " is not on the list for this exam. Check it against"
                        + " your admission details and type it again. If it is right, ask the invigilator.");
            }
            RosterEntry r = entry.get();
            // the roster's spelling, whatever case was typed: the response and the admin tool match on it
            return new SittingPlan(manifest, manifestSha256, bundleFile, r.candidateNumber(), seat, r.formId(), r.extraTimePercent(),
                    r.largePrint(), r.highContrast(), clientVersion);
        }
        String form = openForm;
        if (form == null && manifest.forms().size() == 1) {
            form = manifest.forms().getFirst().id();
        }
        if (form == null) {
            throw new IllegalArgumentException("this bundle has no roster and " + manifest.forms().size()
                    + " forms: the invigilator must choose the form");
        }
        return new SittingPlan(manifest, manifestSha256, bundleFile, number, seat, form, 0, false, false, clientVersion);
    }

    /** The candidate's number cannot start a sitting; the message is for the candidate at the sign-in screen. */
    public static final class NotOnRoster extends IllegalArgumentException {
        private static final long serialVersionUID = 1L;

        NotOnRoster(String message) {
            super(message);
        }
    }

    /** The form sat. */
    public FormSpec form() {
        return manifest.form(formId).orElseThrow();
    }
}
