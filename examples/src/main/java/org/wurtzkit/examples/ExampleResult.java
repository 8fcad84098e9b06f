package org.wurtzkit.examples;

import java.nio.file.Path;
import java.util.List;

/** What every example returns: the files it wrote and the lines of its summary. */
interface ExampleResult {
    /** @return the PNG and CSV files written, in the order written */
    List<Path> files();

    /** @return the summary, one line each, as printed */
    List<String> summary();
}
