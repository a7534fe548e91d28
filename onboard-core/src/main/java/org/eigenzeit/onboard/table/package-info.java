/**
 * Parameter tables of the servo: uploaded as bytes into an inactive buffer, CRC-32C- and
 * range-checked, then activated by an explicit call.
 */
package org.eigenzeit.onboard.table;
