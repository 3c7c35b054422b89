package barfit.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.JarURLConnection;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.jar.JarFile;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The native libraries unpacked once beside the jar (the launcher's start-up cache): every library of
 * this platform, byte for byte, in a folder named after the jar they come from, marked complete only
 * when whole, and a second unpacking keeps the first and leaves nothing behind.
 */
class OrToolsCacheTest {
    @TempDir
    Path base;

    @Test
    void unpacksEveryLibraryOnceIntoAFolderNamedAfterItsJar() throws IOException {
        var url = OrTools.class.getClassLoader().getResource(OrTools.prefix());
        assertTrue(url != null && url.getProtocol().equals("jar"), "this platform's libraries come in a jar: " + url);
        Path jar = Path.of(java.net.URI.create(
                ((JarURLConnection) url.openConnection()).getJarFileURL().toString()));
        Path dir = OrTools.cacheFolder(base);
        assertEquals(base.resolve(jar.getFileName().toString().replace(".jar", "")), dir);

        OrTools.unpack(jar, OrTools.prefix(), base, dir);
        assertTrue(Files.isRegularFile(dir.resolve(OrTools.COMPLETE)));
        int libraries = 0;
        try (JarFile jf = new JarFile(jar.toFile())) {
            for (var e = jf.entries(); e.hasMoreElements(); ) {
                var entry = e.nextElement();
                if (entry.isDirectory() || !entry.getName().startsWith(OrTools.prefix())) {
                    continue;
                }
                Path file =
                        dir.resolve(entry.getName().substring(OrTools.prefix().length()));
                assertEquals(entry.getSize(), Files.size(file), file.toString());
                libraries++;
            }
        }
        assertTrue(Files.isRegularFile(dir.resolve(System.mapLibraryName("jniortools"))));
        assertTrue(libraries > 1, "the JNI library and what it links to");
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(libraries + 1, s.count(), "the libraries and the mark, nothing else");
        }

        long written = Files.getLastModifiedTime(dir.resolve(OrTools.COMPLETE)).toMillis();
        OrTools.unpack(jar, OrTools.prefix(), base, dir); // as a second run racing the first would
        assertEquals(
                written,
                Files.getLastModifiedTime(dir.resolve(OrTools.COMPLETE)).toMillis(),
                "the first is kept");
        try (Stream<Path> s = Files.list(base)) {
            assertEquals(List.of(dir), s.toList(), "no half-unpacked folder left behind");
        }
    }
}
