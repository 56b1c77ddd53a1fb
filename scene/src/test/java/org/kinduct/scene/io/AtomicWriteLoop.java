package org.kinduct.scene.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * The writer {@link KilledWriteTest} kills: saves {@link #content numbered, self-checking
 * contents} to the file named by its argument over and over with
 * {@link SceneFiles#writeAtomically}, printing "wrote N" after each save.
 */
final class AtomicWriteLoop {

    /** Large enough that a kill often lands inside a write. */
    static final int PAYLOAD_BYTES = 2 << 20;

    private AtomicWriteLoop() {
    }

    public static void main(String[] args) throws IOException {
        Path target = Path.of(args[0]);
        for (long n = 0; ; n++) {
            SceneFiles.writeAtomically(target, content(n));
            System.out.println("wrote " + n);
        }
    }

    /** "n length\n", then the payload, every byte n mod 251, then "end n\n". */
    static byte[] content(long n) {
        byte[] head = (n + " " + PAYLOAD_BYTES + "\n").getBytes(StandardCharsets.US_ASCII);
        byte[] tail = ("end " + n + "\n").getBytes(StandardCharsets.US_ASCII);
        byte[] all = new byte[head.length + PAYLOAD_BYTES + tail.length];
        System.arraycopy(head, 0, all, 0, head.length);
        Arrays.fill(all, head.length, head.length + PAYLOAD_BYTES, (byte) (n % 251));
        System.arraycopy(tail, 0, all, head.length + PAYLOAD_BYTES, tail.length);
        return all;
    }

    /** True when {@code bytes} is exactly one whole {@link #content}. */
    static boolean complete(byte[] bytes) {
        int newline = 0;
        while (newline < bytes.length && bytes[newline] != '\n') {
            newline++;
        }
        String[] head = new String(bytes, 0, newline, StandardCharsets.US_ASCII).split(" ");
        try {
            return head.length == 2 && Arrays.equals(bytes, content(Long.parseLong(head[0])));
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
