/**
 * Penduline's contributions to the workbench: views, editors, wizards and charts.
 *
 * <p>Parts are plain objects with injected dependencies ({@code @PostConstruct create(Composite)})
 * hosted by the 3.x compatibility layer through {@code e4view} declarations in
 * {@code plugin.xml}, so that the workspace, Properties, Problems and Progress views of the
 * platform sit beside them. Computations are never done here: parts call the services layer
 * and show its results. Identifiers of views and the perspective are in {@link PendulineViews}.
 */
package dev.penduline.ui;
