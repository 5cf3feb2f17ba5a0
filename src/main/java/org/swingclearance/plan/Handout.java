package org.swingclearance.plan;

/** A rendered PDF handout and the file name to offer it under. */
public record Handout(String fileName, byte[] pdf) {
}
