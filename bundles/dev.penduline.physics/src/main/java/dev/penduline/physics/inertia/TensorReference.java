package dev.penduline.physics.inertia;

/** The point a CAD inertia tensor is taken about. */
public enum TensorReference {
    /** About the body's centroid (CAD's "taken at the center of mass"). */
    CENTROID,
    /** About the origin of the output coordinate system (CAD's "taken at the output coordinate system"). */
    FRAME_ORIGIN
}
