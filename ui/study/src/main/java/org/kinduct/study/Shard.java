package org.kinduct.study;

/**
 * Part {@code index} of {@code count} of a study: the points k with k mod count = index − 1.
 * Interleaving, rather than cutting into blocks, spreads slow and fast points (costs often grow
 * along an axis) evenly over the parts.
 */
public record Shard(int index, int count) {

    public Shard {
        if (count < 1 || index < 1 || index > count) {
            throw new IllegalArgumentException("shard " + index + "/" + count + ": expected K/N with 1 ≤ K ≤ N");
        }
    }

    /** The whole study as one part. */
    public static final Shard WHOLE = new Shard(1, 1);

    /** Reads {@code K/N}. */
    public static Shard parse(String text) {
        String[] parts = text.strip().split("/", -1);
        try {
            if (parts.length == 2) {
                return new Shard(Integer.parseInt(parts[0].strip()), Integer.parseInt(parts[1].strip()));
            }
        } catch (NumberFormatException e) {
            // the message below says what is expected
        }
        throw new IllegalArgumentException("shard '" + text + "': expected K/N, e.g. 2/4 for the second of four parts");
    }

    public boolean contains(int point) {
        return point % count == index - 1;
    }

    public boolean whole() {
        return count == 1;
    }

    @Override
    public String toString() {
        return index + "/" + count;
    }
}
