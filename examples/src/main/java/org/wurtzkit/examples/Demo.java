package org.wurtzkit.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.materials.data.StructureJson;

/**
 * Runs the five examples one after the other in the invented scenario of {@link DemoLab} (the
 * fictional {@value DemoLab#LAB} and its wafer {@value DemoLab#WAFER}), shows their progress,
 * prints their summaries, writes the wafer's stack as JSON ({@value #STACK_FILE}, the format of
 * {@link StructureJson}) beside the plots, lists every file written with its size, and ends with
 * the 2DEG sheet density of the wafer's stack.
 *
 * <p>Run: {@code mvn -B -ntp -Pdemo -DskipTests package} from the repository root (writes into
 * {@code out/}), or {@code java -Djava.awt.headless=true -cp ... org.wurtzkit.examples.Demo [out] [--quick]}.
 */
public final class Demo {
    /** The file the demo writes the stack of wafer {@value DemoLab#WAFER} into. */
    public static final String STACK_FILE = "tnl-0731-stack.json";

    private Demo() {
    }

    /**
     * What the demo did.
     *
     * @param sheetDensityPerCm2 n_s of wafer {@value DemoLab#WAFER} at 0 V (cm^-2)
     * @param results            the five examples' results, in order
     * @param files              every file written, in order
     * @param summary            the closing lines printed (file list and n_s)
     */
    public record Result(double sheetDensityPerCm2, List<ExampleResult> results, List<Path> files,
            List<String> summary) implements ExampleResult {
    }

    /**
     * @param args {@code [output folder] [--quick]}
     * @throws IOException if a file cannot be written
     */
    public static void main(String[] args) throws IOException {
        ExampleArgs a = ExampleArgs.parse(args);
        run(a.createdOut(), a.quick(), System.out);
    }

    /**
     * Runs everything, printing as it goes.
     *
     * @param out   folder to write into (must exist)
     * @param quick small settings (for tests)
     * @param log   where progress and summaries go
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, boolean quick, PrintStream log) throws IOException {
        log.println("wurtzkit demo: " + DemoLab.INVENTED + ", wafer " + DemoLab.WAFER
                + (quick ? " (quick settings)" : ""));
        log.println("Every number below is a model estimate: confirm it by measurement, and handle high-voltage"
                + " devices under your lab's own safety rules.");
        long t0 = System.nanoTime();
        List<ExampleResult> results = new ArrayList<>();
        String[] titles = {"band diagram", "barrier design map", "cap-layer trade-off", "gate sweep",
            "parameter-set spread"};
        for (int k = 0; k < titles.length; k++) {
            log.println();
            log.println(String.format(Locale.ROOT, "[%d/%d] %s", k + 1, titles.length, titles[k]));
            ExampleResult r = switch (k) {
                case 0 -> BandDiagramExample.run(out, log);
                case 1 -> BarrierMapExample.run(out,
                        quick ? BarrierMapExample.Settings.quick() : BarrierMapExample.Settings.full(), log);
                case 2 -> CapTradeoffExample.run(out,
                        quick ? CapTradeoffExample.Settings.quick() : CapTradeoffExample.Settings.full(), log);
                case 3 -> GateSweepExample.run(out,
                        quick ? GateSweepExample.Settings.quick() : GateSweepExample.Settings.full(), log);
                default -> ParameterSpreadExample.run(out,
                        quick ? ParameterSpreadExample.Settings.quick() : ParameterSpreadExample.Settings.full(), log);
            };
            r.summary().forEach(log::println);
            results.add(r);
        }
        List<Path> files = new ArrayList<>();
        results.forEach(r -> files.addAll(r.files()));
        Path stack = out.resolve(STACK_FILE);
        StructureJson.writeFile(DemoLab.wafer(), stack); // invented demo data: the stack of the fictional wafer
        files.add(stack);
        double ns = ((BandDiagramExample.Result) results.get(0)).sheetDensityPerCm2();

        List<String> summary = new ArrayList<>();
        summary.add(String.format(Locale.ROOT, "Wrote %d files into %s in %.1f s:", files.size(),
                out.toAbsolutePath().normalize(), (System.nanoTime() - t0) / 1e9));
        for (Path f : files) {
            summary.add(String.format(Locale.ROOT, "  %-30s %9d bytes", f.getFileName(), Files.size(f)));
        }
        summary.add("2DEG sheet density of wafer " + DemoLab.WAFER + " (" + BandDiagramExample.describe(DemoLab.wafer())
                + ", 1.0 eV Schottky gate at 0 V): n_s = " + BandDiagramExample.formatSheetDensity(ns));
        log.println();
        summary.forEach(log::println);
        return new Result(ns, List.copyOf(results), List.copyOf(files), List.copyOf(summary));
    }
}
