/**
 * Equipment models: saturation curves (the magnetizing characteristic), transformers, cables, the open-phase case. SI inside.
 * May use: units, errors.
 */
package org.ferromap.equipment;
