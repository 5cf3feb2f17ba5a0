package org.swingclearance.identity.web;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

/** The sign-in page; Spring Security handles the POST. */
@Controller
class LoginController {

    @GetMapping("/login")
    String login() {
        return "identity/login";
    }
}
