package org.ferromap.study;

/**
 * The optional {@code map:} section of a study: one or two axes.
 *
 * @param x the first axis
 * @param y the second axis, or null for a one-parameter map
 */
public record MapSettings(MapAxis x, MapAxis y) {
}
