package org.kinduct.solver;

import java.util.Arrays;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.solver.field.GradientField;

/**
 * The integrals of rigid loop–source pairs ({@link RigidPair}) kept between the runs of variants
 * of one scene, as a design study makes: a source and a loop that the varied value leaves alone
 * give, at each instant, the same flux, flux rate, motional EMF and force per ampere in every
 * point, so only the pairs the value touches are integrated again. A pair's integrals are a pure
 * function of the source as written, the two bodies' poses, the loop's placed vertices and the
 * time, which together are the key, so a kept value is the one a fresh run computes, bit for bit.
 *
 * <p>Bounded: once about {@value #MAX_STORED_DOUBLES} numbers of keys are held, new pairs are
 * computed and not kept (the first point's pairs, which later points reuse, are kept first). Safe
 * to share between threads: a pair asked for by two at once is integrated by one while the other
 * waits for it.
 */
public final class PairMemo {

    /** Keeps nothing: every pair is integrated afresh. */
    public static final PairMemo NONE = new PairMemo(0);

    /** Numbers held in keys at most: 32 MB of vertices, a few hundred thousand small loops' pairs. */
    static final long MAX_STORED_DOUBLES = 4_000_000L;

    private final long maxStoredDoubles;
    private final ConcurrentHashMap<Key, RigidPair> pairs = new ConcurrentHashMap<>();
    private final AtomicLong stored = new AtomicLong();
    private final AtomicLong reused = new AtomicLong();
    private final AtomicLong computed = new AtomicLong();

    /** A memo for the runs of one study. */
    public PairMemo() {
        this(MAX_STORED_DOUBLES);
    }

    PairMemo(long maxStoredDoubles) {
        this.maxStoredDoubles = maxStoredDoubles;
    }

    /** Pairs taken from the memo so far. */
    public long reused() {
        return reused.get();
    }

    /** Pairs integrated so far. */
    public long computed() {
        return computed.get();
    }

    RigidPair pair(Source source, GradientField field, Pose sourcePose, PlacedConductor loop, Pose loopPose,
                   double tS) {
        if (maxStoredDoubles == 0) {
            computed.incrementAndGet();
            return RigidPair.of(field, sourcePose, loop, loopPose);
        }
        Key key = new Key(source, sourcePose, loopPose, tS, loop.xs(), loop.ys());
        RigidPair kept = pairs.get(key);
        if (kept != null) {
            reused.incrementAndGet();
            return kept;
        }
        long size = 2L * loop.xs().length;
        if (stored.get() + size > maxStoredDoubles) {
            computed.incrementAndGet();
            return RigidPair.of(field, sourcePose, loop, loopPose);
        }
        // Computed inside the map, so that threads asking for one pair at once integrate it once.
        boolean[] fresh = {false};
        RigidPair pair = pairs.computeIfAbsent(key, k -> {
            fresh[0] = true;
            stored.addAndGet(size);
            return RigidPair.of(field, sourcePose, loop, loopPose);
        });
        (fresh[0] ? computed : reused).incrementAndGet();
        return pair;
    }

    /** What a pair's integrals depend on; the vertex arrays are the solver's own, never changed once placed. */
    private static final class Key {
        private final Source source;
        private final Pose sourcePose;
        private final Pose loopPose;
        private final double tS;
        private final double[] xs;
        private final double[] ys;
        private final int hash;

        Key(Source source, Pose sourcePose, Pose loopPose, double tS, double[] xs, double[] ys) {
            this.source = source;
            this.sourcePose = sourcePose;
            this.loopPose = loopPose;
            this.tS = tS;
            this.xs = xs;
            this.ys = ys;
            this.hash = Objects.hash(source, sourcePose, loopPose, tS, Arrays.hashCode(xs), Arrays.hashCode(ys));
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && hash == k.hash && Double.compare(tS, k.tS) == 0 && Arrays.equals(xs, k.xs)
                    && Arrays.equals(ys, k.ys) && sourcePose.equals(k.sourcePose) && loopPose.equals(k.loopPose)
                    && source.equals(k.source);
        }

        @Override
        public int hashCode() {
            return hash;
        }
    }
}
