/**
 * The profile tool: grids sampled along a line drawn on the map, with track samples near the line,
 * charted with JFreeChart. {@link org.halyard.ui.profile.ProfileSampler} is headless and testable.
 */
package org.halyard.ui.profile;
