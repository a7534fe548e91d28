/** Campaign outputs: plots (PNG and SVG, JFreeChart and JFreeSVG) and the self-contained HTML report. */
package org.eigenzeit.ground.report;
