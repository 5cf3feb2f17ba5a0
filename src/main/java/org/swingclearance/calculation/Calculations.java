package org.swingclearance.calculation;

import org.springframework.stereotype.Service;
import org.swingclearance.engine.envelope.Envelope;
import org.swingclearance.engine.envelope.EnvelopeCalculator;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.Demand;
import org.swingclearance.engine.mechanics.DemandCalculator;
import org.swingclearance.engine.mechanics.LoadRules;

/**
 * The calculations feature's application service: runs the engine on validated inputs. Stateless; no database,
 * so no transaction and no tenant scope (the inputs name no patient).
 */
@Service
public class Calculations {

    /** The demand of one configuration. */
    public Demand demand(Configuration configuration) {
        return DemandCalculator.calculate(configuration);
    }

    /** The assessment at the configuration and its three limits. */
    public Envelope envelope(Configuration configuration, Capacity capacity, LoadRules rules) {
        return EnvelopeCalculator.envelope(configuration, capacity, rules);
    }
}
