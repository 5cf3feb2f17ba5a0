package org.swingclearance.identity;

import org.springframework.security.core.userdetails.UserDetails;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.core.userdetails.UsernameNotFoundException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/** Loads staff accounts for sign-in by their e-mail address. */
@Service
class StaffUserDetailsService implements UserDetailsService {

    private final StaffAccountRepository accounts;

    StaffUserDetailsService(StaffAccountRepository accounts) {
        this.accounts = accounts;
    }

    @Override
    @Transactional(readOnly = true)
    public UserDetails loadUserByUsername(String username) {
        return accounts.findByEmail(username == null ? "" : username.trim())
                .map(StaffPrincipal::new)
                .orElseThrow(() -> new UsernameNotFoundException("unknown account"));
    }
}
