/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Test Session</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One free-release swing test: where its raw record lies inside the project and how to read it. The raw data is never copied into the mechanism file.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.TestSession#getId <em>Id</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getName <em>Name</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getRecordPath <em>Record Path</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getTimeColumnName <em>Time Column Name</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getTimeColumnNumber <em>Time Column Number</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getAngleColumnName <em>Angle Column Name</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getAngleColumnNumber <em>Angle Column Number</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getTimeUnit <em>Time Unit</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getAngleUnit <em>Angle Unit</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getCountsPerRevolution <em>Counts Per Revolution</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getDelimiter <em>Delimiter</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getDecimalSeparator <em>Decimal Separator</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getContentHash <em>Content Hash</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getReleaseAngle <em>Release Angle</em>}</li>
 *   <li>{@link dev.penduline.model.TestSession#getNotes <em>Notes</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getTestSession()
 * @model extendedMetaData="name='TestSession' kind='elementOnly'"
 * @generated
 */
public interface TestSession extends EObject
{
  /**
   * Returns the value of the '<em><b>Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Stable identifier, derived from the name when the element is created (lower case, words joined by '-', a numeric suffix when taken); unique among its siblings. Other elements and the user refer to it; it never changes on rename.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Id</em>' attribute.
   * @see #setId(String)
   * @see dev.penduline.model.PendulinePackage#getTestSession_Id()
   * @model extendedMetaData="kind='element' name='id'"
   * @generated
   */
  String getId();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getId <em>Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Id</em>' attribute.
   * @see #getId()
   * @generated
   */
  void setId(String value);

  /**
   * Returns the value of the '<em><b>Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Name of the session, e.g. 'release at 30°, hinge greased'.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Name</em>' attribute.
   * @see #setName(String)
   * @see dev.penduline.model.PendulinePackage#getTestSession_Name()
   * @model extendedMetaData="kind='element' name='name'"
   * @generated
   */
  String getName();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getName <em>Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Name</em>' attribute.
   * @see #getName()
   * @generated
   */
  void setName(String value);

  /**
   * Returns the value of the '<em><b>Record Path</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Path of the raw record file relative to the project folder, with '/' separators; it must stay inside the project.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Record Path</em>' attribute.
   * @see #setRecordPath(String)
   * @see dev.penduline.model.PendulinePackage#getTestSession_RecordPath()
   * @model extendedMetaData="kind='element' name='recordPath'"
   * @generated
   */
  String getRecordPath();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getRecordPath <em>Record Path</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Record Path</em>' attribute.
   * @see #getRecordPath()
   * @generated
   */
  void setRecordPath(String value);

  /**
   * Returns the value of the '<em><b>Time Column Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Header name of the time column; unset when the column is given by number.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Time Column Name</em>' attribute.
   * @see #setTimeColumnName(String)
   * @see dev.penduline.model.PendulinePackage#getTestSession_TimeColumnName()
   * @model extendedMetaData="kind='element' name='timeColumnName'"
   * @generated
   */
  String getTimeColumnName();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getTimeColumnName <em>Time Column Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Time Column Name</em>' attribute.
   * @see #getTimeColumnName()
   * @generated
   */
  void setTimeColumnName(String value);

  /**
   * Returns the value of the '<em><b>Time Column Number</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * 1-based number of the time column (the first column is 1); used when no name is given.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Time Column Number</em>' attribute.
   * @see #isSetTimeColumnNumber()
   * @see #unsetTimeColumnNumber()
   * @see #setTimeColumnNumber(int)
   * @see dev.penduline.model.PendulinePackage#getTestSession_TimeColumnNumber()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='timeColumnNumber'"
   * @generated
   */
  int getTimeColumnNumber();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getTimeColumnNumber <em>Time Column Number</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Time Column Number</em>' attribute.
   * @see #isSetTimeColumnNumber()
   * @see #unsetTimeColumnNumber()
   * @see #getTimeColumnNumber()
   * @generated
   */
  void setTimeColumnNumber(int value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.TestSession#getTimeColumnNumber <em>Time Column Number</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetTimeColumnNumber()
   * @see #getTimeColumnNumber()
   * @see #setTimeColumnNumber(int)
   * @generated
   */
  void unsetTimeColumnNumber();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.TestSession#getTimeColumnNumber <em>Time Column Number</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Time Column Number</em>' attribute is set.
   * @see #unsetTimeColumnNumber()
   * @see #getTimeColumnNumber()
   * @see #setTimeColumnNumber(int)
   * @generated
   */
  boolean isSetTimeColumnNumber();

  /**
   * Returns the value of the '<em><b>Angle Column Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Header name of the angle column; unset when the column is given by number.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Angle Column Name</em>' attribute.
   * @see #setAngleColumnName(String)
   * @see dev.penduline.model.PendulinePackage#getTestSession_AngleColumnName()
   * @model extendedMetaData="kind='element' name='angleColumnName'"
   * @generated
   */
  String getAngleColumnName();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getAngleColumnName <em>Angle Column Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Angle Column Name</em>' attribute.
   * @see #getAngleColumnName()
   * @generated
   */
  void setAngleColumnName(String value);

  /**
   * Returns the value of the '<em><b>Angle Column Number</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * 1-based number of the angle column; used when no name is given.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Angle Column Number</em>' attribute.
   * @see #isSetAngleColumnNumber()
   * @see #unsetAngleColumnNumber()
   * @see #setAngleColumnNumber(int)
   * @see dev.penduline.model.PendulinePackage#getTestSession_AngleColumnNumber()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='angleColumnNumber'"
   * @generated
   */
  int getAngleColumnNumber();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getAngleColumnNumber <em>Angle Column Number</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Angle Column Number</em>' attribute.
   * @see #isSetAngleColumnNumber()
   * @see #unsetAngleColumnNumber()
   * @see #getAngleColumnNumber()
   * @generated
   */
  void setAngleColumnNumber(int value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.TestSession#getAngleColumnNumber <em>Angle Column Number</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetAngleColumnNumber()
   * @see #getAngleColumnNumber()
   * @see #setAngleColumnNumber(int)
   * @generated
   */
  void unsetAngleColumnNumber();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.TestSession#getAngleColumnNumber <em>Angle Column Number</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Angle Column Number</em>' attribute is set.
   * @see #unsetAngleColumnNumber()
   * @see #getAngleColumnNumber()
   * @see #setAngleColumnNumber(int)
   * @generated
   */
  boolean isSetAngleColumnNumber();

  /**
   * Returns the value of the '<em><b>Time Unit</b></em>' attribute.
   * The default value is <code>"s"</code>.
   * The literals are from the enumeration {@link dev.penduline.model.TimeUnit}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Unit of the time column.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Time Unit</em>' attribute.
   * @see dev.penduline.model.TimeUnit
   * @see #setTimeUnit(TimeUnit)
   * @see dev.penduline.model.PendulinePackage#getTestSession_TimeUnit()
   * @model default="s"
   *        extendedMetaData="kind='element' name='timeUnit'"
   * @generated
   */
  TimeUnit getTimeUnit();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getTimeUnit <em>Time Unit</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Time Unit</em>' attribute.
   * @see dev.penduline.model.TimeUnit
   * @see #getTimeUnit()
   * @generated
   */
  void setTimeUnit(TimeUnit value);

  /**
   * Returns the value of the '<em><b>Angle Unit</b></em>' attribute.
   * The default value is <code>"rad"</code>.
   * The literals are from the enumeration {@link dev.penduline.model.AngleUnit}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Unit of the angle column.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Angle Unit</em>' attribute.
   * @see dev.penduline.model.AngleUnit
   * @see #setAngleUnit(AngleUnit)
   * @see dev.penduline.model.PendulinePackage#getTestSession_AngleUnit()
   * @model default="rad"
   *        extendedMetaData="kind='element' name='angleUnit'"
   * @generated
   */
  AngleUnit getAngleUnit();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getAngleUnit <em>Angle Unit</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Angle Unit</em>' attribute.
   * @see dev.penduline.model.AngleUnit
   * @see #getAngleUnit()
   * @generated
   */
  void setAngleUnit(AngleUnit value);

  /**
   * Returns the value of the '<em><b>Counts Per Revolution</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Encoder counts per revolution, for angles in counts.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Counts Per Revolution</em>' attribute.
   * @see #isSetCountsPerRevolution()
   * @see #unsetCountsPerRevolution()
   * @see #setCountsPerRevolution(int)
   * @see dev.penduline.model.PendulinePackage#getTestSession_CountsPerRevolution()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='countsPerRevolution'"
   * @generated
   */
  int getCountsPerRevolution();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getCountsPerRevolution <em>Counts Per Revolution</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Counts Per Revolution</em>' attribute.
   * @see #isSetCountsPerRevolution()
   * @see #unsetCountsPerRevolution()
   * @see #getCountsPerRevolution()
   * @generated
   */
  void setCountsPerRevolution(int value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.TestSession#getCountsPerRevolution <em>Counts Per Revolution</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetCountsPerRevolution()
   * @see #getCountsPerRevolution()
   * @see #setCountsPerRevolution(int)
   * @generated
   */
  void unsetCountsPerRevolution();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.TestSession#getCountsPerRevolution <em>Counts Per Revolution</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Counts Per Revolution</em>' attribute is set.
   * @see #unsetCountsPerRevolution()
   * @see #getCountsPerRevolution()
   * @see #setCountsPerRevolution(int)
   * @generated
   */
  boolean isSetCountsPerRevolution();

  /**
   * Returns the value of the '<em><b>Delimiter</b></em>' attribute.
   * The default value is <code>"comma"</code>.
   * The literals are from the enumeration {@link dev.penduline.model.Delimiter}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Column delimiter of the record file.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Delimiter</em>' attribute.
   * @see dev.penduline.model.Delimiter
   * @see #setDelimiter(Delimiter)
   * @see dev.penduline.model.PendulinePackage#getTestSession_Delimiter()
   * @model default="comma"
   *        extendedMetaData="kind='element' name='delimiter'"
   * @generated
   */
  Delimiter getDelimiter();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getDelimiter <em>Delimiter</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Delimiter</em>' attribute.
   * @see dev.penduline.model.Delimiter
   * @see #getDelimiter()
   * @generated
   */
  void setDelimiter(Delimiter value);

  /**
   * Returns the value of the '<em><b>Decimal Separator</b></em>' attribute.
   * The default value is <code>"point"</code>.
   * The literals are from the enumeration {@link dev.penduline.model.DecimalSeparator}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Decimal separator of the record file.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Decimal Separator</em>' attribute.
   * @see dev.penduline.model.DecimalSeparator
   * @see #setDecimalSeparator(DecimalSeparator)
   * @see dev.penduline.model.PendulinePackage#getTestSession_DecimalSeparator()
   * @model default="point"
   *        extendedMetaData="kind='element' name='decimalSeparator'"
   * @generated
   */
  DecimalSeparator getDecimalSeparator();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getDecimalSeparator <em>Decimal Separator</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Decimal Separator</em>' attribute.
   * @see dev.penduline.model.DecimalSeparator
   * @see #getDecimalSeparator()
   * @generated
   */
  void setDecimalSeparator(DecimalSeparator value);

  /**
   * Returns the value of the '<em><b>Content Hash</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * SHA-256 of the raw record file's bytes, 64 lower-case hexadecimal digits; tells when the file changed under the project.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Content Hash</em>' attribute.
   * @see #setContentHash(String)
   * @see dev.penduline.model.PendulinePackage#getTestSession_ContentHash()
   * @model extendedMetaData="kind='element' name='contentHash'"
   * @generated
   */
  String getContentHash();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getContentHash <em>Content Hash</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Content Hash</em>' attribute.
   * @see #getContentHash()
   * @generated
   */
  void setContentHash(String value);

  /**
   * Returns the value of the '<em><b>Release Angle</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Release angle θ0 from the hanging equilibrium when known from the test (rad).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Release Angle</em>' attribute.
   * @see #isSetReleaseAngle()
   * @see #unsetReleaseAngle()
   * @see #setReleaseAngle(double)
   * @see dev.penduline.model.PendulinePackage#getTestSession_ReleaseAngle()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='releaseAngle'"
   * @generated
   */
  double getReleaseAngle();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getReleaseAngle <em>Release Angle</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Release Angle</em>' attribute.
   * @see #isSetReleaseAngle()
   * @see #unsetReleaseAngle()
   * @see #getReleaseAngle()
   * @generated
   */
  void setReleaseAngle(double value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.TestSession#getReleaseAngle <em>Release Angle</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetReleaseAngle()
   * @see #getReleaseAngle()
   * @see #setReleaseAngle(double)
   * @generated
   */
  void unsetReleaseAngle();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.TestSession#getReleaseAngle <em>Release Angle</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Release Angle</em>' attribute is set.
   * @see #unsetReleaseAngle()
   * @see #getReleaseAngle()
   * @see #setReleaseAngle(double)
   * @generated
   */
  boolean isSetReleaseAngle();

  /**
   * Returns the value of the '<em><b>Notes</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Free text: conditions, temperature, who ran it.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Notes</em>' attribute.
   * @see #setNotes(String)
   * @see dev.penduline.model.PendulinePackage#getTestSession_Notes()
   * @model extendedMetaData="kind='element' name='notes'"
   * @generated
   */
  String getNotes();

  /**
   * Sets the value of the '{@link dev.penduline.model.TestSession#getNotes <em>Notes</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Notes</em>' attribute.
   * @see #getNotes()
   * @generated
   */
  void setNotes(String value);

} // TestSession
