package org.swingclearance.identity;

import org.springframework.security.web.authentication.WebAuthenticationDetails;

/** The client address Spring Security recorded with an authentication attempt, or "unknown". */
public final class ClientAddress {

    private ClientAddress() {
    }

    public static String of(Object authenticationDetails) {
        if (authenticationDetails instanceof WebAuthenticationDetails web && web.getRemoteAddress() != null) {
            return web.getRemoteAddress();
        }
        return "unknown";
    }
}
