package org.treeproof.io;

import java.io.BufferedOutputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.zip.CRC32;
import org.treeproof.data.InputException;
import org.treeproof.score.BranchSupport;
import org.treeproof.study.Checkpoint;
import org.treeproof.study.ReplicateOutcome;

/**
 * A checkpoint kept in a hidden directory beside the output directory ({@code .NAME.checkpoint}): one append-only
 * file per stage of length-prefixed records, each with a CRC-32, flushed to the operating system as soon as it
 * is written, so a process killed at any moment (even by SIGKILL) leaves every record but possibly a torn last
 * one, which is ignored on resume. A fingerprint of the study (tool version and build, input checksum, every setting)
 * guards against resuming a different study.
 *
 * <p>For fault-injection tests, the system property {@code treeproof.faultAfterReplicates=N} halts the JVM
 * abruptly (as a kill would) right after the N-th replicate record is written, and
 * {@code treeproof.faultAfterMultiscale=N} after the N-th multiscale-bootstrap record written by this process.
 */
public final class CheckpointFile implements Checkpoint, AutoCloseable {
    private static final String FINGERPRINT = "fingerprint.txt";

    private final Path dir;
    private final List<ReplicateOutcome> keptReplicates;
    private final Map<Stage, List<double[]>> keptRows = new EnumMap<>(Stage.class);
    private final Map<Stage, DataOutputStream> writers = new EnumMap<>(Stage.class);
    private final long faultAfter = Long.getLong("treeproof.faultAfterReplicates", -1L);
    private final long faultAfterMultiscale = Long.getLong("treeproof.faultAfterMultiscale", -1L);
    private long multiscaleWritten;
    private long replicatesWritten;
    /** Records on disk: those loaded on resume and those appended since; read by an interrupt notice. */
    private volatile long recordsWritten;

    /** Whether earlier work was loaded ({@code --resume} and a checkpoint of this study was found). */
    private final boolean loaded;
    /** Whether an earlier run's checkpoint was found and discarded (no {@code --resume}). */
    private boolean discarded;

    private CheckpointFile(Path dir, boolean load) throws IOException {
        this.dir = dir;
        this.loaded = load;
        keptReplicates = load ? readReplicates(dir.resolve(fileOf(Stage.REPLICATES))) : List.of();
        for (Stage s : List.of(Stage.NULL_SETS, Stage.GAP_SETS, Stage.MULTISCALE)) {
            keptRows.put(s, load ? readRows(dir.resolve(fileOf(s))) : List.of());
        }
        replicatesWritten = keptReplicates.size();
        recordsWritten = replicatesWritten + keptRows.values().stream().mapToLong(List::size).sum();
    }

    /** Whether an earlier run of this study was found and its work loaded. */
    public boolean resumed() {
        return loaded;
    }

    /** Whether an earlier run's checkpoint was found and discarded because {@code --resume} was not given. */
    public boolean discardedEarlierWork() {
        return discarded;
    }

    /** How many finished pieces of work (replicates, null sets, reference sets) the checkpoint holds. */
    public long recordsKept() {
        return recordsWritten;
    }

    /** Where the checkpoint is kept. */
    public Path location() {
        return dir;
    }

    /** The checkpoint directory that belongs to output directory {@code out}. */
    public static Path locationFor(Path out) {
        Path abs = out.toAbsolutePath().normalize();
        return abs.resolveSibling("." + abs.getFileName() + ".checkpoint");
    }

    /**
     * Opens the checkpoint of {@code out}: with {@code resume}, what an earlier run of the same study kept is
     * loaded; otherwise any earlier checkpoint is discarded.
     *
     * @return the checkpoint and whether earlier work was found
     * @throws InputException if the kept checkpoint belongs to a different study
     */
    public static CheckpointFile open(Path out, String fingerprint, boolean resume) {
        Path dir = locationFor(out);
        try {
            boolean found = Files.isRegularFile(dir.resolve(FINGERPRINT));
            if (found && resume) {
                String kept = Files.readString(dir.resolve(FINGERPRINT), StandardCharsets.UTF_8).strip();
                if (!kept.equals(fingerprint)) {
                    throw new InputException("--resume: the checkpoint " + dir + " was made by a different study "
                            + "(other input, settings or treeproof build); rerun with the same command and jar, or "
                            + "without --resume");
                }
                return new CheckpointFile(dir, true);
            }
            OutputDirectory.deleteQuietly(dir);
            Files.createDirectories(dir);
            Files.writeString(dir.resolve(FINGERPRINT), fingerprint + "\n", StandardCharsets.UTF_8);
            var fresh = new CheckpointFile(dir, false);
            fresh.discarded = found;
            return fresh;
        } catch (IOException e) {
            throw new InputException("--out " + out + ": cannot keep a checkpoint beside it (" + OutputGuard.describe(e)
                    + ")");
        }
    }

    /** The number of replicates loaded from an earlier run. */
    public int resumedReplicates() {
        return keptReplicates.size();
    }

    @Override
    public List<ReplicateOutcome> replicates() {
        return keptReplicates;
    }

    @Override
    public List<double[]> rows(Stage stage) {
        return keptRows.getOrDefault(stage, List.of());
    }

    @Override
    public void replicateDone(ReplicateOutcome o) {
        var bytes = new ByteArrayOutputStream();
        try (var out = new DataOutputStream(bytes)) {
            out.writeInt(o.index());
            int[] distinct = o.distinct();
            out.writeInt(distinct.length);
            for (int d : distinct) {
                out.writeInt(d);
            }
            int[][][] labels = o.labels();
            out.writeInt(labels.length);
            out.writeInt(labels.length == 0 ? 0 : labels[0].length);
            for (int[][] perK : labels) {
                for (int[] l : perK) {
                    for (int v : l) {
                        out.writeShort(v);
                    }
                }
            }
            BranchSupport.Replicate[] support = o.support();
            out.writeBoolean(support != null);
            if (support != null) {
                for (BranchSupport.Replicate r : support) {
                    writeLongs(out, r.counted());
                    writeLongs(out, r.supported());
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        append(Stage.REPLICATES, bytes.toByteArray());
        replicatesWritten++;
        if (faultAfter >= 0 && replicatesWritten >= faultAfter) {
            Runtime.getRuntime().halt(137);
        }
    }

    @Override
    public void rowDone(Stage stage, int index, double[] row) {
        var bytes = new ByteArrayOutputStream();
        try (var out = new DataOutputStream(bytes)) {
            out.writeInt(index);
            out.writeInt(row.length);
            for (double v : row) {
                out.writeDouble(v);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        append(stage, bytes.toByteArray());
        if (stage == Stage.MULTISCALE && faultAfterMultiscale >= 0 && ++multiscaleWritten >= faultAfterMultiscale) {
            Runtime.getRuntime().halt(137);
        }
    }

    private void append(Stage stage, byte[] payload) {
        try {
            DataOutputStream w = writers.get(stage);
            if (w == null) {
                OutputStream f = Files.newOutputStream(dir.resolve(fileOf(stage)), StandardOpenOption.CREATE,
                        StandardOpenOption.APPEND);
                w = new DataOutputStream(new BufferedOutputStream(f, 1 << 16));
                writers.put(stage, w);
            }
            DiskFull.beforeCheckpointRecord(recordsWritten);
            var crc = new CRC32();
            crc.update(payload);
            w.writeInt(payload.length);
            w.write(payload);
            w.writeInt((int) crc.getValue());
            w.flush();
            recordsWritten++;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the checkpoint in " + dir, e);
        }
    }

    /** Removes the checkpoint (after the results were written). */
    public void discard() {
        close();
        OutputDirectory.deleteQuietly(dir);
    }

    @Override
    public void close() {
        for (DataOutputStream w : writers.values()) {
            try {
                w.close();
            } catch (IOException ignored) {
                // the checkpoint is only a help for resuming
            }
        }
        writers.clear();
    }

    private static String fileOf(Stage s) {
        return switch (s) {
            case REPLICATES -> "replicates.bin";
            case NULL_SETS -> "null-sets.bin";
            case GAP_SETS -> "reference-sets.bin";
            case MULTISCALE -> "multiscale.bin";
        };
    }

    private static void writeLongs(DataOutputStream out, long[] v) throws IOException {
        out.writeInt(v.length);
        for (long x : v) {
            out.writeLong(x);
        }
    }

    private static long[] readLongs(DataInputStream in) throws IOException {
        long[] v = new long[in.readInt()];
        for (int i = 0; i < v.length; i++) {
            v[i] = in.readLong();
        }
        return v;
    }

    /** Every intact record of a stage file, stopping at the first torn or corrupt one. */
    private static List<byte[]> records(Path file) throws IOException {
        var out = new ArrayList<byte[]>();
        if (!Files.exists(file)) {
            return out;
        }
        try (InputStream raw = Files.newInputStream(file); var in = new DataInputStream(raw)) {
            while (true) {
                int len;
                try {
                    len = in.readInt();
                } catch (EOFException end) {
                    break;
                }
                if (len < 0 || len > (1 << 28)) {
                    break;
                }
                byte[] payload = in.readNBytes(len);
                if (payload.length != len) {
                    break;
                }
                int stored;
                try {
                    stored = in.readInt();
                } catch (EOFException torn) {
                    break;
                }
                var crc = new CRC32();
                crc.update(payload);
                if ((int) crc.getValue() != stored) {
                    break;
                }
                out.add(payload);
            }
        }
        return out;
    }

    private static List<ReplicateOutcome> readReplicates(Path file) throws IOException {
        var out = new ArrayList<ReplicateOutcome>();
        for (byte[] payload : records(file)) {
            var in = new DataInputStream(new java.io.ByteArrayInputStream(payload));
            int index = in.readInt();
            int[] distinct = new int[in.readInt()];
            for (int a = 0; a < distinct.length; a++) {
                distinct[a] = in.readInt();
            }
            int links = in.readInt();
            int ks = in.readInt();
            int[][][] labels = new int[links][ks][distinct.length];
            for (int l = 0; l < links; l++) {
                for (int k = 0; k < ks; k++) {
                    for (int a = 0; a < distinct.length; a++) {
                        labels[l][k][a] = in.readShort();
                    }
                }
            }
            BranchSupport.Replicate[] support = null;
            if (in.readBoolean()) {
                support = new BranchSupport.Replicate[links];
                for (int l = 0; l < links; l++) {
                    support[l] = new BranchSupport.Replicate(readLongs(in), readLongs(in));
                }
            }
            if (index != out.size()) {
                break;
            }
            out.add(new ReplicateOutcome(index, distinct, labels, support));
        }
        return out;
    }

    private static List<double[]> readRows(Path file) throws IOException {
        var out = new ArrayList<double[]>();
        for (byte[] payload : records(file)) {
            var in = new DataInputStream(new java.io.ByteArrayInputStream(payload));
            int index = in.readInt();
            double[] row = new double[in.readInt()];
            for (int i = 0; i < row.length; i++) {
                row[i] = in.readDouble();
            }
            if (index != out.size()) {
                break;
            }
            out.add(row);
        }
        return out;
    }
}
