/**
 * The picocli command line: one class per verb, each a set of options and one call into the layers above; exit codes.
 * May use: everything.
 */
package org.ferromap.cli;
