package org.swingclearance.identity;

import java.text.Normalizer;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * Password rules after NIST SP 800-63B-4 (via security-audit-interop.md A.2) and ASVS 5.0 6.2: at least 15
 * characters, at most 128 counted as code points, no composition rules, and refused when it is a common
 * password or built around the account's own name or the product's name.
 */
public final class PasswordPolicy {

    public static final int MIN_LENGTH = 15;
    public static final int MAX_LENGTH = 128;

    /** A short offline blocklist of the most common long passwords and patterns; not exhaustive. */
    private static final Set<String> COMMON = Set.of("123456789012345", "1234567890123456", "qwertyuiopasdfgh",
            "passwordpassword", "password1234567", "iloveyou1234567", "aaaaaaaaaaaaaaa", "abcdefghijklmno",
            "qwertyuiop12345", "letmein12345678", "welcome12345678", "changeme1234567", "administrator123",
            "passwort1234567", "motdepasse12345", "000000000000000", "111111111111111", "correcthorsebatterystaple");

    private PasswordPolicy() {
    }

    /** The message key of the first rule the password breaks, if any. */
    public static Optional<String> violation(String password, String email) {
        if (password == null) {
            return Optional.of("password.error.tooShort");
        }
        String normalised = Normalizer.normalize(password, Normalizer.Form.NFKC);
        int length = normalised.codePointCount(0, normalised.length());
        if (length < MIN_LENGTH) {
            return Optional.of("password.error.tooShort");
        }
        if (length > MAX_LENGTH) {
            return Optional.of("password.error.tooLong");
        }
        String lower = normalised.toLowerCase(Locale.ROOT);
        if (COMMON.contains(lower) || lower.chars().distinct().count() <= 2) {
            return Optional.of("password.error.common");
        }
        String localPart = email == null ? "" : email.toLowerCase(Locale.ROOT).split("@")[0];
        String stripped = lower.replaceAll("[^\\p{L}]", "");
        if ((localPart.length() >= 4 && lower.contains(localPart))
                || stripped.startsWith("swingclearance") || stripped.equals(localPart.replaceAll("[^\\p{L}]", ""))) {
            return Optional.of("password.error.context");
        }
        return Optional.empty();
    }
}
