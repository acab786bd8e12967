/**
 * Reading and writing {@code .penduline} mechanism files.
 *
 * <p><b>Start</b> with {@link dev.penduline.model.persistence.MechanismFiles}: {@code load(Path)}
 * and {@code save(Mechanism, Path)}. Inside Eclipse, {@code plugin.xml} registers
 * {@link dev.penduline.model.persistence.MechanismResourceFactory} for the extension, so any
 * resource set reads and writes the same way.
 *
 * <p><b>Format</b> ({@link dev.penduline.model.persistence.MechanismFormat}): XMI 2.0 in UTF-8
 * with LF line ends; every value its own element, in metamodel order, so that the file versions
 * well in git beside the CAD; values equal to their defaults are omitted; no UUIDs, no time
 * stamps except a fit's {@code computedAt}. Units are SI, as the metamodel documents.
 *
 * <p><b>Traps.</b> Raw swing records are never copied into the file: a session holds the record's
 * relative path and SHA-256. A load error is a {@link dev.penduline.model.persistence.MechanismFileException}
 * with file, line and column; show its message, not a stack trace. Files with a DOCTYPE are
 * refused outright (no external entities, no entity expansion). Saving through a
 * {@link dev.penduline.model.persistence.MechanismResource} replaces the file atomically; saving
 * through another resource class does not.
 *
 * <p><b>Saving.</b> {@link dev.penduline.model.persistence.AtomicFileWrite} is the one writer of
 * every file Penduline writes; {@link dev.penduline.model.persistence.SaveLock} is the lock every
 * writer of a mechanism file holds around reading, changing and saving it.
 */
package dev.penduline.model.persistence;
