package dev.penduline.physics.inertia;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.random.RandomGenerator;
import org.hipparchus.random.Well19937c;
import org.hipparchus.stat.descriptive.rank.Percentile;

import dev.penduline.physics.InvalidValueException;

/**
 * How far the mechanism's mass, centroid distance, pivot inertia and small-angle period can move
 * within the parts' ± tolerances, by two methods side by side:
 * <ul>
 * <li><b>Monte Carlo</b>: every toleranced input (each part's mass; each coordinate of its
 * centroid and each dimension of its shape for the dimension tolerance) is drawn uniformly
 * within ± its tolerance, independently, and the parts list is computed again;</li>
 * <li><b>linearised</b>: the law of propagation of uncertainty for independent inputs (GUM,
 * JCGM 100:2008, 5.1.2), each input's standard uncertainty being that of the uniform
 * distribution, tolerance/√3 (GUM 4.3.7), and each sensitivity a central difference.</li>
 * </ul>
 * The two agree while the outputs are close to linear in the inputs over the tolerances; where
 * they do not (a centroid near the axis, say), the Monte Carlo percentiles are the ones to read.
 * The copies of a part with a quantity above one vary together (one draw per parts-list line),
 * which over-states their spread a little. A part's mass moves only with its mass tolerance (also
 * for a part whose mass came from a density), and a dimension of zero (an idealised plate, say)
 * stays zero. A draw whose parts list cannot be computed (a cut-out larger than its solid, a
 * dimension or mass below zero) is left out and counted.
 */
public final class ToleranceSpread {

    /** One figure's spread. */
    public record Spread(double nominal, double linearSigma, double mean, double sigma, double p5, double p95) {
    }

    /**
     * The spread of the lumped properties.
     *
     * @param samples          Monte Carlo draws asked for
     * @param failed           draws left out because their parts list could not be computed
     * @param seed             the seed of the draws
     * @param inputs           how many toleranced inputs there are
     * @param mass             total mass (kg)
     * @param centroidDistance Lc (m)
     * @param pivotInertia     J0 (kg·m²)
     * @param period           small-angle period (s)
     * @param draws            each successful draw's {m, Lc, J0} (for carrying into predictions)
     */
    public record Result(int samples, int failed, long seed, int inputs, Spread mass, Spread centroidDistance,
            Spread pivotInertia, Spread period, List<double[]> draws) {

        /** Freezes the list. */
        public Result {
            draws = List.copyOf(draws);
        }
    }

    /** Relative step of the central differences, as a fraction of each input's tolerance. */
    private static final double STEP = 1e-3;

    /**
     * The draws a spread takes unless told otherwise ({@code penduline inertia}, the reports, the
     * workbench). With M = 2 000 draws the spread σ is known to about 1.6 % (the relative standard
     * error of a standard deviation from M normal draws is 1/√(2(M − 1))); JCGM 101:2008 asks for
     * far more trials (of the order of 10⁶, from memory) for a coverage interval good to two digits,
     * so the 5–95 % percentiles are a guide, not a certified interval.
     */
    public static final int DEFAULT_DRAWS = 2000;

    private ToleranceSpread() {
    }

    /**
     * Whether any part carries a tolerance.
     *
     * @param parts the parts
     * @return true when a spread can be computed
     */
    public static boolean applies(List<Part> parts) {
        return parts.stream().anyMatch(p -> !p.tolerance().isNone());
    }

    /**
     * Computes the spread.
     *
     * @param engine  the inertia engine (axis, gravity)
     * @param parts   the parts with their tolerances
     * @param samples Monte Carlo draws, ≥ 2
     * @param seed    the seed
     * @return the spread
     * @throws IllegalArgumentException when the nominal parts list cannot be computed
     */
    public static Result of(PivotInertia engine, List<Part> parts, int samples, long seed) {
        if (samples < 2) {
            throw new InvalidValueException("samples must be at least 2, got " + samples);
        }
        final List<Input> inputs = inputs(parts);
        final double[] nominal = figures(engine, parts);
        final double[] variance = new double[4];
        for (int i = 0; i < inputs.size(); i++) {
            final double[] delta = new double[inputs.size()];
            final double h = STEP * inputs.get(i).halfWidth;
            delta[i] = h;
            final double[] up = figures(engine, apply(parts, inputs, delta));
            delta[i] = -h;
            final double[] down = figures(engine, apply(parts, inputs, delta));
            final double u2 = inputs.get(i).halfWidth * inputs.get(i).halfWidth / 3;
            for (int k = 0; k < 4; k++) {
                final double slope = (up[k] - down[k]) / (2 * h);
                variance[k] += slope * slope * u2;
            }
        }
        final RandomGenerator random = new Well19937c(seed);
        final List<double[]> drawn = new ArrayList<>(samples);
        int failed = 0;
        for (int n = 0; n < samples; n++) {
            final double[] delta = new double[inputs.size()];
            for (int i = 0; i < delta.length; i++) {
                delta[i] = (2 * random.nextDouble() - 1) * inputs.get(i).halfWidth;
            }
            try {
                drawn.add(figures(engine, apply(parts, inputs, delta)));
            } catch (InvalidValueException e) {
                failed++;
            }
        }
        final Spread[] spreads = new Spread[4];
        for (int k = 0; k < 4; k++) {
            final int column = k;
            spreads[k] = spread(nominal[k], Math.sqrt(variance[k]), drawn.stream().mapToDouble(d -> d[column]).toArray());
        }
        final List<double[]> lumped = drawn.stream().map(d -> new double[] {d[0], d[1], d[2]}).toList();
        return new Result(samples, failed, seed, inputs.size(), spreads[0], spreads[1], spreads[2], spreads[3], lumped);
    }

    private static Spread spread(double nominal, double linear, double[] values) {
        if (values.length == 0) {
            return new Spread(nominal, linear, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        final double mean = Arrays.stream(values).average().orElse(Double.NaN);
        double ss = 0;
        for (double v : values) {
            ss += (v - mean) * (v - mean);
        }
        final Percentile p = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        p.setData(values);
        return new Spread(nominal, linear, mean, values.length > 1 ? Math.sqrt(ss / (values.length - 1)) : 0,
                p.evaluate(5), p.evaluate(95));
    }

    /** {m, Lc, J0, T0} of a parts list. */
    private static double[] figures(PivotInertia engine, List<Part> parts) {
        final InertiaSummary s = engine.compute(parts);
        return new double[] {s.totalMass(), s.centroidDistance(), s.pivotInertia(), s.smallAnglePeriod()};
    }

    /** What one toleranced input is: part, which quantity, and its half-width. */
    private record Input(int part, Kind kind, int index, double halfWidth) {
    }

    private enum Kind { MASS, CENTROID, DIMENSION }

    private static List<Input> inputs(List<Part> parts) {
        final List<Input> out = new ArrayList<>();
        for (int i = 0; i < parts.size(); i++) {
            final PartTolerance t = parts.get(i).tolerance();
            if (t.mass() > 0) {
                out.add(new Input(i, Kind.MASS, 0, t.mass()));
            }
            if (t.dimension() > 0) {
                for (int c = 0; c < 3; c++) {
                    out.add(new Input(i, Kind.CENTROID, c, t.dimension()));
                }
                final double[] dims = dimensions(parts.get(i).shape());
                for (int d = 0; d < dims.length; d++) {
                    if (dims[d] > 0) {
                        out.add(new Input(i, Kind.DIMENSION, d, t.dimension()));
                    }
                }
            }
        }
        return out;
    }

    private static List<Part> apply(List<Part> parts, List<Input> inputs, double[] delta) {
        final List<Part> out = new ArrayList<>(parts);
        final double[][] dims = new double[parts.size()][];
        final double[] mass = new double[parts.size()];
        final double[][] centroid = new double[parts.size()][3];
        for (int i = 0; i < inputs.size(); i++) {
            final Input in = inputs.get(i);
            switch (in.kind) {
                case MASS -> mass[in.part] += delta[i];
                case CENTROID -> centroid[in.part][in.index] += delta[i];
                case DIMENSION -> {
                    if (dims[in.part] == null) {
                        dims[in.part] = new double[dimensions(parts.get(in.part).shape()).length];
                    }
                    dims[in.part][in.index] += delta[i];
                }
                default -> throw new IllegalStateException(in.kind.name());
            }
        }
        for (int p = 0; p < parts.size(); p++) {
            Part part = parts.get(p);
            if (mass[p] != 0) {
                part = part.withMass(part.mass() + mass[p]);
            }
            if (centroid[p][0] != 0 || centroid[p][1] != 0 || centroid[p][2] != 0) {
                part = part.withCentroid(part.centroid().add(new Vector3D(centroid[p][0], centroid[p][1], centroid[p][2])));
            }
            if (dims[p] != null) {
                part = part.withShape(reshaped(part.shape(), dims[p]));
            }
            out.set(p, part);
        }
        return out;
    }

    /** The dimensions of a shape that a dimension tolerance applies to. */
    private static double[] dimensions(PartShape shape) {
        return switch (shape) {
            case SlenderRod r -> new double[] {r.length()};
            case Box b -> new double[] {b.lengthX(), b.widthY(), b.heightZ()};
            case Cylinder c -> c.innerRadius() > 0 ? new double[] {c.radius(), c.length(), c.innerRadius()}
                    : new double[] {c.radius(), c.length()};
            case Sphere s -> new double[] {s.radius()};
            case ThinRing r -> new double[] {r.radius()};
            case PointMass p -> new double[0];
            case GivenTensor g -> new double[0];
        };
    }

    private static PartShape reshaped(PartShape shape, double[] d) {
        return switch (shape) {
            case SlenderRod r -> new SlenderRod(r.length() + d[0], r.axis());
            case Box b -> new Box(b.lengthX() + d[0], b.widthY() + d[1], b.heightZ() + d[2]);
            case Cylinder c -> new Cylinder(c.radius() + d[0], c.innerRadius() > 0 ? c.innerRadius() + d[2] : 0,
                    c.length() + d[1], c.axis());
            case Sphere s -> new Sphere(s.radius() + d[0]);
            case ThinRing r -> new ThinRing(r.radius() + d[0], r.axis());
            case PointMass p -> p;
            case GivenTensor g -> g;
        };
    }
}
