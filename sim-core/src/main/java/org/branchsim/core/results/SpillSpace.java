package org.branchsim.core.results;

import java.io.IOException;
import java.nio.ByteBuffer;

/**
 * Where a trace puts the samples that exceed its memory budget: somewhere outside the Java heap that the core does
 * not know (the command line gives a temporary file). A space opens one region per trace; the region holds bytes
 * at positions, and closing it releases it (a file is deleted).
 */
public interface SpillSpace {

    /**
     * @return a new, empty region
     * @throws IOException when none can be made
     */
    Region open() throws IOException;

    /** @return where the regions are made, in words (a directory), for messages */
    String describe();

    /** One trace's bytes outside the heap. */
    interface Region extends AutoCloseable {

        /**
         * Writes every remaining byte of the buffer at a position.
         *
         * @param bytes the bytes (consumed)
         * @param position byte offset in the region
         * @throws IOException when they cannot be written
         */
        void write(ByteBuffer bytes, long position) throws IOException;

        /**
         * Fills the buffer's remaining room from a position.
         *
         * @param bytes where the bytes go
         * @param position byte offset in the region
         * @throws IOException when they cannot be read (also when the region ends first)
         */
        void read(ByteBuffer bytes, long position) throws IOException;

        /** @return the region's name in words (a file name), for messages */
        String describe();

        /** Releases the region; its bytes are gone. */
        @Override
        void close() throws IOException;
    }
}
