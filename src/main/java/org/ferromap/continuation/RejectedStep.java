package org.ferromap.continuation;

/**
 * A refused continuation step.
 *
 * @param fromIndex index of the accepted point the step started from
 * @param reason why it was refused
 * @param stepSize the refused step, scaled arclength
 * @param p parameter at the point the step started from, units of p
 */
public record RejectedStep(int fromIndex, RejectionReason reason, double stepSize, double p) {
}
