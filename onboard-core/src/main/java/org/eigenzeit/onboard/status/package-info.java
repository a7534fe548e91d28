/**
 * The one status vocabulary of the onboard core: integer codes returned instead of exceptions.
 *
 * <p>Every hot-path method of the core returns one of the codes in {@link
 * org.eigenzeit.onboard.status.Status}; callers must check it.
 */
package org.eigenzeit.onboard.status;
