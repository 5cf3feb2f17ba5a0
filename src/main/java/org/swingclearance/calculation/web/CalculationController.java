package org.swingclearance.calculation.web;

import jakarta.validation.Valid;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;
import org.swingclearance.calculation.Calculations;

/** The calculations API for integrations: demand and envelope of a configuration, JSON in SI units. */
@RestController
@RequestMapping("/api/v1/calculations")
@PreAuthorize("hasAnyRole('CLINICIAN', 'TRAINER', 'MANAGER', 'ADMIN')")
class CalculationController {

    private final Calculations calculations;

    CalculationController(Calculations calculations) {
        this.calculations = calculations;
    }

    @PostMapping("/demand")
    DemandResponse demand(@Valid @RequestBody DemandRequest request) {
        return DemandResponse.of(calculations.demand(request.toConfiguration()));
    }

    @PostMapping("/envelope")
    EnvelopeResponse envelope(@Valid @RequestBody EnvelopeRequest request) {
        return EnvelopeResponse.of(calculations.envelope(request.toConfiguration(), request.toCapacity(),
                request.toRules()));
    }
}
