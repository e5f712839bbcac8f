package org.treeproof.io;

import java.io.FileInputStream;
import java.io.FileNotFoundException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.treeproof.data.InputException;

/** Opening an input file with messages a user can act on. */
final class Sources {
    private Sources() {
    }

    /**
     * Opens {@code file} for reading.
     *
     * @throws InputException when it does not exist, is a directory or cannot be read
     */
    static InputStream open(Path file) {
        if (Files.isDirectory(file)) {
            throw new InputException(file + ": is a directory, not a table file");
        }
        try {
            // A pipe (as from process substitution) is read as a stream: the channel of Files.newInputStream asks
            // for its position, which a pipe does not have.
            return Files.isRegularFile(file) ? Files.newInputStream(file) : new FileInputStream(file.toFile());
        } catch (FileNotFoundException e) {
            throw Files.exists(file) ? new InputException(file + ": cannot be opened: " + e.getMessage())
                    : new InputException(file + ": no such file");
        } catch (NoSuchFileException e) {
            throw new InputException(file + ": no such file");
        } catch (AccessDeniedException e) {
            throw new InputException(file + ": cannot be read (permission denied)");
        } catch (IOException e) {
            throw new InputException(file + ": cannot be opened: " + e.getMessage());
        }
    }

    /** Closes a stream that was only read; a failure to close loses nothing. */
    static void closeQuietly(InputStream in) {
        try {
            in.close();
        } catch (IOException e) {
            // Nothing was written, so there is nothing to lose.
        }
    }
}
