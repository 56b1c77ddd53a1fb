package org.kinduct.scene;

import java.util.List;

/**
 * The mean velocity v̄(t) of the liquid in a channel, m/s, positive from the centreline's start to
 * its end: the flow rate over the cross-section. The profile across the width is the channel's.
 */
public sealed interface MeanFlow permits MeanFlow.Steady, MeanFlow.Sinusoid, MeanFlow.Keys {

    /** v̄ at {@code tS}, m/s. */
    double velocityAt(double tS);

    /** The largest |v̄| the schedule reaches, m/s. */
    double peakMPerS();

    /** Dispatches to the case for this kind (see {@link Conductor#match}). */
    <R> R match(Cases<R> cases);

    /** One method per kind of schedule. */
    interface Cases<R> {
        R steady(Steady steady);

        R sinusoid(Sinusoid sinusoid);

        R keys(Keys keys);
    }

    /** A constant mean velocity. */
    record Steady(double velocityMPerS) implements MeanFlow {
        public Steady {
            Checks.finite(velocityMPerS, "mean velocity");
        }

        @Override
        public double velocityAt(double tS) {
            return velocityMPerS;
        }

        @Override
        public double peakMPerS() {
            return Math.abs(velocityMPerS);
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.steady(this);
        }
    }

    /** v̄(t) = offset + amplitude·sin(2πft + phase), a pulsating or reversing flow. */
    record Sinusoid(double offsetMPerS, double amplitudeMPerS, double frequencyHz, double phaseRad)
            implements MeanFlow {
        public Sinusoid {
            Checks.finite(offsetMPerS, "mean velocity offset");
            Checks.finite(amplitudeMPerS, "mean velocity amplitude");
            Checks.positive(frequencyHz, "frequency");
            Checks.finite(phaseRad, "phase");
        }

        @Override
        public double velocityAt(double tS) {
            return offsetMPerS + amplitudeMPerS * Math.sin(2 * Math.PI * frequencyHz * tS + phaseRad);
        }

        @Override
        public double peakMPerS() {
            return Math.abs(offsetMPerS) + Math.abs(amplitudeMPerS);
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.sinusoid(this);
        }
    }

    /** Mean velocities at given times, linear in between, held before the first key and after the last. */
    record Keys(List<Key> keys) implements MeanFlow {
        public Keys {
            keys = List.copyOf(Checks.nonNull(keys, "keys"));
            if (keys.size() < 2) {
                throw new IllegalArgumentException("a flow schedule needs at least two keys, got " + keys.size());
            }
            for (int i = 1; i < keys.size(); i++) {
                if (!(keys.get(i).tS() > keys.get(i - 1).tS())) {
                    throw new IllegalArgumentException("flow key times must increase: key " + i + " at "
                            + keys.get(i).tS() + " s follows " + keys.get(i - 1).tS() + " s");
                }
            }
        }

        @Override
        public double velocityAt(double tS) {
            int n = keys.size();
            if (tS <= keys.get(0).tS()) {
                return keys.get(0).velocityMPerS();
            }
            if (tS >= keys.get(n - 1).tS()) {
                return keys.get(n - 1).velocityMPerS();
            }
            int i = 0;
            while (keys.get(i + 1).tS() < tS) {
                i++;
            }
            Key a = keys.get(i);
            Key b = keys.get(i + 1);
            return a.velocityMPerS() + (b.velocityMPerS() - a.velocityMPerS()) * (tS - a.tS()) / (b.tS() - a.tS());
        }

        @Override
        public double peakMPerS() {
            return keys.stream().mapToDouble(k -> Math.abs(k.velocityMPerS())).max().orElse(0);
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.keys(this);
        }

        /** The mean velocity at {@code tS}, seconds. */
        public record Key(double tS, double velocityMPerS) {
            public Key {
                Checks.finite(tS, "key time");
                Checks.finite(velocityMPerS, "key mean velocity");
            }
        }
    }
}
