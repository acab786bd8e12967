package dev.penduline.ui;

/** Identifiers of Penduline's views and perspective, and of the platform views it arranges. */
public final class PendulineViews {

    /** The perspective that opens first. */
    public static final String PERSPECTIVE = "dev.penduline.ui.perspective";
    /** The workspace tree of mechanism projects. */
    public static final String PROJECT_FILES = "dev.penduline.ui.projectFiles";
    /** The start page: what Penduline does and where to begin. */
    public static final String SWING_DESK = "dev.penduline.ui.swingDesk";
    /** The platform's Properties view. */
    public static final String PROPERTIES = "org.eclipse.ui.views.PropertySheet";
    /** The platform's Problems view. */
    public static final String PROBLEMS = "org.eclipse.ui.views.ProblemView";
    /** The platform's Progress view. */
    public static final String PROGRESS = "org.eclipse.ui.views.ProgressView";

    private PendulineViews() {
    }
}
