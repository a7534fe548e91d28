package org.eigenzeit.ground.campaign;

import org.eigenzeit.ground.pipeline.RunResult;

/**
 * A finished run as stored in {@code runs/<run>/seed-<n>/summary.json}: its key and the summary.
 *
 * @param runKey {@link RunSpec#key}: a stored run is reused only under an equal key
 * @param scenarioHash SHA-256 of the scenario's canonical form
 * @param codeFingerprint the code's fingerprint when the run was made
 * @param result the run's summary
 */
public record StoredRun(String runKey, String scenarioHash, String codeFingerprint, RunResult result) {}
