package org.nullpath.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.nullpath.report.Cells;
import org.nullpath.report.Table;
import org.nullpath.report.Tables;
import org.nullpath.schedule.MessageRow;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.infra.Blackhole;

/**
 * Writing numbers: one cell as text ({@link Cells#num}: nullpath's Schubfach, report.ShortestDecimal) against
 * jackson-core's copy of the same algorithm and Java 17's Double.toString on the same values, and a chunk of
 * 4096 message rows turned into CSV bytes (eleven columns, the link file's; numbers written straight into the
 * row's bytes, no String per cell).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@org.openjdk.jmh.annotations.State(Scope.Benchmark)
public class FormatBench {
    private static final int N = 4096;
    private final double[] values = new double[N];
    private final List<MessageRow> rows = new ArrayList<>();
    private Path file;
    private Table.Writer<MessageRow> writer;

    @Setup(Level.Trial)
    public void setUp() throws IOException {
        SplittableRandom r = new SplittableRandom(20261202);
        for (int i = 0; i < N; i++) {
            // values like a schedule's: clocks of up to 1e8 s, light times, factors near 1 and small offsets
            values[i] = switch (i % 4) {
                case 0 -> r.nextDouble() * 1e8;
                case 1 -> r.nextDouble() * 1e4;
                case 2 -> 1 - r.nextDouble() * 1e-3;
                default -> -r.nextDouble() * 1e-7;
            };
        }
        for (int i = 0; i < N; i++) {
            double t = i * 1.0000001;
            rows.add(new MessageRow(i + 1, t, t, Optional.of(new MessageRow.Delivery(t * 1.5, t * 1.25, t * 0.5,
                    values[(i + 2) % N], values[(i + 3) % N], 1.0000000163557319, 2.0000000280251307, Optional.empty()))));
        }
        file = Files.createTempFile("nullpath-bench", ".csv");
        writer = Tables.messages(Optional.empty(), Optional.empty()).open(file);
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        writer.close();
        Files.deleteIfExists(file);
    }

    @Benchmark
    @OperationsPerInvocation(N)
    public void shortestDecimal(Blackhole bh) {
        for (double v : values) {
            bh.consume(Cells.num(v));
        }
    }

    @Benchmark
    @OperationsPerInvocation(N)
    public void jacksonSchubfach(Blackhole bh) {
        for (double v : values) {
            bh.consume(com.fasterxml.jackson.core.io.schubfach.DoubleToDecimal.toString(v));
        }
    }

    @Benchmark
    @OperationsPerInvocation(N)
    public void javaDoubleToString(Blackhole bh) {
        for (double v : values) {
            bh.consume(Double.toString(v));
        }
    }

    /** Per row: eleven cells of a link file, quoted by the CSV rule where needed, as UTF-8 bytes. */
    @Benchmark
    @OperationsPerInvocation(N)
    public byte[] encodeRows() {
        return writer.encode(rows);
    }
}
