package org.swingclearance.plan;

import java.text.Normalizer;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.swingclearance.patient.ConsentView;

/**
 * Finds the patient's active consent that names a trainer: by e-mail when the consent records one (compared
 * case-insensitively), otherwise by name (compared after Unicode normalisation, ignoring case and repeated spaces).
 * A consent that records an e-mail never matches by name alone: the e-mail is the stronger identification.
 */
final class ConsentMatch {

    private ConsentMatch() {
    }

    static Optional<ConsentView> find(List<ConsentView> consents, String trainerEmail, String trainerName) {
        return consents.stream().filter(ConsentView::active)
                .filter(c -> c.trainerEmail() == null || c.trainerEmail().isBlank()
                        ? sameName(c.trainerName(), trainerName)
                        : c.trainerEmail().trim().equalsIgnoreCase(trainerEmail == null ? "" : trainerEmail.trim()))
                .findFirst();
    }

    static boolean sameName(String a, String b) {
        return a != null && b != null && normalise(a).equals(normalise(b));
    }

    private static String normalise(String name) {
        return Normalizer.normalize(name, Normalizer.Form.NFKC).trim().replaceAll("\\s+", " ")
                .toLowerCase(Locale.ROOT);
    }
}
