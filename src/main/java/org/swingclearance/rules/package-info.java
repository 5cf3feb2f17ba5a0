/**
 * The clinic's practice rules (Contract R): versioned rule sets of thresholds that cap load bands, each with its
 * source and evidence tag, plus the band fractions, constraint settings, plan defaults and scoring conventions.
 * Every edit inserts a complete new version (the database refuses UPDATE and DELETE); every clinic gets the
 * engine's default rules as version 1 the first time its rules are needed.
 */
package org.swingclearance.rules;
