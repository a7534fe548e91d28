/**
 * The review evidence package: reads the requirements file, the test reports of every module and
 * the coverage and mutation reports of onboard-core, judges each requirement's measured value
 * against its criterion, and writes the package (HTML, Markdown, CSV, plots, environment,
 * checksums of the inputs). Run through {@code scripts/evidence.sh}; see docs/verification.md.
 */
package org.eigenzeit.verification.evidence;
