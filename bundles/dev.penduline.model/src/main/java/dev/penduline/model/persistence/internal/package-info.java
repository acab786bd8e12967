/**
 * Implementation of the mechanism file's persistence; not API (x-internal). Holds the atomic
 * file replacement and the translation of parser failures into located messages.
 */
package dev.penduline.model.persistence.internal;
