package org.ferromap.study;

import org.ferromap.errors.MessageKey;

/**
 * One thing wrong with a study file.
 *
 * @param file the file as given (or a name for text read from elsewhere)
 * @param path where in the file, dotted keys and zero-based list indices, e.g.
 *        {@code circuit.magnetizing.rms-test[2].current}; empty for the file as a whole
 * @param value the offending value as written, or empty when a key is missing
 * @param allowed what would have been accepted, in words
 * @param key the catalogue entry (tests check this, not the wording)
 */
public record Problem(String file, String path, String value, String allowed, MessageKey key) {

    /** One line: {@code file: path: 'value' is not allowed; expected ...}. */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        sb.append(file).append(": ");
        if (!path.isEmpty()) {
            sb.append(path).append(": ");
        }
        if (!value.isEmpty()) {
            sb.append('\'').append(value).append("' ");
        }
        sb.append(allowed);
        return sb.toString();
    }
}
