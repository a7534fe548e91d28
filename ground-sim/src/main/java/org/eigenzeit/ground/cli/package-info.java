/** The command line: picocli commands of the ground simulator. */
package org.eigenzeit.ground.cli;
