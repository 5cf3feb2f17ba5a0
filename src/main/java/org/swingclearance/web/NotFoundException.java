package org.swingclearance.web;

import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ResponseStatus;

/**
 * A record that does not exist, or that belongs to another clinic or was not shared with the caller: all
 * three answer 404, so a caller cannot learn which records exist elsewhere.
 */
@ResponseStatus(HttpStatus.NOT_FOUND)
public class NotFoundException extends RuntimeException {

    public NotFoundException(String what) {
        super(what + " not found");
    }
}
