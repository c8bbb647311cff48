/**
 * The message catalogue and the single unchecked exception every layer throws.
 * May use: nothing of ours. Everything else may use it.
 */
package org.ferromap.errors;
