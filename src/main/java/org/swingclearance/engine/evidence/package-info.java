/**
 * Where a formula or threshold comes from: the published work, its evidence tag and confidence as the clinical
 * reference labels them ({@link org.swingclearance.engine.evidence.Citation},
 * {@link org.swingclearance.engine.evidence.Citations}). Shared by scoring, practice rules and load monitoring so a
 * number on screen can always name its source.
 */
package org.swingclearance.engine.evidence;
