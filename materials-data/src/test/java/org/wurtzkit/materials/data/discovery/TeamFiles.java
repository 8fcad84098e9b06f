package org.wurtzkit.materials.data.discovery;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import org.wurtzkit.materials.data.FileParameterSet;
import org.wurtzkit.materials.data.JsonParameterSetReader;

/**
 * Builds the files of the discovery test's providers from the valid team fixture
 * {@code example-lab-2025.json}: a copy under another set name, optionally with a typo (the key
 * {@code "C13"} of GaN typed as {@code "C31"}).
 */
final class TeamFiles {
    private TeamFiles() {
    }

    static FileParameterSet read(String setName, boolean typo) {
        String text;
        try (InputStream in = TeamFiles.class.getResourceAsStream("/org/wurtzkit/materials/data/example-lab-2025.json")) {
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        text = text.replace("\"name\": \"example-lab-2025\"", "\"name\": \"" + setName + "\"");
        if (typo) {
            // the first "C13" of the file is GaN's
            text = text.replaceFirst("\"C13\":", "\"C31\":");
        }
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        return JsonParameterSetReader.read(() -> new ByteArrayInputStream(bytes), setName + ".json");
    }
}
