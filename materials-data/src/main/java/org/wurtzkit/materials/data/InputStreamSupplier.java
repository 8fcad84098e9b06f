package org.wurtzkit.materials.data;

import java.io.IOException;
import java.io.InputStream;

/**
 * Opens a fresh stream on a parameter-set file each time it is called. The reader closes the
 * stream it gets. Typical suppliers: {@code () -> Files.newInputStream(path)} or
 * {@code () -> MyProvider.class.getResourceAsStream("my-set.json")} (a null stream is reported as
 * a missing file).
 */
@FunctionalInterface
public interface InputStreamSupplier {
    /**
     * @return a new stream positioned at the start of the file, or null if the file does not exist
     * @throws IOException if the file cannot be opened
     */
    InputStream open() throws IOException;
}
