package org.swingclearance.audit;

/** The file formats a manager can download checkpoints in. */
public enum ExportFormat {
    CSV, JSON
}
