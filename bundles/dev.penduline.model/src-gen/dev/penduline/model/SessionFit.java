/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Session Fit</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The nuisance values one session was fitted with.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.SessionFit#getSessionId <em>Session Id</em>}</li>
 *   <li>{@link dev.penduline.model.SessionFit#getInitialAngle <em>Initial Angle</em>}</li>
 *   <li>{@link dev.penduline.model.SessionFit#getReleaseTime <em>Release Time</em>}</li>
 *   <li>{@link dev.penduline.model.SessionFit#getAngleOffset <em>Angle Offset</em>}</li>
 *   <li>{@link dev.penduline.model.SessionFit#getRmsResidual <em>Rms Residual</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getSessionFit()
 * @model extendedMetaData="name='SessionFit' kind='elementOnly'"
 * @generated
 */
public interface SessionFit extends EObject
{
  /**
   * Returns the value of the '<em><b>Session Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Identifier of the session.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Session Id</em>' attribute.
   * @see #setSessionId(String)
   * @see dev.penduline.model.PendulinePackage#getSessionFit_SessionId()
   * @model extendedMetaData="kind='element' name='sessionId'"
   * @generated
   */
  String getSessionId();

  /**
   * Sets the value of the '{@link dev.penduline.model.SessionFit#getSessionId <em>Session Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Session Id</em>' attribute.
   * @see #getSessionId()
   * @generated
   */
  void setSessionId(String value);

  /**
   * Returns the value of the '<em><b>Initial Angle</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Fitted initial angle θ0 (rad).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Initial Angle</em>' attribute.
   * @see #setInitialAngle(double)
   * @see dev.penduline.model.PendulinePackage#getSessionFit_InitialAngle()
   * @model extendedMetaData="kind='element' name='initialAngle'"
   * @generated
   */
  double getInitialAngle();

  /**
   * Sets the value of the '{@link dev.penduline.model.SessionFit#getInitialAngle <em>Initial Angle</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Initial Angle</em>' attribute.
   * @see #getInitialAngle()
   * @generated
   */
  void setInitialAngle(double value);

  /**
   * Returns the value of the '<em><b>Release Time</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Fitted release time, on the record's clock (s).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Release Time</em>' attribute.
   * @see #setReleaseTime(double)
   * @see dev.penduline.model.PendulinePackage#getSessionFit_ReleaseTime()
   * @model extendedMetaData="kind='element' name='releaseTime'"
   * @generated
   */
  double getReleaseTime();

  /**
   * Sets the value of the '{@link dev.penduline.model.SessionFit#getReleaseTime <em>Release Time</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Release Time</em>' attribute.
   * @see #getReleaseTime()
   * @generated
   */
  void setReleaseTime(double value);

  /**
   * Returns the value of the '<em><b>Angle Offset</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Fitted zero offset of the angle sensor (rad).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Angle Offset</em>' attribute.
   * @see #setAngleOffset(double)
   * @see dev.penduline.model.PendulinePackage#getSessionFit_AngleOffset()
   * @model extendedMetaData="kind='element' name='angleOffset'"
   * @generated
   */
  double getAngleOffset();

  /**
   * Sets the value of the '{@link dev.penduline.model.SessionFit#getAngleOffset <em>Angle Offset</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Angle Offset</em>' attribute.
   * @see #getAngleOffset()
   * @generated
   */
  void setAngleOffset(double value);

  /**
   * Returns the value of the '<em><b>Rms Residual</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Root-mean-square residual of the angle (rad).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Rms Residual</em>' attribute.
   * @see #setRmsResidual(double)
   * @see dev.penduline.model.PendulinePackage#getSessionFit_RmsResidual()
   * @model extendedMetaData="kind='element' name='rmsResidual'"
   * @generated
   */
  double getRmsResidual();

  /**
   * Sets the value of the '{@link dev.penduline.model.SessionFit#getRmsResidual <em>Rms Residual</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Rms Residual</em>' attribute.
   * @see #getRmsResidual()
   * @generated
   */
  void setRmsResidual(double value);

} // SessionFit
