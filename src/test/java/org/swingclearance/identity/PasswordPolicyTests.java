package org.swingclearance.identity;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Password rules after NIST SP 800-63B-4 (15 characters minimum, 64+ allowed, blocklist, context words). */
class PasswordPolicyTests {

    @Test
    void fourteenCharactersAreTooShortFifteenAreEnough() {
        assertThat(PasswordPolicy.violation("fourteen chars", "a@b.c")).contains("password.error.tooShort");
        assertThat(PasswordPolicy.violation("fifteen chars!!", "a@b.c")).isEmpty();
    }

    @Test
    void sixtyFourAndOneHundredTwentyEightCharactersAreAllowed() {
        assertThat(PasswordPolicy.violation("river stone ".repeat(6).substring(0, 64), "a@b.c")).isEmpty();
        assertThat(PasswordPolicy.violation("maple cloud lantern ".repeat(7).substring(0, 128), "a@b.c")).isEmpty();
        assertThat(PasswordPolicy.violation("x".repeat(100) + "y".repeat(29), "a@b.c")).contains("password.error.tooLong");
    }

    @Test
    void codePointsAreCountedNotBytes() {
        assertThat(PasswordPolicy.violation("日本語のパスワードです十五文字", "a@b.c")).isEmpty();
    }

    @Test
    void commonPasswordsAndTheOwnNameAreRefused() {
        assertThat(PasswordPolicy.violation("passwordpassword", "a@b.c")).contains("password.error.common");
        assertThat(PasswordPolicy.violation("aaaaaaaaaaaaaaaaaaaa", "a@b.c")).contains("password.error.common");
        assertThat(PasswordPolicy.violation("robinvale-2026-summer", "robinvale@clinic.test")).contains("password.error.context");
        assertThat(PasswordPolicy.violation("SwingClearance2026!!", "x@clinic.test")).contains("password.error.context");
    }
}
