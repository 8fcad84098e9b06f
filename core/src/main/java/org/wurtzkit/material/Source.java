package org.wurtzkit.material;

import org.wurtzkit.errors.Require;

/**
 * A bibliographic source of parameter values.
 *
 * @param key      short key used in data files, e.g. "VM03"
 * @param citation full citation: authors, journal, volume, page, year
 * @param note     how the value was taken (e.g. "from memory, check against the original"); may be empty
 */
public record Source(String key, String citation, String note) {
    /**
     * Creates the record and checks that key and citation are present.
     *
     * @param key      short key used in data files, e.g. "VM03"
     * @param citation full citation: authors, journal, volume, page, year
     * @param note     how the value was taken (e.g. "from memory, check against the original"); may be empty
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     */
    public Source {
        Require.nonNull("source key", key);
        Require.nonNull("source citation", citation);
        if (key.isBlank()) {
            throw new org.wurtzkit.errors.InvalidParameterException("source key", "\"\"", "(non-blank text)");
        }
        note = note == null ? "" : note;
    }

    /**
     * A source for user-supplied values (a team's own measurement).
     *
     * @param key      short key
     * @param citation free text naming where the value comes from
     * @return the source
     */
    public static Source of(String key, String citation) {
        return new Source(key, citation, "");
    }

    @Override
    public String toString() {
        return key + ": " + citation + (note.isEmpty() ? "" : " (" + note + ")");
    }
}
