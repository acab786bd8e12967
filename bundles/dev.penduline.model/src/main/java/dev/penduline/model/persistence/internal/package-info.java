/**
 * Implementation of the mechanism file's persistence; not API (x-internal). Holds the
 * translation of parser failures into located messages.
 */
package dev.penduline.model.persistence.internal;
