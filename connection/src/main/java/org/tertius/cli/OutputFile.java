package org.tertius.cli;

import java.io.IOException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.tertius.core.InvalidInputException;

/** Output files: checked before the work starts, and written whole (temporary file then move). */
final class OutputFile {
    private OutputFile() {
    }

    /** Fails early with a one-line message if the file cannot be written. */
    static void checkWritable(String option, Path path) {
        Path dir = path.toAbsolutePath().getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new InvalidInputException(option, "cannot write " + path + ": folder " + dir + " does not exist");
        }
        if (!Files.isWritable(dir) || (Files.exists(path) && !Files.isWritable(path))) {
            throw new InvalidInputException(option, "cannot write " + path + ": permission denied");
        }
        if (Files.isDirectory(path)) {
            throw new InvalidInputException(option, "cannot write " + path + ": it is a folder");
        }
        // the permissions may say yes where the file system says no (a read-only or virtual file system): try it
        try {
            Path probe = Files.createTempFile(dir, "." + path.getFileName(), ".probe");
            Files.delete(probe);
        } catch (IOException | SecurityException e) {
            String reason = e instanceof FileSystemException && ((FileSystemException) e).getReason() != null
                    ? ((FileSystemException) e).getReason() : "refused";
            throw new InvalidInputException(option, "cannot write " + path + ": the folder " + dir + " does not take"
                    + " new files (" + reason + "); choose a writable folder");
        }
    }

    /**
     * As {@link #checkWritable}, for a picture: pictures are written as PNG, so a name with another extension
     * (picture.jpg) is refused rather than filled with PNG data.
     */
    static void checkPicture(String option, Path path) {
        String name = path.getFileName() == null ? "" : path.getFileName().toString();
        int dot = name.lastIndexOf('.');
        if (dot > 0 && !name.substring(dot + 1).equalsIgnoreCase("png")) {
            throw new InvalidInputException(option, "pictures are written as PNG: name the file *.png, got " + name);
        }
        checkWritable(option, path);
    }

    /** Writes through a temporary file in the same folder, then moves it into place. */
    static void writeWhole(String option, Path path, IOWriter writer) {
        Path tmp = null;
        try {
            Path dir = path.toAbsolutePath().getParent();
            tmp = Files.createTempFile(dir, "." + path.getFileName(), ".part");
            writer.write(tmp);
            Files.move(tmp, path, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new InvalidInputException(option, "cannot write " + path + ": " + e.getMessage());
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // best effort: the temporary file is hidden and named after the target
                }
            }
        }
    }

    /** Writes to a path. */
    @FunctionalInterface
    interface IOWriter {
        void write(Path p) throws IOException;
    }
}
