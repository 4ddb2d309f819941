package org.tautline.app.ui.project;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

/**
 * The recently used project files, newest first, kept in a small text file (one path a line).
 *
 * <p>The default place is {@code $XDG_CONFIG_HOME/tautline/recent-projects.txt}, or
 * {@code ~/.config/tautline/recent-projects.txt} when that variable is not set.
 */
public final class RecentFiles {
    /** How many paths are kept. */
    public static final int LIMIT = 8;
    private final Path store;

    /** @param store the text file that holds the list */
    public RecentFiles(Path store) {
        this.store = store;
    }

    /** @return the list in the user's configuration folder */
    public static RecentFiles inUserConfig() {
        String xdg = System.getenv("XDG_CONFIG_HOME");
        Path base = xdg == null || xdg.isBlank() ? Path.of(System.getProperty("user.home"), ".config") : Path.of(xdg);
        return new RecentFiles(base.resolve("tautline").resolve("recent-projects.txt"));
    }

    /** @return the paths, newest first; empty when the list has never been written or cannot be read */
    public List<Path> list() {
        if (!Files.isRegularFile(store)) {
            return List.of();
        }
        try {
            return Files.readAllLines(store, StandardCharsets.UTF_8).stream().filter(l -> !l.isBlank()).map(Path::of)
                    .limit(LIMIT).toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    /**
     * Puts a file first, dropping an older entry for it and the oldest beyond {@link #LIMIT}.
     *
     * @param file the file just opened or saved
     * @throws IOException when the list cannot be written
     */
    public void add(Path file) throws IOException {
        Path absolute = file.toAbsolutePath().normalize();
        List<Path> paths = new ArrayList<>();
        paths.add(absolute);
        for (Path p : list()) {
            if (!p.equals(absolute) && paths.size() < LIMIT) {
                paths.add(p);
            }
        }
        Files.createDirectories(store.toAbsolutePath().getParent());
        Path temp = Files.createTempFile(store.toAbsolutePath().getParent(), ".recent", ".tmp");
        Files.write(temp, paths.stream().map(Path::toString).toList(), StandardCharsets.UTF_8);
        Files.move(temp, store, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
    }
}
