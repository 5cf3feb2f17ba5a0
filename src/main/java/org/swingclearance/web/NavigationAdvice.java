package org.swingclearance.web;

import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.GrantedAuthority;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ModelAttribute;

/** Puts the navigation items the signed-in user may see into every page's model. */
@ControllerAdvice
class NavigationAdvice {

    private final List<NavEntry> entries;

    NavigationAdvice(List<NavEntry> entries) {
        this.entries = entries.stream().sorted(Comparator.comparingInt(NavEntry::order)).toList();
    }

    @ModelAttribute("navEntries")
    List<NavEntry> navEntries() {
        Authentication auth = SecurityContextHolder.getContext().getAuthentication();
        if (auth == null || !auth.isAuthenticated()) {
            return List.of();
        }
        Set<String> roles = auth.getAuthorities().stream().map(GrantedAuthority::getAuthority)
                .map(a -> a.startsWith("ROLE_") ? a.substring(5) : a).collect(Collectors.toSet());
        return entries.stream().filter(e -> e.roles().stream().anyMatch(roles::contains)).toList();
    }
}
