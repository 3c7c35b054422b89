package barfit.catalogs;

import barfit.catalogs.yaml.Location;
import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;

/**
 * Reading the user's files: UTF-8 only, up to a stated size, and every failure said in words (a folder,
 * no permission, a link loop, not UTF-8 at line, column and byte) as a one-line {@link InputError}.
 */
public final class InputFiles {
    /** The largest YAML file barfit reads: 4 MB holds some 20 000 beams written inline. */
    public static final long YAML_MAX_BYTES = 4L * 1024 * 1024;
    /** The largest beams CSV barfit reads: 8 MB holds some 80 000 rows. */
    public static final long CSV_MAX_BYTES = 8L * 1024 * 1024;

    private static final long MB = 1024 * 1024;

    private InputFiles() {}

    /**
     * The whole text of {@code path}, at most {@code maxBytes} long; {@code kind} names the file expected
     * ("a YAML file") and {@code advice} says what to do with a larger one.
     */
    public static String readText(Path path, String kind, long maxBytes, String advice) {
        requireReadableFile(path, kind, maxBytes, advice);
        byte[] bytes;
        try (InputStream in = Files.newInputStream(path)) {
            bytes = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 16, maxBytes + 1));
        } catch (IOException e) {
            throw cannotRead(path, e, kind);
        }
        if (bytes.length > maxBytes) {
            throw tooLarge(path, -1, maxBytes, kind, advice);
        }
        CharsetDecoder dec = strictDecoder();
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult r = dec.decode(in, out, true);
        if (r.isError()) {
            throw notUtf8(path, bytes, 0, in.position(), 1, kind);
        }
        dec.flush(out);
        out.flip();
        return out.toString();
    }

    /** Reads a file line by line (line breaks: LF, CR LF or CR), checking size and encoding as it goes. */
    public static Lines lines(Path path, String kind, long maxBytes, String advice) {
        requireReadableFile(path, kind, maxBytes, advice);
        try {
            return new Lines(path, Files.newInputStream(path), kind, maxBytes, advice);
        } catch (IOException e) {
            throw cannotRead(path, e, kind);
        }
    }

    /** Lines of a UTF-8 file, decoded one at a time; {@link #next} gives null at the end. */
    public static final class Lines implements Closeable {
        private final Path path;
        private final InputStream in;
        private final String kind;
        private final long maxBytes;
        private final String advice;
        private final byte[] buf = new byte[1 << 16];
        private int bufLen;
        private int bufPos;
        private long offset; // bytes of the file consumed before buf[bufPos]
        private int line; // the number of the line last returned
        private boolean eof;
        private final java.util.ArrayDeque<String> pending = new java.util.ArrayDeque<>(); // lines split at a lone CR

        private Lines(Path path, InputStream in, String kind, long maxBytes, String advice) {
            this.path = path;
            this.in = in;
            this.kind = kind;
            this.maxBytes = maxBytes;
            this.advice = advice;
        }

        /** The number (from 1) of the line {@link #next} gave last. */
        public int lineNumber() {
            return line;
        }

        /** The next line without its line break, or null at the end of the file. */
        public String next() {
            if (!pending.isEmpty()) {
                line++;
                return pending.poll();
            }
            java.io.ByteArrayOutputStream raw = new java.io.ByteArrayOutputStream();
            long start = offset;
            boolean any = false;
            while (true) {
                if (bufPos == bufLen) {
                    if (eof || !fill()) {
                        break;
                    }
                }
                any = true;
                int i = bufPos;
                while (i < bufLen && buf[i] != '\n') {
                    i++;
                }
                raw.write(buf, bufPos, i - bufPos);
                offset += i - bufPos;
                bufPos = i;
                if (i < bufLen) { // the line break
                    bufPos++;
                    offset++;
                    break;
                }
            }
            if (!any) {
                return null;
            }
            byte[] bytes = raw.toByteArray();
            int len = bytes.length;
            if (len > 0 && bytes[len - 1] == '\r') {
                len--;
            }
            CharsetDecoder dec = strictDecoder();
            ByteBuffer bb = ByteBuffer.wrap(bytes, 0, len);
            CharBuffer out = CharBuffer.allocate(len + 1);
            CoderResult r = dec.decode(bb, out, true);
            if (r.isError()) {
                throw notUtf8(path, bytes, 0, bb.position(), line + 1, start, kind);
            }
            dec.flush(out);
            out.flip();
            String text = out.toString();
            if (text.indexOf('\r') >= 0) { // old line breaks: a lone CR ends a line too
                String[] parts = text.split("\r", -1);
                for (int k = 1; k < parts.length; k++) {
                    pending.add(parts[k]);
                }
                text = parts[0];
            }
            line++;
            return text;
        }

        private boolean fill() {
            try {
                int n = in.read(buf);
                if (n <= 0) {
                    eof = true;
                    bufLen = 0;
                    bufPos = 0;
                    return false;
                }
                bufLen = n;
                bufPos = 0;
                if (offset + n > maxBytes) {
                    throw tooLarge(path, -1, maxBytes, kind, advice);
                }
                return true;
            } catch (IOException e) {
                throw cannotRead(path, e, kind);
            }
        }

        @Override
        public void close() {
            try {
                in.close();
            } catch (IOException ignored) {
                // reading is over; nothing the user can do about a failed close of a file only read
            }
        }
    }

    /** Before opening: a folder, a link loop or a dangling link, and a regular file over the limit. */
    private static void requireReadableFile(Path path, String kind, long maxBytes, String advice) {
        Location at = Location.ofFile(path.toString());
        if (Files.isDirectory(path)) {
            throw new InputError(at, "is a folder, not a file; expected " + kind);
        }
        if (Files.isSymbolicLink(path) && !Files.exists(path)) {
            throw new InputError(
                    at,
                    linkLoop(path)
                            ? "is a symbolic link that leads back to itself (a link loop); " + "expected " + kind
                            : "is a symbolic link to a file that does not exist; expected " + kind);
        }
        if (Files.isRegularFile(path)) {
            try {
                long size = Files.size(path);
                if (size > maxBytes) {
                    throw tooLarge(path, size, maxBytes, kind, advice);
                }
            } catch (IOException e) {
                throw cannotRead(path, e, kind);
            }
        }
    }

    private static boolean linkLoop(Path path) {
        Set<Path> seen = new HashSet<>();
        Path p = path.toAbsolutePath().normalize();
        for (int i = 0; i < 64 && Files.isSymbolicLink(p); i++) {
            if (!seen.add(p)) {
                return true;
            }
            try {
                Path target = Files.readSymbolicLink(p);
                Path parent = p.getParent();
                p = (parent == null ? target : parent.resolve(target))
                        .toAbsolutePath()
                        .normalize();
            } catch (IOException e) {
                return false;
            }
        }
        return Files.isSymbolicLink(p); // 64 links deep: a loop for any practical purpose
    }

    /** An I/O failure in words, never an exception's class name. */
    public static InputError cannotRead(Path path, IOException e, String kind) {
        Location at = Location.ofFile(path.toString());
        if (e instanceof NoSuchFileException) {
            return new InputError(at, "no such file; expected " + kind);
        }
        if (e instanceof AccessDeniedException) {
            return new InputError(at, "no permission to read it; expected " + kind + " barfit may read");
        }
        if (Files.isDirectory(path)) {
            return new InputError(at, "is a folder, not a file; expected " + kind);
        }
        if (Files.isSymbolicLink(path) && linkLoop(path)) {
            return new InputError(at, "is a symbolic link that leads back to itself (a link loop); expected " + kind);
        }
        String reason = e instanceof FileSystemException f && f.getReason() != null ? f.getReason() : e.getMessage();
        return new InputError(
                at,
                "cannot be read"
                        + (reason == null || reason.isBlank()
                                ? ""
                                : " (" + Echo.cut(reason.strip()).toLowerCase(Locale.ROOT) + ")")
                        + "; expected " + kind
                        + " barfit may read");
    }

    private static InputError tooLarge(Path path, long size, long maxBytes, String kind, String advice) {
        String limit = maxBytes >= MB
                ? String.format(Locale.ROOT, "%d MB (%,d bytes)", maxBytes / MB, maxBytes)
                : String.format(Locale.ROOT, "%,d bytes", maxBytes);
        String is = size < 0
                ? "is more than"
                : (size >= MB
                                ? String.format(Locale.ROOT, "is %.1f MB", size / (double) MB)
                                : String.format(Locale.ROOT, "is %,d bytes", size))
                        + ", more than";
        return new InputError(
                Location.ofFile(path.toString()), is + " the " + limit + " barfit reads from " + kind + "; " + advice);
    }

    private static InputError notUtf8(Path path, byte[] bytes, int from, int bad, int firstLine, String kind) {
        return notUtf8(path, bytes, from, bad, firstLine, 0, kind);
    }

    /**
     * Where the first byte that is not UTF-8 sits: {@code bytes[from..]} starts line {@code firstLine} at
     * file offset {@code base}; the byte at {@code bad} is the culprit.
     */
    private static InputError notUtf8(
            Path path, byte[] bytes, int from, int bad, int firstLine, long base, String kind) {
        int line = firstLine;
        int lineStart = from;
        for (int i = from; i < bad; i++) {
            if (bytes[i] == '\n') {
                line++;
                lineStart = i + 1;
            }
        }
        String before = new String(bytes, lineStart, bad - lineStart, StandardCharsets.UTF_8);
        int column = before.codePointCount(0, before.length()) + 1;
        return new InputError(
                new Location(path.toString(), line, column),
                String.format(
                        Locale.ROOT,
                        "not valid UTF-8 text (byte 0x%02X, byte %,d of the file); expected %s saved as UTF-8",
                        bytes[bad] & 0xff,
                        base + bad + 1,
                        kind));
    }

    private static CharsetDecoder strictDecoder() {
        return StandardCharsets.UTF_8
                .newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
    }
}
