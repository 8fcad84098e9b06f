package org.wurtzkit.materials.data;

import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;

/**
 * A stack file ({@link StructureJson}) or a provenance file that cannot be read: names the file, the
 * key path (dotted, with array indices, e.g. {@code layersFromSurface[1].thickness.unit}), the line
 * and what is wrong. {@link #reason()} says which kind of problem it is, so a program can tell a
 * typo from a parameter set that changed.
 */
public class StructureFormatException extends WurtzkitException {
    private static final long serialVersionUID = 1L;

    /** The kinds of problem. */
    public enum Reason {
        /** Not JSON, truncated, empty, or a key given twice. */
        SYNTAX,
        /** A key the format version does not define. */
        UNKNOWN_KEY,
        /** A required key is absent. */
        MISSING_KEY,
        /** A value of the wrong JSON type or an unknown choice (e.g. a polarity that does not exist). */
        WRONG_VALUE,
        /** A quantity without its unit. */
        MISSING_UNIT,
        /** A unit that the quantity does not accept. */
        UNKNOWN_UNIT,
        /** A value the structure's builder rejects (out of its allowed range). */
        INVALID_VALUE,
        /** A format version this reader does not know. */
        UNSUPPORTED_VERSION,
        /** The parameter set named by the file is not registered with the reader. */
        UNKNOWN_PARAMETER_SET,
        /**
         * The parameter set's values differ from those whose hash the file records (someone changed
         * the data); {@link StructureJson.Reader#acceptChangedParameterSet()} reads it anyway.
         */
        CHANGED_PARAMETER_SET,
        /** The structure cannot be written in this format version. */
        NOT_WRITABLE
    }

    /** The file (or origin) read. */
    private final String fileName;
    /** Dotted key path of the problem. */
    private final String keyPath;
    /** 1-based line of the problem, or 0 when unknown. */
    private final int line;
    /** What kind of problem it is. */
    private final Reason reason;
    /** The problem in words. */
    private final String problem;

    /**
     * @param fileName the file (or origin) read
     * @param keyPath  dotted key path of the problem, "(root)" for the whole document
     * @param line     1-based line, or 0 when there is none
     * @param reason   kind of problem
     * @param problem  what is wrong and what is allowed
     * @param cause    underlying exception, or null
     */
    public StructureFormatException(String fileName, String keyPath, int line, Reason reason, String problem,
            Throwable cause) {
        super(reason == Reason.UNKNOWN_PARAMETER_SET ? ErrorKind.UNKNOWN_PARAMETER_SET
                : reason == Reason.NOT_WRITABLE ? ErrorKind.INVALID_STRUCTURE : ErrorKind.MALFORMED_DATA,
                "file \"" + fileName + "\", key \"" + keyPath + "\"" + (line > 0 ? ", line " + line : "") + ": "
                        + problem,
                cause);
        this.fileName = fileName;
        this.keyPath = keyPath;
        this.line = line;
        this.reason = reason;
        this.problem = problem;
    }

    /** {@return the file (or origin) that was read} */
    public String fileName() {
        return fileName;
    }

    /** {@return the dotted key path of the problem} */
    public String keyPath() {
        return keyPath;
    }

    /** {@return the 1-based line, or 0} */
    public int line() {
        return line;
    }

    /** {@return the kind of problem} */
    public Reason reason() {
        return reason;
    }

    /** {@return what is wrong, without file, key and line} */
    public String problem() {
        return problem;
    }
}
