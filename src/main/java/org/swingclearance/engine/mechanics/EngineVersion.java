package org.swingclearance.engine.mechanics;

/** The version of the mechanics model; stored with every snapshot so a signed result can be reproduced. */
public final class EngineVersion {

    /**
     * Raised whenever a formula, a constant or a default of the model changes in a way that can change a number.
     * Format: model name, then semantic version.
     */
    public static final String ENGINE_VERSION = "swing-mechanics 1.0.0";

    private EngineVersion() {
    }
}
