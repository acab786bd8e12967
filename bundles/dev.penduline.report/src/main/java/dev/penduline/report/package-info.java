/**
 * Reports to hand on: one self-contained document per mechanism file (HTML with inline SVG
 * plots, or Markdown with the plots as SVG files beside it), made headless from the same
 * services and wording as the command line and the workbench.
 */
package dev.penduline.report;
