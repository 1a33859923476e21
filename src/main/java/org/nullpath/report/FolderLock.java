package org.nullpath.report;

import java.io.IOException;
import java.io.InterruptedIOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The lock one plan holds on its output folder while it writes there: an operating-system lock
 * ({@link FileChannel#tryLock()}) on an empty file {@value #NAME} inside the folder. A second plan into the
 * same folder waits until the first is done. The lock dies with the process that holds it, so a plan that
 * holds it knows that no other plan is writing there and that whatever another plan left behind is stale.
 *
 * <p>Within one Java process the folder is also held in {@link #HELD}: a second channel on the lock
 * file must not even be opened there, since closing it could release the first channel's lock (see
 * {@link FileLock}).
 *
 * <p>The file is removed when the lock is given up. A plan that was waiting on the removed file notices,
 * once it gets its lock, that the name no longer leads to the file it locked, and starts over.
 */
final class FolderLock implements AutoCloseable {
    /** The lock file's name inside the output folder. */
    static final String NAME = ".nullpath-lock";

    private static final long POLL_MILLIS = 50;

    /** The folders (their real paths) this Java process holds the lock of. */
    private static final Set<Path> HELD = ConcurrentHashMap.newKeySet();

    private final Path file;
    private final Path held;
    private final FileChannel channel;

    private FolderLock(Path file, Path held, FileChannel channel) {
        this.file = file;
        this.held = held;
        this.channel = channel;
    }

    /**
     * Takes the lock on {@code dir} (created if missing), waiting as long as another plan holds it;
     * {@code onWait} runs once, when the first attempt finds it held.
     */
    static FolderLock acquire(Path dir, Runnable onWait) throws IOException {
        Path file = dir.resolve(NAME);
        boolean told = false;
        while (true) {
            Files.createDirectories(dir);
            Path real = dir.toRealPath();
            if (!HELD.add(real)) {
                if (!told) {
                    onWait.run();
                    told = true;
                }
                pause(dir);
                continue;
            }
            FolderLock got = null;
            try {
                got = attempt(file, real);
            } finally {
                if (got == null) {
                    HELD.remove(real);
                }
            }
            if (got != null) {
                return got;
            }
            if (!told) {
                onWait.run();
                told = true;
            }
            pause(dir);
        }
    }

    private static void pause(Path dir) throws InterruptedIOException {
        try {
            Thread.sleep(POLL_MILLIS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new InterruptedIOException("interrupted while waiting for another plan into " + dir);
        }
    }

    /** One try: the lock, or null when another process holds it. */
    private static FolderLock attempt(Path file, Path real) throws IOException {
        while (true) {
            try {
                Files.createFile(file);
            } catch (FileAlreadyExistsException e) {
                // another plan's (or a killed plan's) lock file: lock it below
            } catch (NoSuchFileException e) {
                Files.createDirectories(file.getParent()); // an earlier holder removed the folder it had created
                continue;
            }
            Object before = key(file);
            FileChannel ch;
            try {
                ch = FileChannel.open(file, StandardOpenOption.WRITE, LinkOption.NOFOLLOW_LINKS);
            } catch (NoSuchFileException e) {
                continue; // removed by its holder in between
            }
            FileLock lock;
            try {
                lock = ch.tryLock();
            } catch (IOException | RuntimeException e) {
                ch.close();
                throw e;
            }
            if (lock == null) {
                ch.close();
                return null;
            }
            if (before != null && Objects.equals(before, key(file))) {
                return new FolderLock(file, real, ch);
            }
            ch.close(); // a file its holder removed after we opened it: start over on the new one
        }
    }

    /** What identifies the file at {@code file} now (its inode on POSIX systems), or null when it is gone. */
    private static Object key(Path file) throws IOException {
        try {
            BasicFileAttributes a = Files.readAttributes(file, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
            Object k = a.fileKey();
            return k == null ? "" : k; // no file keys here (not POSIX): the name is all there is to go by
        } catch (NoSuchFileException e) {
            return null;
        }
    }

    /** Removes the lock file, then gives up the lock. */
    @Override
    public void close() throws IOException {
        if (!channel.isOpen()) {
            return;
        }
        try {
            Files.deleteIfExists(file);
        } finally {
            try {
                channel.close();
            } finally {
                HELD.remove(held);
            }
        }
    }

    /** Gives up the lock and leaves the file, as a killed process does (for tests of what a kill leaves). */
    void dropAsIfKilled() throws IOException {
        try {
            channel.close();
        } finally {
            HELD.remove(held);
        }
    }
}
