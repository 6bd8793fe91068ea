package org.eddycast.scenario;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Reads a text file that must be UTF-8, and says plainly what is wrong when it is not: a folder, a binary
 * file, UTF-16 or UTF-32 text, or text in a single-byte encoding such as Latin-1 (with the line and byte at
 * fault). A UTF-8 byte-order mark (EF BB BF), which some editors write, is accepted and dropped.
 *
 * <p>The encodings are recognised by their byte-order marks (The Unicode Standard, ch. 23.8, "Byte Order
 * Mark") and, without one, by the zero bytes UTF-16 puts beside every ASCII character; a file with other zero
 * bytes is binary. Anything else that is not valid UTF-8 is reported as a single-byte encoding (Latin-1 or
 * Windows-1252 are the usual ones), which is what such files nearly always are.
 */
public final class TextFiles {

    private TextFiles() {
    }

    /**
     * The text of a UTF-8 file.
     *
     * @param what what the file should be, for messages ("scenario file", "record file")
     * @throws IOException naming the file and what it is instead of UTF-8 text
     */
    public static String readUtf8(Path file, String what) throws IOException {
        if (Files.isDirectory(file)) {
            throw new IOException(file + " is a folder, not a " + what + ": name a file inside it");
        }
        byte[] bytes = Files.readAllBytes(file);
        return decodeUtf8(bytes, file + " (" + what + ")");
    }

    /**
     * Decodes UTF-8 bytes, dropping a leading byte-order mark.
     *
     * @param name the file's name and role, for messages
     * @throws IOException naming the encoding found instead of UTF-8
     */
    public static String decodeUtf8(byte[] bytes, String name) throws IOException {
        String other = foreignEncoding(bytes);
        if (other != null) {
            throw new IOException(name + " is not UTF-8 text: it is " + other + "; save it as UTF-8 text");
        }
        int start = hasUtf8Mark(bytes) ? 3 : 0;
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes, start, bytes.length - start)).toString();
        } catch (MalformedInputException e) {
            int at = firstInvalid(bytes, start);
            throw new IOException(String.format(Locale.ROOT, "%s is not UTF-8 text: byte 0x%02X on line %d is not "
                    + "valid UTF-8; the file looks like single-byte text (Latin-1 or Windows-1252): save it as "
                    + "UTF-8 text", name, bytes[at] & 0xff, line(bytes, at)));
        } catch (CharacterCodingException e) {
            throw new IOException(name + " is not UTF-8 text (" + e + "); save it as UTF-8 text", e);
        }
    }

    /**
     * Checks the start of a file that is read as a stream: a folder, UTF-16 or UTF-32 text or a binary file is
     * refused before any line is parsed.
     *
     * @throws IOException naming the file and what it is instead of UTF-8 text
     */
    public static void checkStart(Path file, String what) throws IOException {
        if (Files.isDirectory(file)) {
            throw new IOException(file + " is a folder, not a " + what + ": name a file inside it");
        }
        byte[] head;
        try (java.io.InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes(4096);
        }
        String other = foreignEncoding(head);
        if (other != null) {
            throw new IOException(file + " (" + what + ") is not UTF-8 text: it is " + other
                    + "; save it as UTF-8 text");
        }
    }

    /** A description of a recognisably different encoding, or null when the bytes may be UTF-8. */
    static String foreignEncoding(byte[] b) {
        if (startsWith(b, 0x00, 0x00, 0xFE, 0xFF)) {
            return "UTF-32 text (big-endian byte-order mark 00 00 FE FF)";
        }
        if (startsWith(b, 0xFF, 0xFE, 0x00, 0x00)) {
            return "UTF-32 text (little-endian byte-order mark FF FE 00 00)";
        }
        if (startsWith(b, 0xFE, 0xFF)) {
            return "UTF-16 text (big-endian byte-order mark FE FF)";
        }
        if (startsWith(b, 0xFF, 0xFE)) {
            return "UTF-16 text (little-endian byte-order mark FF FE)";
        }
        int zeros = 0;
        int[] zerosAt = new int[4];
        for (int i = 0; i < b.length; i++) {
            if (b[i] == 0) {
                zeros++;
                zerosAt[i & 3]++;
            }
        }
        if (zeros == 0) {
            return null;
        }
        int zerosAtEven = zerosAt[0] + zerosAt[2];
        int zerosAtOdd = zerosAt[1] + zerosAt[3];
        // ASCII in UTF-32 is three zeros and one character in every four bytes
        if (zeros * 8 >= b.length * 5 && zerosAt[1] > 0 && zerosAt[2] > 0 && (zerosAt[3] == 0 || zerosAt[0] == 0)) {
            return "UTF-32 text without a byte-order mark (" + (zerosAt[3] == 0 ? "big" : "little") + "-endian)";
        }
        // ASCII in UTF-16 puts a zero beside every character: all zeros on one parity, about half the bytes
        if (zeros * 3 >= b.length && (zerosAtOdd == 0 || zerosAtEven == 0)) {
            return "UTF-16 text without a byte-order mark (" + (zerosAtOdd == 0 ? "big" : "little") + "-endian)";
        }
        return "a binary file (it holds zero bytes, which text never does)";
    }

    private static boolean hasUtf8Mark(byte[] b) {
        return startsWith(b, 0xEF, 0xBB, 0xBF);
    }

    private static boolean startsWith(byte[] b, int... prefix) {
        if (b.length < prefix.length) {
            return false;
        }
        for (int i = 0; i < prefix.length; i++) {
            if ((b[i] & 0xff) != prefix[i]) {
                return false;
            }
        }
        return true;
    }

    /** The index of the first byte that does not start or continue a valid UTF-8 sequence. */
    private static int firstInvalid(byte[] b, int start) {
        int i = start;
        while (i < b.length) {
            int c = b[i] & 0xff;
            int length = c < 0x80 ? 1 : c >= 0xC2 && c <= 0xDF ? 2 : c >= 0xE0 && c <= 0xEF ? 3
                    : c >= 0xF0 && c <= 0xF4 ? 4 : 0;
            if (length == 0 || i + length > b.length) {
                return i;
            }
            for (int k = 1; k < length; k++) {
                if ((b[i + k] & 0xC0) != 0x80) {
                    return i;
                }
            }
            i += length;
        }
        return Math.max(start, b.length - 1);
    }

    private static int line(byte[] b, int index) {
        int line = 1;
        for (int i = 0; i < index; i++) {
            if (b[i] == '\n') {
                line++;
            }
        }
        return line;
    }
}
