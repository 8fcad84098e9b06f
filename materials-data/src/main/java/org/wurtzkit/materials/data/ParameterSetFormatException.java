package org.wurtzkit.materials.data;

import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.NamedSetFailure;

/**
 * A parameter-set data file cannot be turned into a parameter set: it is not well-formed JSON, a
 * value is missing, duplicated, not a number or out of its physical range, a key is unknown, or a
 * value cites a source that is not in the file's bibliography.
 *
 * <p>The message always names the set, the file, the key (a dotted path such as
 * {@code binaries.GaN.C13}) and the line, e.g.
 * {@code parameter set "lab-2025", file "lab-2025.json", key "binaries.GaN.C13", line 41: value
 * must be a JSON number, found the string "106 GPa"}. The same items are available through
 * {@link #setName()}, {@link #fileName()}, {@link #key()}, {@link #line()} and
 * {@link #problem()}. The kind is always {@link ErrorKind#MALFORMED_DATA}.
 */
public class ParameterSetFormatException extends WurtzkitException implements NamedSetFailure {
    private static final long serialVersionUID = 1L;

    /** Set name used in messages when the file fails before its {@code "name"} could be read. */
    public static final String UNNAMED = "(name not read)";

    /** @serial the set's name, or {@link #UNNAMED} */
    private final String setName;
    /** @serial the file name given to the reader */
    private final String fileName;
    /** @serial dotted path of the offending key */
    private final String key;
    /** @serial 1-based line, or 0 */
    private final int line;
    /** @serial what is wrong */
    private final String problem;

    /**
     * @param setName  the set's name as far as it could be read ({@link #UNNAMED} if not)
     * @param fileName the file name given to the reader
     * @param key      dotted path of the offending key, e.g. "binaries.GaN.C13" ("(root)" for the
     *                 whole file)
     * @param line     1-based line number in the file, or 0 if the failure has no line (I/O)
     * @param problem  what is wrong, in one English sentence without the location
     * @param cause    the underlying failure, or null
     */
    public ParameterSetFormatException(String setName, String fileName, String key, int line, String problem,
            Throwable cause) {
        super(ErrorKind.MALFORMED_DATA, format(setName, fileName, key, line, problem), cause);
        this.setName = setName;
        this.fileName = fileName;
        this.key = key;
        this.line = line;
        this.problem = problem;
    }

    private static String format(String setName, String fileName, String key, int line, String problem) {
        return "parameter set \"" + setName + "\", file \"" + fileName + "\", key \"" + key + "\""
                + (line > 0 ? ", line " + line : ", no line (the file could not be read)") + ": " + problem;
    }

    /** {@return the set's name, or {@link #UNNAMED} if the file failed before its name was read} */
    @Override
    public String setName() {
        return setName;
    }

    /** {@return the file name given to the reader} */
    public String fileName() {
        return fileName;
    }

    /** {@return dotted path of the offending key, e.g. "binaries.GaN.C13"} */
    public String key() {
        return key;
    }

    /** {@return 1-based line number of the offending token, or 0 if the file could not be read at all} */
    public int line() {
        return line;
    }

    /** {@return what is wrong, without the location prefix} */
    public String problem() {
        return problem;
    }
}
