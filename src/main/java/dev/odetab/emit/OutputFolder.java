package dev.odetab.emit;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * An output folder held for writing (a build's outputs, an audit's report): the one place where
 * new files replace old ones, so that nothing changes unless everything succeeds, a kill
 * included.
 *
 * <ul>
 * <li><b>Lock.</b> {@link #open} locks {@code .odetab-lock} in the folder
 *     ({@link FileChannel#tryLock}); a second writer fails at once with {@link BusyException}
 *     instead of waiting (a paused writer would make it wait silently). The lock file holds the
 *     holder's process id, for that message. A writer compares the file's identity (its file
 *     key) before opening it and after locking it, so that one that locked a lock file another
 *     had just deleted tries again; it never opens the file a second time, since on POSIX
 *     systems closing any descriptor of a file drops the process's locks on it. The lock file
 *     is deleted on {@link #close}; one left by a killed process holds no lock and is taken
 *     over.</li>
 * <li><b>Recovery.</b> Under the lock, {@link #open} completes a commit a killed run left half
 *     done (the journal {@code .odetab-journal} exists: every temporary it lists that is still
 *     there is renamed over its target), then deletes every {@code .odetab-*.tmp} left behind
 *     (no other writer can own one while the folder is locked). {@link #notices} says what was
 *     done.</li>
 * <li><b>Commit.</b> {@link #commit} checks every target first (a plain name in the folder,
 *     not a folder standing where the file must go), forces the temporaries to disk, writes the
 *     journal (to a temporary, forced, then renamed: a journal is always complete), renames the
 *     temporaries one by one (atomically where the file system can), and deletes the journal.
 *     Before the journal exists a kill leaves the old files; after, the next run completes the
 *     new ones. Roll-forward only: once the journal is there every new file is complete.</li>
 * </ul>
 *
 * <p>For tests only, the system property {@code odetab.test.commitPauseMillis} makes
 * {@link #commit} sleep that long after writing the journal and after each rename, so that a
 * test can kill the process inside the commit window (kill and concurrency tests).
 */
public final class OutputFolder implements AutoCloseable {
    static final String LOCK = ".odetab-lock";
    static final String JOURNAL = ".odetab-journal";
    private static final String TEMPORARY_PREFIX = ".odetab-";
    private static final String TEMPORARY_SUFFIX = ".tmp";
    private static final String JOURNAL_HEADER = "odetab journal 1";
    private static final String PAUSE_PROPERTY = "odetab.test.commitPauseMillis";
    private static final SecureRandom RANDOM = new SecureRandom();

    private final Path dir;
    /** The folder as the user named it, for messages. */
    private final Path shown;
    private final List<Path> created;
    private final FileChannel channel;
    private final FileLock lock;
    private final List<String> notices = new ArrayList<>();
    private boolean committed;

    /** Another process (or another build of this one) holds the folder's lock. */
    public static final class BusyException extends IOException {
        private static final long serialVersionUID = 1L;

        BusyException(String message) {
            super(message);
        }
    }

    private OutputFolder(Path dir, Path shown, List<Path> created, FileChannel channel, FileLock lock) {
        this.dir = dir;
        this.shown = shown;
        this.created = created;
        this.channel = channel;
        this.lock = lock;
    }

    /**
     * Creates the folder when missing (every missing parent too; {@link #close} removes them
     * again unless something was committed), locks it, completes an interrupted commit and
     * deletes leftover temporaries.
     *
     * @throws BusyException when another writer holds the folder
     * @throws IOException when {@code dir} or a parent is a file, or the folder cannot be written
     */
    public static OutputFolder open(Path dir) throws IOException {
        Path absolute = dir.toAbsolutePath().normalize();
        List<Path> created = new ArrayList<>();
        Path p = absolute;
        while (p != null && !Files.exists(p)) {
            created.add(p);
            p = p.getParent();
        }
        if (p != null && !Files.isDirectory(p)) {
            throw new IOException(p.equals(absolute) ? dir + " is a file, not a folder"
                    : dir + ": " + p + " is a file, not a folder");
        }
        Files.createDirectories(absolute);
        OutputFolder folder = null;
        try {
            folder = lock(absolute, dir, created);
            folder.recover();
            return folder;
        } catch (IOException | RuntimeException e) {
            if (folder != null) {
                folder.close();
            } else {
                removeCreated(created);
            }
            throw e;
        }
    }

    private static OutputFolder lock(Path dir, Path shown, List<Path> created) throws IOException {
        Path lockFile = dir.resolve(LOCK);
        while (true) {
            Object before = fileKey(lockFile);
            FileChannel ch = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
            try {
                FileLock lock = tryLock(ch);
                if (lock == null) {
                    String holder = holder(lockFile);
                    throw new BusyException("another odetab" + (holder.isEmpty() ? "" : " (process " + holder + ")")
                            + " is writing to " + shown + "; run again when it has finished");
                }
                Object after = fileKey(lockFile);
                if (after != null && after.equals(before)) {
                    ch.truncate(0);
                    ch.write(ByteBuffer.wrap((ProcessHandle.current().pid() + "\n").getBytes(StandardCharsets.UTF_8)), 0);
                    return new OutputFolder(dir, shown, created, ch, lock);
                }
                // the file was deleted (or replaced) by the writer that held it before, or just created: lock the one there now
                lock.release();
                ch.close();
            } catch (IOException | RuntimeException e) {
                ch.close();
                throw e;
            }
        }
    }

    /**
     * The identity of a file (device and inode on POSIX systems) read without opening it: on
     * POSIX systems closing any descriptor of a file drops the process's locks on it. Null when
     * the file is missing; when the platform has no file keys, a constant (such platforms,
     * Windows, do not delete a file that is open).
     */
    private static Object fileKey(Path file) throws IOException {
        try {
            Object key = Files.readAttributes(file, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS).fileKey();
            return key == null ? file : key;
        } catch (NoSuchFileException e) {
            return null;
        }
    }

    private static FileLock tryLock(FileChannel ch) throws IOException {
        try {
            return ch.tryLock();
        } catch (OverlappingFileLockException e) {
            return null; // held by this process
        }
    }

    /** The process id in a lock file (read by a process that does not hold its lock), or empty. */
    private static String holder(Path lockFile) throws IOException {
        String pid = readOrEmpty(lockFile).strip();
        return pid.matches("[0-9]{1,19}") ? pid : "";
    }

    private static String readOrEmpty(Path file) throws IOException {
        try {
            return Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            return "";
        }
    }

    /** The folder (absolute, normalized). */
    public Path dir() {
        return dir;
    }

    /** What opening the folder did to recover from an interrupted run (empty when nothing). */
    public List<String> notices() {
        return List.copyOf(notices);
    }

    private void recover() throws IOException {
        Path journal = dir.resolve(JOURNAL);
        if (Files.exists(journal, LinkOption.NOFOLLOW_LINKS)) {
            Map<String, String> pairs = readJournal(journal);
            int renamed = 0;
            for (Map.Entry<String, String> e : pairs.entrySet()) {
                Path tmp = dir.resolve(e.getKey());
                if (Files.exists(tmp, LinkOption.NOFOLLOW_LINKS)) {
                    move(tmp, dir.resolve(e.getValue()));
                    renamed++;
                }
            }
            syncFolder();
            Files.delete(journal);
            notices.add(shown + ": completed the commit of an interrupted run (" + renamed + " of " + pairs.size()
                    + " files were still to be renamed)");
        }
        int swept = 0;
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir, TEMPORARY_PREFIX + "*" + TEMPORARY_SUFFIX)) {
            for (Path tmp : s) {
                if (Files.isRegularFile(tmp, LinkOption.NOFOLLOW_LINKS)) {
                    Files.delete(tmp);
                    swept++;
                }
            }
        }
        if (swept > 0) {
            notices.add(shown + ": deleted " + swept + " temporary file(s) left by an interrupted run");
        }
    }

    /**
     * The journal's temporary → target pairs, in order. Every name must be a temporary's name
     * or a plain file name of the folder, so that a damaged journal cannot move anything
     * elsewhere.
     */
    private Map<String, String> readJournal(Path journal) throws IOException {
        List<String> lines = Files.readAllLines(journal, StandardCharsets.UTF_8);
        if (lines.isEmpty() || !lines.get(0).equals(JOURNAL_HEADER)) {
            throw new IOException(shown.resolve(JOURNAL) + " is not a journal of this version of odetab; remove it after checking the folder");
        }
        Map<String, String> pairs = new LinkedHashMap<>();
        for (String line : lines.subList(1, lines.size())) {
            int tab = line.indexOf('\t');
            String tmp = tab < 0 ? "" : unescape(line.substring(0, tab));
            String target = tab < 0 ? "" : unescape(line.substring(tab + 1));
            if (!isTemporary(tmp) || !isPlainName(target)) {
                throw new IOException(shown.resolve(JOURNAL) + " is damaged (line '" + line + "'); remove it after checking the folder");
            }
            pairs.put(tmp, target);
        }
        return pairs;
    }

    private static boolean isTemporary(String name) {
        return isPlainName(name) && name.startsWith(TEMPORARY_PREFIX) && name.endsWith(TEMPORARY_SUFFIX);
    }

    /** A name of a file directly inside the folder: one path element, not {@code .} or {@code ..}. */
    static boolean isPlainName(String name) {
        if (name.isEmpty() || name.equals(".") || name.equals("..") || name.indexOf('/') >= 0 || name.indexOf('\\') >= 0
                || name.indexOf('\0') >= 0) {
            return false;
        }
        return Path.of(name).getNameCount() == 1;
    }

    /**
     * A new empty file {@code .odetab-N.tmp} in the folder. Unlike {@link Files#createTempFile},
     * which makes it readable by its owner only, it gets the permissions of any new file (the
     * umask applies), which the output keeps after the rename.
     */
    public Path createTemporary() throws IOException {
        return createTemporary(dir);
    }

    static Path createTemporary(Path dir) throws IOException {
        while (true) {
            Path tmp = dir.resolve(TEMPORARY_PREFIX + Long.toUnsignedString(RANDOM.nextLong()) + TEMPORARY_SUFFIX);
            try {
                return Files.createFile(tmp);
            } catch (FileAlreadyExistsException e) {
                // another name
            }
        }
    }

    /**
     * Replaces the targets by the staged files ({@code staged}: target name → a temporary of
     * this folder, in the order of the renames). Every target is checked before the first
     * rename; an {@link IOException} from the checks changes nothing. After the journal is
     * written a failure leaves it, and the next run completes the commit.
     */
    public void commit(Map<String, Path> staged) throws IOException {
        for (String name : staged.keySet()) {
            if (!isPlainName(name) || name.startsWith(TEMPORARY_PREFIX)) {
                throw new IOException("refusing to write outside the output folder: " + name);
            }
            if (Files.isDirectory(dir.resolve(name), LinkOption.NOFOLLOW_LINKS)) {
                throw new IOException(shown.resolve(name) + " is a folder; nothing was written (remove it or choose another output folder)");
            }
        }
        if (!Files.isWritable(dir)) {
            throw new IOException(shown + " is not writable; nothing was written");
        }
        StringBuilder text = new StringBuilder(JOURNAL_HEADER).append('\n');
        for (Map.Entry<String, Path> e : staged.entrySet()) {
            sync(e.getValue());
            text.append(escape(e.getValue().getFileName().toString())).append('\t').append(escape(e.getKey())).append('\n');
        }
        Path journalTmp = createTemporary();
        Files.writeString(journalTmp, text, StandardCharsets.UTF_8);
        sync(journalTmp);
        move(journalTmp, dir.resolve(JOURNAL));
        syncFolder();
        committed = true;
        pause();
        for (Map.Entry<String, Path> e : staged.entrySet()) {
            move(e.getValue(), dir.resolve(e.getKey()));
            pause();
        }
        syncFolder();
        Files.delete(dir.resolve(JOURNAL));
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException x) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void sync(Path file) throws IOException {
        try (FileChannel c = FileChannel.open(file, StandardOpenOption.WRITE)) {
            c.force(true);
        }
    }

    /** Forces the folder's entries (the renames) to disk where the platform allows it. */
    private void syncFolder() {
        try (FileChannel c = FileChannel.open(dir, StandardOpenOption.READ)) {
            c.force(true);
        } catch (IOException e) {
            // not every platform opens folders; the renames are then as durable as it makes them
        }
    }

    private static void pause() {
        String millis = System.getProperty(PAUSE_PROPERTY);
        if (millis == null) {
            return;
        }
        try {
            Thread.sleep(Long.parseLong(millis));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** Journal lines are tab-separated: tab, line breaks and '%' in names are written as %XX. */
    private static String escape(String name) {
        return name.replace("%", "%25").replace("\t", "%09").replace("\n", "%0A").replace("\r", "%0D");
    }

    private static String unescape(String text) {
        return text.replace("%09", "\t").replace("%0A", "\n").replace("%0D", "\r").replace("%25", "%");
    }

    /**
     * Unlocks the folder and deletes its lock file; removes the folders {@link #open} created
     * when nothing was committed and they are empty.
     */
    @Override
    public void close() throws IOException {
        try {
            Files.deleteIfExists(dir.resolve(LOCK));
        } finally {
            try {
                lock.release();
            } finally {
                channel.close();
            }
        }
        if (!committed) {
            removeCreated(created);
        }
    }

    private static void removeCreated(List<Path> created) throws IOException {
        for (Path p : created) {
            if (!Files.isDirectory(p)) {
                continue;
            }
            try (DirectoryStream<Path> s = Files.newDirectoryStream(p)) {
                if (s.iterator().hasNext()) {
                    return;
                }
            }
            Files.delete(p);
        }
    }
}
