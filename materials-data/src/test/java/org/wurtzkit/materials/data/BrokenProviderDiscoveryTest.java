package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.ParameterSetProvider;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.materials.data.discovery.EagerTypoLabSets;
import org.wurtzkit.materials.data.discovery.LateLabSets;
import org.wurtzkit.materials.data.discovery.TypoLabSets;

/**
 * Discovery survives a broken team provider, and {@link ParameterSets#reload()} picks up a provider
 * added later. Each "jar" is a temporary directory holding only a
 * {@code META-INF/services/org.wurtzkit.material.ParameterSetProvider} file, seen through a
 * {@link URLClassLoader} whose parent is the test class path (where the provider classes live).
 */
class BrokenProviderDiscoveryTest {
    @TempDir
    Path tmp;

    @AfterEach
    void backToTheTestClassPath() {
        ParameterSets.reload(ParameterSets.class.getClassLoader());
    }

    private URLClassLoader jar(String dir, Class<?>... providers) throws IOException {
        Path services = tmp.resolve(dir).resolve("META-INF/services");
        Files.createDirectories(services);
        StringBuilder sb = new StringBuilder("# written by BrokenProviderDiscoveryTest\n");
        for (Class<?> p : providers) {
            sb.append(p.getName()).append('\n');
        }
        Files.writeString(services.resolve(ParameterSetProvider.class.getName()), sb, StandardCharsets.UTF_8);
        return new URLClassLoader(new URL[] {tmp.resolve(dir).toUri().toURL()}, getClass().getClassLoader());
    }

    @Test
    void brokenProvidersLeaveTheDefaultSetWorkingAndReportTheTypoWithKeyAndLine() throws IOException {
        try (URLClassLoader loader = jar("broken", TypoLabSets.class, EagerTypoLabSets.class)) {
            for (int pass = 0; pass < 2; pass++) { // the second pass: the eager class is now unusable in this JVM
                ParameterSets.reload(loader);
                assertSame(BuiltInParameterSets.vurgaftmanMeyer2003(), ParameterSets.defaultSet());
                assertSame(BuiltInParameterSets.ambacher2002(), ParameterSets.named("ambacher-2002"));
                assertTrue(ParameterSets.names().contains(TypoLabSets.NAME + ParameterSets.BROKEN_SUFFIX),
                        ParameterSets.names().toString());
                assertTrue(ParameterSets.names().contains(EagerTypoLabSets.NAME + ParameterSets.BROKEN_SUFFIX),
                        ParameterSets.names().toString());
                assertFalse(ParameterSets.all().stream().anyMatch(s -> s.name().contains("typo")));
                for (String name : new String[] {TypoLabSets.NAME, EagerTypoLabSets.NAME}) {
                    WurtzkitException e = assertThrows(WurtzkitException.class, () -> ParameterSets.named(name));
                    assertEquals(ErrorKind.MALFORMED_DATA, e.kind(), e.getMessage());
                    ParameterSetFormatException cause = assertInstanceOf(ParameterSetFormatException.class,
                            e.getCause(), "pass " + pass + ": " + e.getMessage());
                    assertEquals(name + ".json", cause.fileName());
                    assertEquals("binaries.GaN.C31", cause.key());
                    int line = TestText.lineOfKey(TestText.resource(TestText.TEAM_FILE), "GaN", "C13", 1);
                    assertEquals(line, cause.line());
                    assertTrue(e.getMessage().contains("\"" + name + ".json\"") && e.getMessage().contains(
                            "line " + line) && e.getMessage().contains("binaries.GaN.C31"), e.getMessage());
                }
            }
        }
    }

    @Test
    void reloadFindsAProviderAddedLater() throws IOException {
        WurtzkitException before = assertThrows(WurtzkitException.class, () -> ParameterSets.named(LateLabSets.NAME));
        assertEquals(ErrorKind.UNKNOWN_PARAMETER_SET, before.kind());
        try (URLClassLoader loader = jar("late", LateLabSets.class)) {
            ParameterSets.reload(loader);
            assertEquals(LateLabSets.NAME, ParameterSets.named(LateLabSets.NAME).name());
            assertTrue(ParameterSets.brokenProviders().isEmpty(), ParameterSets.brokenProviders().toString());
        }
    }

    @Test
    void reloadWithoutArgumentsSearchesTheContextClassLoader() throws IOException {
        Thread t = Thread.currentThread();
        ClassLoader saved = t.getContextClassLoader();
        try (URLClassLoader loader = jar("context", LateLabSets.class)) {
            t.setContextClassLoader(loader);
            ParameterSets.reload();
            assertTrue(ParameterSets.names().contains(LateLabSets.NAME), ParameterSets.names().toString());
        } finally {
            t.setContextClassLoader(saved);
        }
    }

    @Test
    void aServicesEntryWithoutItsClassIsReportedAndSkipped() throws IOException {
        Path services = tmp.resolve("missing").resolve("META-INF/services");
        Files.createDirectories(services);
        Files.writeString(services.resolve(ParameterSetProvider.class.getName()),
                "org.example.NoSuchProvider\n" + LateLabSets.class.getName() + "\n", StandardCharsets.UTF_8);
        try (URLClassLoader loader = new URLClassLoader(new URL[] {tmp.resolve("missing").toUri().toURL()},
                getClass().getClassLoader())) {
            ParameterSets.reload(loader);
            assertEquals(LateLabSets.NAME, ParameterSets.named(LateLabSets.NAME).name());
            assertEquals(1, ParameterSets.brokenProviders().size(), ParameterSets.brokenProviders().toString());
            assertTrue(ParameterSets.brokenProviders().get(0).message().contains("org.example.NoSuchProvider"),
                    ParameterSets.brokenProviders().toString());
            assertSame(BuiltInParameterSets.vurgaftmanMeyer2003(), ParameterSets.defaultSet());
        }
    }
}
