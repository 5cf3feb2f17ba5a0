package org.swingclearance.identity;

import org.springframework.security.authentication.AuthenticationProvider;
import org.springframework.security.authentication.LockedException;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.authentication.dao.DaoAuthenticationProvider;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.AuthenticationException;

/**
 * Refuses to even check the password while the account or address is throttled, records each failure and
 * clears the account's failures on success. Unknown names and wrong passwords fail alike.
 */
class ThrottlingAuthenticationProvider implements AuthenticationProvider {

    private final DaoAuthenticationProvider delegate;
    private final LoginThrottle throttle;

    ThrottlingAuthenticationProvider(DaoAuthenticationProvider delegate, LoginThrottle throttle) {
        this.delegate = delegate;
        this.throttle = throttle;
    }

    @Override
    public Authentication authenticate(Authentication authentication) {
        String username = authentication.getName();
        String address = ClientAddress.of(authentication.getDetails());
        if (throttle.isBlocked(username, address)) {
            throttle.recordFailure(username, address);
            throw new LockedException("too many failed sign-ins; try again later");
        }
        try {
            Authentication result = delegate.authenticate(authentication);
            throttle.recordSuccess(username);
            return result;
        } catch (AuthenticationException e) {
            throttle.recordFailure(username, address);
            throw e;
        }
    }

    @Override
    public boolean supports(Class<?> authentication) {
        return UsernamePasswordAuthenticationToken.class.isAssignableFrom(authentication);
    }
}
