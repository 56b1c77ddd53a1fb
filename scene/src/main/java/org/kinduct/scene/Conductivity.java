package org.kinduct.scene;

/**
 * The conductivity of a plate: that of a named {@link Material} at a temperature, or a value
 * given outright (an alloy or temper the list lacks, a measured sample).
 */
public sealed interface Conductivity permits Conductivity.OfMaterial, Conductivity.Given {

    /** Conductivity, S/m. */
    double sigmaSPerM();

    /** Dispatches to the case for this kind (see {@link Conductor#match}). */
    <R> R match(Cases<R> cases);

    /** One method per kind of conductivity. */
    interface Cases<R> {
        R material(OfMaterial material);

        R given(Given given);
    }

    /** σ = 1/ρ(T) of a material at {@code temperatureC}, °C (see {@link Material#resistivityAt}). */
    record OfMaterial(Material material, double temperatureC) implements Conductivity {
        public OfMaterial {
            Checks.nonNull(material, "material");
            Checks.finite(temperatureC, "temperature");
            if (temperatureC < -273.15) {
                throw new IllegalArgumentException("temperature must be above absolute zero, got " + temperatureC);
            }
            if (!(material.resistivityAt(temperatureC) > 0)) {
                throw new IllegalArgumentException("the linear resistivity model of " + material
                        + " gives no positive resistivity at " + temperatureC + " °C");
            }
        }

        @Override
        public double sigmaSPerM() {
            return 1 / material.resistivityAt(temperatureC);
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.material(this);
        }
    }

    /** A conductivity as given, S/m. */
    record Given(double sigmaSPerM) implements Conductivity {
        public Given {
            Checks.positive(sigmaSPerM, "conductivity");
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.given(this);
        }
    }
}
