/**
 * The computation engine: plain Java only (no Spring, Jakarta, Hibernate, clock or I/O; guarded by
 * ArchitectureTests). Body, club, swing pattern, demand, capacity, envelope inversions, plan search,
 * screening scores and training-load monitoring. SI units inside; every result carries its inputs' provenance.
 */
package org.swingclearance.engine;
