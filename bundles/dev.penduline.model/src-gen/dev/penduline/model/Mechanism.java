/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Mechanism</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A pivoted mechanism (hinged hatch, swing arm, gate, flap, test pendulum) with everything Penduline knows about it. The mechanism frame: by default the pivot axis is the z axis through the origin and gravity points along −y, so a part hanging below the pivot has negative y.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.Mechanism#getName <em>Name</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getDescription <em>Description</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getGravity <em>Gravity</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getAxisPointX <em>Axis Point X</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getAxisPointY <em>Axis Point Y</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getAxisPointZ <em>Axis Point Z</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getAxisDirectionX <em>Axis Direction X</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getAxisDirectionY <em>Axis Direction Y</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getAxisDirectionZ <em>Axis Direction Z</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getGravityDirectionX <em>Gravity Direction X</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getGravityDirectionY <em>Gravity Direction Y</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getGravityDirectionZ <em>Gravity Direction Z</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getAxisTilt <em>Axis Tilt</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getParts <em>Parts</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getFrictionHypotheses <em>Friction Hypotheses</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getSessions <em>Sessions</em>}</li>
 *   <li>{@link dev.penduline.model.Mechanism#getFitResults <em>Fit Results</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getMechanism()
 * @model extendedMetaData="name='Mechanism' kind='elementOnly'"
 * @generated
 */
public interface Mechanism extends EObject
{
  /**
   * Returns the value of the '<em><b>Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Name of the mechanism.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Name</em>' attribute.
   * @see #setName(String)
   * @see dev.penduline.model.PendulinePackage#getMechanism_Name()
   * @model extendedMetaData="kind='element' name='name'"
   * @generated
   */
  String getName();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getName <em>Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Name</em>' attribute.
   * @see #getName()
   * @generated
   */
  void setName(String value);

  /**
   * Returns the value of the '<em><b>Description</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Free text: what the mechanism is, where it is installed.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Description</em>' attribute.
   * @see #setDescription(String)
   * @see dev.penduline.model.PendulinePackage#getMechanism_Description()
   * @model extendedMetaData="kind='element' name='description'"
   * @generated
   */
  String getDescription();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getDescription <em>Description</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Description</em>' attribute.
   * @see #getDescription()
   * @generated
   */
  void setDescription(String value);

  /**
   * Returns the value of the '<em><b>Gravity</b></em>' attribute.
   * The default value is <code>"9.80665"</code>.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Local gravitational acceleration g (m/s²); standard gravity 9.80665 m/s² by default.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Gravity</em>' attribute.
   * @see #setGravity(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_Gravity()
   * @model default="9.80665"
   *        extendedMetaData="kind='element' name='gravity'"
   * @generated
   */
  double getGravity();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getGravity <em>Gravity</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Gravity</em>' attribute.
   * @see #getGravity()
   * @generated
   */
  void setGravity(double value);

  /**
   * Returns the value of the '<em><b>Axis Point X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * x of a point on the pivot axis, in the mechanism frame (m).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Axis Point X</em>' attribute.
   * @see #setAxisPointX(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_AxisPointX()
   * @model extendedMetaData="kind='element' name='axisPointX'"
   * @generated
   */
  double getAxisPointX();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getAxisPointX <em>Axis Point X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Axis Point X</em>' attribute.
   * @see #getAxisPointX()
   * @generated
   */
  void setAxisPointX(double value);

  /**
   * Returns the value of the '<em><b>Axis Point Y</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * y of a point on the pivot axis, in the mechanism frame (m).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Axis Point Y</em>' attribute.
   * @see #setAxisPointY(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_AxisPointY()
   * @model extendedMetaData="kind='element' name='axisPointY'"
   * @generated
   */
  double getAxisPointY();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getAxisPointY <em>Axis Point Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Axis Point Y</em>' attribute.
   * @see #getAxisPointY()
   * @generated
   */
  void setAxisPointY(double value);

  /**
   * Returns the value of the '<em><b>Axis Point Z</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * z of a point on the pivot axis, in the mechanism frame (m).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Axis Point Z</em>' attribute.
   * @see #setAxisPointZ(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_AxisPointZ()
   * @model extendedMetaData="kind='element' name='axisPointZ'"
   * @generated
   */
  double getAxisPointZ();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getAxisPointZ <em>Axis Point Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Axis Point Z</em>' attribute.
   * @see #getAxisPointZ()
   * @generated
   */
  void setAxisPointZ(double value);

  /**
   * Returns the value of the '<em><b>Axis Direction X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * x component of the pivot axis direction (any length but zero; dimensionless).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Axis Direction X</em>' attribute.
   * @see #setAxisDirectionX(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_AxisDirectionX()
   * @model extendedMetaData="kind='element' name='axisDirectionX'"
   * @generated
   */
  double getAxisDirectionX();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getAxisDirectionX <em>Axis Direction X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Axis Direction X</em>' attribute.
   * @see #getAxisDirectionX()
   * @generated
   */
  void setAxisDirectionX(double value);

  /**
   * Returns the value of the '<em><b>Axis Direction Y</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * y component of the pivot axis direction (dimensionless).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Axis Direction Y</em>' attribute.
   * @see #setAxisDirectionY(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_AxisDirectionY()
   * @model extendedMetaData="kind='element' name='axisDirectionY'"
   * @generated
   */
  double getAxisDirectionY();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getAxisDirectionY <em>Axis Direction Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Axis Direction Y</em>' attribute.
   * @see #getAxisDirectionY()
   * @generated
   */
  void setAxisDirectionY(double value);

  /**
   * Returns the value of the '<em><b>Axis Direction Z</b></em>' attribute.
   * The default value is <code>"1.0"</code>.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * z component of the pivot axis direction (dimensionless); 1 by default.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Axis Direction Z</em>' attribute.
   * @see #setAxisDirectionZ(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_AxisDirectionZ()
   * @model default="1.0"
   *        extendedMetaData="kind='element' name='axisDirectionZ'"
   * @generated
   */
  double getAxisDirectionZ();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getAxisDirectionZ <em>Axis Direction Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Axis Direction Z</em>' attribute.
   * @see #getAxisDirectionZ()
   * @generated
   */
  void setAxisDirectionZ(double value);

  /**
   * Returns the value of the '<em><b>Gravity Direction X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * x component of the downward direction when the axis is level (dimensionless); only its part perpendicular to the axis counts.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Gravity Direction X</em>' attribute.
   * @see #setGravityDirectionX(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_GravityDirectionX()
   * @model extendedMetaData="kind='element' name='gravityDirectionX'"
   * @generated
   */
  double getGravityDirectionX();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getGravityDirectionX <em>Gravity Direction X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Gravity Direction X</em>' attribute.
   * @see #getGravityDirectionX()
   * @generated
   */
  void setGravityDirectionX(double value);

  /**
   * Returns the value of the '<em><b>Gravity Direction Y</b></em>' attribute.
   * The default value is <code>"-1.0"</code>.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * y component of the downward direction when the axis is level (dimensionless); −1 by default.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Gravity Direction Y</em>' attribute.
   * @see #setGravityDirectionY(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_GravityDirectionY()
   * @model default="-1.0"
   *        extendedMetaData="kind='element' name='gravityDirectionY'"
   * @generated
   */
  double getGravityDirectionY();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getGravityDirectionY <em>Gravity Direction Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Gravity Direction Y</em>' attribute.
   * @see #getGravityDirectionY()
   * @generated
   */
  void setGravityDirectionY(double value);

  /**
   * Returns the value of the '<em><b>Gravity Direction Z</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * z component of the downward direction when the axis is level (dimensionless).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Gravity Direction Z</em>' attribute.
   * @see #setGravityDirectionZ(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_GravityDirectionZ()
   * @model extendedMetaData="kind='element' name='gravityDirectionZ'"
   * @generated
   */
  double getGravityDirectionZ();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getGravityDirectionZ <em>Gravity Direction Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Gravity Direction Z</em>' attribute.
   * @see #getGravityDirectionZ()
   * @generated
   */
  void setGravityDirectionZ(double value);

  /**
   * Returns the value of the '<em><b>Axis Tilt</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Tilt α of the pivot axis from horizontal (rad), |α| < π/2. Gravity is leaned towards the axis by α: g·(cos α·d − sin α·n), d the downward direction, n the axis direction; the restoring torque then scales with g·cos α.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Axis Tilt</em>' attribute.
   * @see #setAxisTilt(double)
   * @see dev.penduline.model.PendulinePackage#getMechanism_AxisTilt()
   * @model extendedMetaData="kind='element' name='axisTilt'"
   * @generated
   */
  double getAxisTilt();

  /**
   * Sets the value of the '{@link dev.penduline.model.Mechanism#getAxisTilt <em>Axis Tilt</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Axis Tilt</em>' attribute.
   * @see #getAxisTilt()
   * @generated
   */
  void setAxisTilt(double value);

  /**
   * Returns the value of the '<em><b>Parts</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.Part}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * The parts whose masses and inertias add up to the mechanism's (cut-outs subtract).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Parts</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getMechanism_Parts()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='part'"
   * @generated
   */
  EList<Part> getParts();

  /**
   * Returns the value of the '<em><b>Friction Hypotheses</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.FrictionHypothesis}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Candidate sets of friction terms to fit and compare.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Friction Hypotheses</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getMechanism_FrictionHypotheses()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='frictionHypothesis'"
   * @generated
   */
  EList<FrictionHypothesis> getFrictionHypotheses();

  /**
   * Returns the value of the '<em><b>Sessions</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.TestSession}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Swing-test sessions: pointers to raw record files with their column mapping.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Sessions</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getMechanism_Sessions()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='session'"
   * @generated
   */
  EList<TestSession> getSessions();

  /**
   * Returns the value of the '<em><b>Fit Results</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.FitResult}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Stored results of friction fits, oldest first.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Fit Results</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getMechanism_FitResults()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='fitResult'"
   * @generated
   */
  EList<FitResult> getFitResults();

} // Mechanism
