package org.swingclearance.identity.web;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.security.core.context.SecurityContext;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.web.context.HttpSessionSecurityContextRepository;
import org.springframework.security.web.context.SecurityContextRepository;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import org.swingclearance.identity.StaffAccounts;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.identity.UnitSystem;

/** The signed-in user's own preferences (units shown beside the metric values). */
@Controller
@RequestMapping("/account")
class AccountController {

    private final StaffAccounts staff;
    private final UserDetailsService users;
    private final SecurityContextRepository contexts = new HttpSessionSecurityContextRepository();

    AccountController(StaffAccounts staff, UserDetailsService users) {
        this.staff = staff;
        this.users = users;
    }

    @GetMapping
    String show(@AuthenticationPrincipal StaffPrincipal me, Model model) {
        model.addAttribute("unitSystems", UnitSystem.values());
        model.addAttribute("current", me.staff().unitSystem());
        return "identity/account";
    }

    @PostMapping("/units")
    String units(@AuthenticationPrincipal StaffPrincipal me, @RequestParam UnitSystem unitSystem,
                 HttpServletRequest request, HttpServletResponse response, RedirectAttributes redirect) {
        staff.setUnitSystem(me.staff(), unitSystem);
        // Refresh the principal held in the session so the new preference shows at once.
        StaffPrincipal refreshed = (StaffPrincipal) users.loadUserByUsername(me.getUsername());
        refreshed.eraseCredentials();
        SecurityContext context = SecurityContextHolder.createEmptyContext();
        context.setAuthentication(UsernamePasswordAuthenticationToken.authenticated(refreshed, null,
                refreshed.getAuthorities()));
        SecurityContextHolder.setContext(context);
        contexts.saveContext(context, request, response);
        redirect.addFlashAttribute("flash", "account.saved");
        return "redirect:/account";
    }
}
