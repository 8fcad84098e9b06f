package org.wurtzkit.provenance;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;

/**
 * The version of the library that is running, read once from the resource
 * {@code org/wurtzkit/provenance/version.properties}, which the build fills with the Maven project
 * version (resource filtering), so that it is right both in the jar and when tests run from classes.
 */
public final class LibraryVersion {
    private static final String VERSION = load();

    private LibraryVersion() {
    }

    /** {@return the library version, e.g. "0.1.0-SNAPSHOT"} */
    public static String get() {
        return VERSION;
    }

    private static String load() {
        try (InputStream in = LibraryVersion.class.getResourceAsStream("version.properties")) {
            if (in == null) {
                throw new AssertionError("the build did not package org/wurtzkit/provenance/version.properties");
            }
            Properties p = new Properties();
            p.load(in);
            String v = p.getProperty("version");
            if (v == null || v.isBlank() || v.startsWith("${")) {
                throw new AssertionError("version.properties was not filtered by the build: version = " + v);
            }
            return v;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the packaged library version", e);
        }
    }
}
