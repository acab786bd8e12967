/**
 * The Penduline application: starts the workbench on the 3.x compatibility layer (so that the
 * platform's workspace, Properties, Problems and Progress views and its wizard and preference
 * frameworks come for free), sets the window title, menus and the About dialog, and saves the
 * workspace on exit. Branding (name, About text, window images) is in {@code plugin.xml}.
 */
package dev.penduline.app.internal;
