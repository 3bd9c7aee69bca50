/**
 * The whole job in one call: a {@link org.halyard.pipeline.Recipe} (CONTRACT.md) run stage by stage from
 * raw lines to deliverables by {@link org.halyard.pipeline.SurveyRun}. Stages only connect the kernels of
 * the other packages; no numerical method lives here.
 */
package org.halyard.pipeline;
