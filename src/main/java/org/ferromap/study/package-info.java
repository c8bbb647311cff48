/**
 * Study files: YAML reading, validation with a path for every problem, assembly into equipment and circuits.
 * May use: equipment, circuit, units, errors.
 */
package org.ferromap.study;
