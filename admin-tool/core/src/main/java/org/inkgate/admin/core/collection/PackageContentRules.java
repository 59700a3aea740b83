package org.inkgate.admin.core.collection;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.CandidateNumber;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.response.ResponseDocument;

/**
 * Rules a package's content must keep even when its signature is good: a trusted installation can
 * still run a faulty client, and {@code collect --any-installation} takes packages anyone holding
 * the owner's public key can write. Each breach names the rule and where; the collector refuses the
 * package on the first one (docs/formats.md, "What collect refuses").
 */
final class PackageContentRules {

    /** One broken rule: a short reason code (as stored with the refusal) and what is wrong, for people. */
    record Breach(String reason, String message) {
    }

    private PackageContentRules() {
    }

    /** The rules that hold whatever bundle the package names. */
    static List<Breach> beforeBundle(ResponseDocument d) {
        List<Breach> breaches = new ArrayList<>();
        if (!CandidateNumber.isValid(d.candidateNumber())) {
            breaches.add(new Breach("candidate-number", "its candidate number \""
                    + FormatRefusal.printable(shorten(d.candidateNumber())) + "\" breaks the rule for candidate numbers ("
                    + CandidateNumber.RULE + "), which every roster and client keeps"));
        }
        return breaches;
    }

    /** The rules that compare the package with its bundle (none yet beyond the form and event contract). */
    static List<Breach> withBundle(BundleManifest bundle, ResponseDocument d) {
        return List.of();
    }

    static String shorten(String s) {
        return s == null ? "" : s.length() > 40 ? s.substring(0, 40) + "..." : s;
    }
}
