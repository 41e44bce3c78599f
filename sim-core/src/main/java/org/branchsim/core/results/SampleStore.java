package org.branchsim.core.results;

import java.io.IOException;
import java.lang.ref.Cleaner;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;

/**
 * Rows of doubles of a fixed width (units are the caller's), kept in chunks of rows stored column by column
 * ({@code chunk[j * rows + r]}), so that one place of every row (a column) is read as one contiguous block per
 * chunk. Full chunks stay on the heap until they take {@code memoryBudget} bytes; every later full chunk is
 * written to a region of a {@link SpillSpace} (a temporary file) and its array reused, so heap use stays bounded
 * however many rows are appended. Without a spill space every chunk stays on the heap.
 * <p>
 * {@link #close} releases the region, and so does a cleaner when the store becomes unreachable without being
 * closed. Reads of single places load the whole chunk once (one chunk is cached), so reading rows in order costs
 * one region read per chunk.
 */
final class SampleStore implements AutoCloseable {

    /** Target size of one chunk, bytes. */
    static final int CHUNK_BYTES = 1 << 20;
    /** Fewest rows in a chunk (very wide rows). */
    static final int MIN_ROWS = 64;
    /** Most rows in a chunk (narrow rows). */
    static final int MAX_ROWS = 4096;

    private static final Cleaner CLEANER = Cleaner.create();

    private final int width;
    private final int rows;
    private final long memoryBudget;
    private final SpillSpace space;
    /** Chunk c on the heap, or null when it is in the spill region. */
    private final List<double[]> chunks = new ArrayList<>();
    private long residentBytes;
    /** Index of the first chunk in the spill region (all later full chunks are there too), or -1. */
    private int firstSpilled = -1;
    private SpillSpace.Region spill;
    private Cleaner.Cleanable cleanable;
    private double[] spare;
    private ByteBuffer block;
    private ByteBuffer whole;
    private long spilledBytes;
    private int cachedChunk = -1;
    private double[] cache;
    private int size;
    private boolean closed;

    /**
     * @param width doubles per row
     * @param memoryBudget bytes of full chunks kept on the heap before chunks go to the spill space
     * @param space where later chunks go, or null to keep every chunk on the heap
     */
    SampleStore(int width, long memoryBudget, SpillSpace space) {
        if (width < 1) {
            throw new IllegalArgumentException("a row needs at least one place, not " + width);
        }
        this.width = width;
        this.rows = Math.max(MIN_ROWS, Math.min(MAX_ROWS, CHUNK_BYTES / (8 * width)));
        this.memoryBudget = memoryBudget;
        this.space = space;
    }

    /** @return the number of rows */
    int size() {
        return size;
    }

    /** @return bytes written to the spill region so far */
    long spilledBytes() {
        return spilledBytes;
    }

    /** Appends one row: {@code first}, then {@code rest} (its length is width - 1). */
    void append(double first, double[] rest) {
        int r = size % rows;
        if (r == 0) {
            chunks.add(spare != null ? spare : new double[rows * width]);
            spare = null;
        }
        double[] chunk = chunks.get(chunks.size() - 1);
        chunk[r] = first;
        for (int j = 1; j < width; j++) {
            chunk[j * rows + r] = rest[j - 1];
        }
        size++;
        if (size % rows == 0) {
            retire(chunks.size() - 1);
        }
    }

    /** A chunk just filled: keep it on the heap within the budget (or without a spill space), else spill it. */
    private void retire(int c) {
        if (firstSpilled < 0 && (space == null || residentBytes + chunkBytes() <= memoryBudget)) {
            residentBytes += chunkBytes();
            return;
        }
        if (firstSpilled < 0) {
            firstSpilled = c;
        }
        double[] chunk = chunks.get(c);
        ByteBuffer b = whole();
        b.clear();
        b.asDoubleBuffer().put(chunk);
        write(b, (long) (c - firstSpilled) * chunkBytes());
        spilledBytes += chunkBytes();
        chunks.set(c, null);
        spare = chunk;
    }

    private int chunkBytes() {
        return rows * width * 8;
    }

    /** @return place j of row k */
    synchronized double get(int k, int j) {
        if (k < 0 || k >= size) {
            throw new IndexOutOfBoundsException("sample " + k + " of " + size);
        }
        return chunk(k / rows)[j * rows + k % rows];
    }

    /** Copies row k into out (width doubles). */
    synchronized void row(int k, double[] out) {
        if (k < 0 || k >= size) {
            throw new IndexOutOfBoundsException("sample " + k + " of " + size);
        }
        double[] chunk = chunk(k / rows);
        int r = k % rows;
        for (int j = 0; j < width; j++) {
            out[j] = chunk[j * rows + r];
        }
    }

    /** @return place j of rows from (inclusive) to to (exclusive), read one block per chunk */
    synchronized double[] column(int j, int from, int to) {
        if (from < 0 || to > size || from > to) {
            throw new IndexOutOfBoundsException("samples " + from + " to " + to + " of " + size);
        }
        double[] out = new double[to - from];
        int k = from;
        while (k < to) {
            int c = k / rows;
            int r0 = k % rows;
            int n = Math.min(rows - r0, to - k);
            double[] chunk = c == cachedChunk ? cache : chunks.get(c);
            if (chunk != null) {
                System.arraycopy(chunk, j * rows + r0, out, k - from, n);
            } else {
                ByteBuffer b = block();
                b.clear().limit(n * 8);
                read(b, (long) (c - firstSpilled) * chunkBytes() + ((long) j * rows + r0) * 8);
                b.flip();
                b.asDoubleBuffer().get(out, k - from, n);
            }
            k += n;
        }
        return out;
    }

    private ByteBuffer block() {
        if (block == null) {
            block = ByteBuffer.allocateDirect(rows * 8).order(ByteOrder.nativeOrder());
        }
        return block;
    }

    /** @return the off-heap buffer of one whole chunk (writes and cached reads) */
    private ByteBuffer whole() {
        if (whole == null) {
            whole = ByteBuffer.allocateDirect(chunkBytes()).order(ByteOrder.nativeOrder());
        }
        return whole;
    }

    /** @return chunk c, from the heap or read whole from the spill region into the cache */
    private double[] chunk(int c) {
        double[] chunk = chunks.get(c);
        if (chunk != null) {
            return chunk;
        }
        if (c != cachedChunk) {
            if (cache == null) {
                cache = new double[rows * width];
            }
            ByteBuffer b = whole();
            b.clear();
            read(b, (long) (c - firstSpilled) * chunkBytes());
            b.flip();
            b.asDoubleBuffer().get(cache);
            cachedChunk = c;
        }
        return cache;
    }

    private void write(ByteBuffer b, long position) {
        try {
            if (spill == null) {
                spill = space.open();
                cleanable = CLEANER.register(this, new Release(spill));
            }
            b.limit(chunkBytes()).position(0);
            spill.write(b, position);
        } catch (IOException e) {
            throw failure(e);
        }
    }

    private void read(ByteBuffer b, long position) {
        if (closed) {
            throw new IllegalStateException("the trace was closed: its samples on disk are gone");
        }
        try {
            spill.read(b, position);
        } catch (IOException e) {
            throw failure(e);
        }
    }

    private BranchsimException failure(IOException e) {
        String where = spill != null ? spill.describe() : space.describe();
        return new BranchsimException(ErrorKey.TRACE_STORE_FAILED, List.of(), e, where,
                e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName());
    }

    /** Releases the spill region, if any (samples on the heap stay readable, spilled ones are gone). */
    @Override
    public synchronized void close() {
        closed = true;
        cache = null;
        cachedChunk = -1;
        if (cleanable != null) {
            cleanable.clean();
        }
    }

    /** Closes a region for the cleaner; holds no reference to the store, so that the store can be collected. */
    private static final class Release implements Runnable {
        private final SpillSpace.Region region;

        Release(SpillSpace.Region region) {
            this.region = region;
        }

        @Override
        public void run() {
            try {
                region.close();
            } catch (IOException e) {
                throw new BranchsimException(ErrorKey.TRACE_STORE_FAILED, List.of(), e, region.describe(),
                        e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName());
            }
        }
    }
}
