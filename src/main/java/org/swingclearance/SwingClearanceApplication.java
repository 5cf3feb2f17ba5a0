package org.swingclearance;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;

/** Starts the Swing Clearance web application. */
@SpringBootApplication
public class SwingClearanceApplication {

    public static void main(String[] args) {
        SpringApplication.run(SwingClearanceApplication.class, args);
    }
}
