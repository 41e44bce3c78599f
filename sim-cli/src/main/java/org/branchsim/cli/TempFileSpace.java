package org.branchsim.cli;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import org.branchsim.core.results.SpillSpace;

/**
 * Keeps a long run's trace samples, beyond the trace's memory budget, in temporary files
 * ({@code branchsim-trace-*.bin} in a directory, by default {@code java.io.tmpdir}), one per trace. Each file is
 * opened with {@link StandardOpenOption#DELETE_ON_CLOSE}: on Linux and other Unix systems the JDK unlinks it as
 * soon as it is open, so it disappears even when the process is killed; elsewhere it is deleted when the trace is
 * closed (or collected). The bytes are the trace's doubles in the machine's byte order.
 */
final class TempFileSpace implements SpillSpace {

    private final Path directory;

    /** @param directory where the files are made */
    TempFileSpace(Path directory) {
        this.directory = directory;
    }

    /** @return temporary files in {@code java.io.tmpdir} */
    static TempFileSpace inTemporaryDirectory() {
        return new TempFileSpace(Path.of(System.getProperty("java.io.tmpdir")));
    }

    @Override
    public Region open() throws IOException {
        Path p = Files.createTempFile(directory, "branchsim-trace-", ".bin");
        try {
            return new FileRegion(p, FileChannel.open(p, StandardOpenOption.READ, StandardOpenOption.WRITE,
                    StandardOpenOption.DELETE_ON_CLOSE));
        } catch (IOException e) {
            Files.deleteIfExists(p);
            throw e;
        }
    }

    @Override
    public String describe() {
        return directory.toString();
    }

    /** One temporary file; closing it deletes it. */
    private static final class FileRegion implements Region {
        private final Path path;
        private final FileChannel channel;

        FileRegion(Path path, FileChannel channel) {
            this.path = path;
            this.channel = channel;
        }

        @Override
        public void write(ByteBuffer bytes, long position) throws IOException {
            long at = position;
            while (bytes.hasRemaining()) {
                at += channel.write(bytes, at);
            }
        }

        @Override
        public void read(ByteBuffer bytes, long position) throws IOException {
            long at = position;
            while (bytes.hasRemaining()) {
                int n = channel.read(bytes, at);
                if (n < 0) {
                    throw new IOException(path + " ends at byte " + at);
                }
                at += n;
            }
        }

        @Override
        public String describe() {
            return path.toString();
        }

        @Override
        public void close() throws IOException {
            try {
                channel.close();
            } finally {
                Files.deleteIfExists(path);
            }
        }
    }
}
