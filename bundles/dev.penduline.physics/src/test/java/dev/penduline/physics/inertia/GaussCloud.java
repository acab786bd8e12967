package dev.penduline.physics.inertia;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Test fixture: a body replaced by point masses at the nodes of a tensor-product Gauss–Legendre
 * rule (nodes and weights from Hipparchus' {@link GaussIntegratorFactory}), each carrying the
 * mass density times its quadrature weight times the Jacobian of the body's natural coordinates.
 *
 * <p>The sum of the point masses' {@code m (|r|² E − r rᵀ)} is then the quadrature of the
 * body's inertia integral, computed without any of the closed-form shape formulas. Fed through
 * the engine as {@link PointMass} parts, it is an independent check of both the handbook
 * formulas and the engine's three-dimensional parallel-axis sums.
 */
final class GaussCloud {

    private static final GaussIntegratorFactory FACTORY = new GaussIntegratorFactory();

    private GaussCloud() {
    }

    /** A body sampled in its own frame: local positions and masses. */
    record Sample(List<Vector3D> positions, List<Double> masses) {

        /** The point-mass parts of this body placed at {@code centroid}, turned by {@code r}. */
        List<Part> place(String name, Vector3D centroid, Rotation r) {
            final List<Part> parts = new ArrayList<>(positions.size());
            for (int i = 0; i < positions.size(); i++) {
                parts.add(Part.of(name + "#" + i, new PointMass(), masses.get(i), centroid.add(r.applyTo(positions.get(i)))));
            }
            return parts;
        }
    }

    static Sample rod(double mass, double length, Axis axis) {
        final Sample s = new Sample(new ArrayList<>(), new ArrayList<>());
        final GaussIntegrator g = FACTORY.legendre(6, -length / 2, length / 2);
        for (int i = 0; i < g.getNumberOfPoints(); i++) {
            s.positions.add(axis.unit().scalarMultiply(g.getPoint(i)));
            s.masses.add(mass / length * g.getWeight(i));
        }
        return s;
    }

    static Sample box(double mass, double a, double b, double c) {
        final Sample s = new Sample(new ArrayList<>(), new ArrayList<>());
        final double rho = mass / (a * b * c);
        final GaussIntegrator gx = FACTORY.legendre(4, -a / 2, a / 2);
        final GaussIntegrator gy = FACTORY.legendre(4, -b / 2, b / 2);
        final GaussIntegrator gz = FACTORY.legendre(4, -c / 2, c / 2);
        for (int i = 0; i < 4; i++) {
            for (int j = 0; j < 4; j++) {
                for (int k = 0; k < 4; k++) {
                    s.positions.add(new Vector3D(gx.getPoint(i), gy.getPoint(j), gz.getPoint(k)));
                    s.masses.add(rho * gx.getWeight(i) * gy.getWeight(j) * gz.getWeight(k));
                }
            }
        }
        return s;
    }

    /** A tube (or solid cylinder for ri = 0) along z in its own frame. */
    static Sample cylinderAlongZ(double mass, double ro, double ri, double h) {
        final Sample s = new Sample(new ArrayList<>(), new ArrayList<>());
        final double rho = mass / (Math.PI * (ro * ro - ri * ri) * h);
        final GaussIntegrator gr = FACTORY.legendre(6, ri, ro);
        final GaussIntegrator gp = FACTORY.legendre(30, 0, 2 * Math.PI);
        final GaussIntegrator gz = FACTORY.legendre(4, -h / 2, h / 2);
        for (int i = 0; i < gr.getNumberOfPoints(); i++) {
            for (int j = 0; j < gp.getNumberOfPoints(); j++) {
                for (int k = 0; k < gz.getNumberOfPoints(); k++) {
                    final double r = gr.getPoint(i);
                    final double phi = gp.getPoint(j);
                    s.positions.add(new Vector3D(r * Math.cos(phi), r * Math.sin(phi), gz.getPoint(k)));
                    s.masses.add(rho * r * gr.getWeight(i) * gp.getWeight(j) * gz.getWeight(k));
                }
            }
        }
        return s;
    }

    static Sample sphere(double mass, double radius) {
        final Sample s = new Sample(new ArrayList<>(), new ArrayList<>());
        final double rho = mass / (4.0 / 3.0 * Math.PI * radius * radius * radius);
        final GaussIntegrator gr = FACTORY.legendre(8, 0, radius);
        final GaussIntegrator gt = FACTORY.legendre(30, 0, Math.PI);
        final GaussIntegrator gp = FACTORY.legendre(30, 0, 2 * Math.PI);
        for (int i = 0; i < gr.getNumberOfPoints(); i++) {
            for (int j = 0; j < gt.getNumberOfPoints(); j++) {
                for (int k = 0; k < gp.getNumberOfPoints(); k++) {
                    final double r = gr.getPoint(i);
                    final double t = gt.getPoint(j);
                    final double p = gp.getPoint(k);
                    s.positions.add(new Vector3D(r * Math.sin(t) * Math.cos(p), r * Math.sin(t) * Math.sin(p),
                            r * Math.cos(t)));
                    s.masses.add(rho * r * r * Math.sin(t) * gr.getWeight(i) * gt.getWeight(j) * gp.getWeight(k));
                }
            }
        }
        return s;
    }

    /** A thin ring in the x–y plane of its own frame (axis z). */
    static Sample ringAboutZ(double mass, double radius) {
        final Sample s = new Sample(new ArrayList<>(), new ArrayList<>());
        final GaussIntegrator gp = FACTORY.legendre(30, 0, 2 * Math.PI);
        for (int j = 0; j < gp.getNumberOfPoints(); j++) {
            final double p = gp.getPoint(j);
            s.positions.add(new Vector3D(radius * Math.cos(p), radius * Math.sin(p), 0));
            s.masses.add(mass / (2 * Math.PI) * gp.getWeight(j));
        }
        return s;
    }
}
