package org.swingclearance.envelope;

import java.util.List;

/**
 * What an envelope computation produced: the rows, the notes about what was not checked (message keys), and the
 * engine's plain statements of the model it used.
 */
public record EnvelopeOutputs(List<EnvelopeRow> rows, List<String> noteKeys, List<String> modelStatements) {

    public EnvelopeOutputs {
        rows = List.copyOf(rows);
        noteKeys = List.copyOf(noteKeys);
        modelStatements = List.copyOf(modelStatements);
    }
}
