package dev.positioner.trace;

import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;

/**
 * Not a test: a main that writes a long synthetic trace to a temporary CSV file, then reads,
 * analyses and decimates it for a plot in one streaming pass, printing elapsed time and heap
 * figures. Run it at two lengths to see that memory does not follow length, e.g.
 * {@code java -Xmx32m -cp target/classes:target/test-classes dev.positioner.trace.TraceBenchmark
 * 100000 1000000}.
 *
 * <p>The trace repeats a 20-minute pattern at 5 samples/s: four steps into a 1.5 s lag, a
 * stretch of hunting at steady input, and slow ramps through a 2 % backlash, with a controller
 * output column and noise, so every analyser has work to do.
 */
public final class TraceBenchmark {

    private static final int CYCLE = 6000;

    private TraceBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        long[] sizes = args.length == 0 ? new long[] {1_000_000} : new long[args.length];
        for (int i = 0; i < args.length; i++) {
            sizes[i] = Long.parseLong(args[i]);
        }
        for (long n : sizes) {
            Path csv = Files.createTempFile("trace-benchmark", ".csv");
            try {
                long g0 = System.nanoTime();
                write(csv, n);
                long genMs = (System.nanoTime() - g0) / 1_000_000;
                for (int run = 1; run <= 2; run++) {
                    measure(csv, n, genMs, run);
                }
                analyseOnly(n);
            } finally {
                Files.deleteIfExists(csv);
            }
        }
    }

    private static void measure(Path csv, long n, long genMs, int run) throws IOException {
        System.gc();
        long before = used();
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            p.resetPeakUsage();
        }
        long t0 = System.nanoTime();
        long c0 = cpu();
        TraceAnalyser analyser = new TraceAnalyser(TraceAnalysisOptions.defaults());
        PlotDecimator plot = new PlotDecimator();
        TraceSummary summary;
        try (BufferedReader r = Files.newBufferedReader(csv, StandardCharsets.UTF_8)) {
            summary = new TraceCsvReader().read(r, analyser.andThen(plot));
        }
        TraceAnalysis result = analyser.finish();
        String svg = TraceSvg.render(plot.finish(), result);
        long ms = (System.nanoTime() - t0) / 1_000_000;
        long cpuMs = (cpu() - c0) / 1_000_000;
        long peak = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                peak += p.getPeakUsage().getUsed();
            }
        }
        System.gc();
        long retained = used() - before;
        System.out.printf("samples=%d file=%.1f MB run=%d: generate %d ms, parse+analyse+plot %d ms "
                        + "wall, %d ms CPU of this thread; heap peak during run %.1f MB (incl. "
                        + "garbage not yet collected), retained after GC %.2f MB, max heap %.0f MB%n",
                summary.sampleCount(), Files.size(csv) / 1e6, run, genMs, ms, cpuMs,
                peak / 1e6, retained / 1e6,
                Runtime.getRuntime().maxMemory() / 1e6);
        System.out.printf("  steps=%d oscillation=%s deadBand=%.2f%% stiction=%s svg=%d chars%n",
                result.stepCount(), result.oscillation().detected(),
                result.deadBand().deadBandPercent(), result.stiction().verdict(), svg.length());
        if (result.summary().sampleCount() != n) {
            throw new IllegalStateException("read " + result.summary().sampleCount());
        }
    }

    /**
     * Analysis alone: one 20-minute cycle of the trace (6000 samples) is made once and replayed
     * with shifted times, so neither parsing nor the generator's random numbers are timed.
     */
    private static void analyseOnly(long n) {
        java.util.List<Sample> one = new java.util.ArrayList<>();
        generate(CYCLE, one::add);
        Sample[] cycle = one.toArray(new Sample[0]);
        long t0 = System.nanoTime();
        long c0 = cpu();
        TraceAnalyser analyser = new TraceAnalyser(TraceAnalysisOptions.defaults());
        PlotDecimator plot = new PlotDecimator();
        SampleConsumer both = analyser.andThen(plot);
        for (long k = 0; k < n; k++) {
            Sample s = cycle[(int) (k % CYCLE)];
            both.accept(new Sample(s.time() + (k / CYCLE) * CYCLE * 0.2, s.input(), s.position(),
                    s.controllerOutput(), s.processValue()));
        }
        TraceAnalysis r = analyser.finish();
        plot.finish();
        System.out.printf("  analyse+plot only (no parsing): %d ms wall, %d ms CPU for %d samples%n",
                (System.nanoTime() - t0) / 1_000_000, (cpu() - c0) / 1_000_000,
                r.summary().sampleCount());
    }

    /** CPU time of this thread: less at the mercy of other work on a shared machine. */
    private static long cpu() {
        return ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
    }

    private static long used() {
        Runtime rt = Runtime.getRuntime();
        return rt.totalMemory() - rt.freeMemory();
    }

    /** The synthetic trace, streamed: the same samples for the CSV and the in-memory run. */
    static void generate(long n, SampleConsumer out) {
        Random rnd = new Random(2024);
        double y = 40;
        double x = 40;
        for (long k = 0; k < n; k++) {
            double t = k * 0.2;
            double c = t % 1200;
            double u;
            if (c < 120) {
                u = c < 30 ? 40 : c < 60 ? 50 : c < 90 ? 45 : 55;
            } else if (c < 400) {
                u = 55;
            } else {
                double ph = ((c - 400) % 400) / 200;
                u = ph <= 1 ? 55 - 40 * ph : 15 + 40 * (ph - 1);
            }
            if (u > x + 1) {
                x = u - 1;
            } else if (u < x - 1) {
                x = u + 1;
            }
            double target = c < 400 ? u : x;
            y += (target - y) * 0.2 / 1.5;
            double hunt = c > 150 && c < 380 ? 1.5 * Math.sin(2 * Math.PI * c / 9) : 0;
            double un = u + 0.03 * rnd.nextGaussian();
            out.accept(new Sample(t, un, y + hunt + 0.05 * rnd.nextGaussian(), un, Double.NaN));
        }
    }

    private static void write(Path csv, long n) throws IOException {
        try (Writer w = new BufferedWriter(Files.newBufferedWriter(csv, StandardCharsets.UTF_8),
                1 << 16)) {
            w.write("t,input,position,controller_output\n");
            StringBuilder line = new StringBuilder(64);
            generate(n, s -> {
                line.setLength(0);
                fixed(line, s.time(), 1).append(',');
                fixed(line, s.input(), 3).append(',');
                fixed(line, s.position(), 3).append(',');
                fixed(line, s.controllerOutput(), 3).append('\n');
                try {
                    w.append(line);
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
            });
        }
    }

    /** Fixed-point formatting without String.format, which would dominate the write time. */
    private static StringBuilder fixed(StringBuilder b, double v, int decimals) {
        long scale = decimals == 1 ? 10 : 1000;
        long q = Math.round(v * scale);
        if (q < 0) {
            b.append('-');
            q = -q;
        }
        b.append(q / scale).append('.');
        String frac = Long.toString(q % scale);
        for (int i = frac.length(); i < decimals; i++) {
            b.append('0');
        }
        return b.append(frac);
    }
}
