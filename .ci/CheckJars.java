// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.jar.JarFile;
import java.util.zip.ZipEntry;

/**
 * Checks built jars (run by .ci/run as a single-file program: java .ci/CheckJars.java ROOT
 * JAR=MODULE_NAME ...). Each jar must hold META-INF/LICENSE identical to ROOT/LICENSE,
 * META-INF/NOTICE identical to ROOT/NOTICE, and the expected Automatic-Module-Name in its
 * manifest. Prints one line per jar and exits 1 on the first jar that fails.
 */
public final class CheckJars {
    private CheckJars() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length < 2) {
            System.err.println("usage: java .ci/CheckJars.java ROOT JAR=MODULE_NAME...");
            System.exit(2);
        }
        Path root = Path.of(args[0]);
        byte[] license = Files.readAllBytes(root.resolve("LICENSE"));
        byte[] notice = Files.readAllBytes(root.resolve("NOTICE"));
        List<String> problems = new ArrayList<>();
        for (String spec : Arrays.asList(args).subList(1, args.length)) {
            int eq = spec.lastIndexOf('=');
            if (eq < 0) {
                System.err.println("argument without '=MODULE_NAME': " + spec);
                System.exit(2);
            }
            Path jar = Path.of(spec.substring(0, eq));
            String moduleName = spec.substring(eq + 1);
            List<String> here = new ArrayList<>();
            try (JarFile jf = new JarFile(jar.toFile())) {
                compare(jf, "META-INF/LICENSE", license, here);
                compare(jf, "META-INF/NOTICE", notice, here);
                String name = jf.getManifest() == null ? null
                        : jf.getManifest().getMainAttributes().getValue("Automatic-Module-Name");
                if (!moduleName.equals(name)) {
                    here.add("Automatic-Module-Name is " + name + ", expected " + moduleName);
                }
            }
            System.out.println(jar.getFileName() + ": " + (here.isEmpty() ? "LICENSE, NOTICE, " + moduleName + " ok"
                    : String.join("; ", here)));
            problems.addAll(here);
        }
        if (!problems.isEmpty()) {
            System.exit(1);
        }
    }

    private static void compare(JarFile jf, String entry, byte[] expected, List<String> problems) throws IOException {
        ZipEntry e = jf.getEntry(entry);
        if (e == null) {
            problems.add(entry + " missing");
            return;
        }
        try (InputStream in = jf.getInputStream(e)) {
            if (!Arrays.equals(in.readAllBytes(), expected)) {
                problems.add(entry + " differs from the file at the repository root");
            }
        }
    }
}
