/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.PendulinePackage;
import dev.penduline.model.SessionFit;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Session Fit</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.impl.SessionFitImpl#getSessionId <em>Session Id</em>}</li>
 *   <li>{@link dev.penduline.model.impl.SessionFitImpl#getInitialAngle <em>Initial Angle</em>}</li>
 *   <li>{@link dev.penduline.model.impl.SessionFitImpl#getReleaseTime <em>Release Time</em>}</li>
 *   <li>{@link dev.penduline.model.impl.SessionFitImpl#getAngleOffset <em>Angle Offset</em>}</li>
 *   <li>{@link dev.penduline.model.impl.SessionFitImpl#getRmsResidual <em>Rms Residual</em>}</li>
 * </ul>
 *
 * @generated
 */
public class SessionFitImpl extends MinimalEObjectImpl.Container implements SessionFit
{
  /**
   * The default value of the '{@link #getSessionId() <em>Session Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getSessionId()
   * @generated
   * @ordered
   */
  protected static final String SESSION_ID_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getSessionId() <em>Session Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getSessionId()
   * @generated
   * @ordered
   */
  protected String sessionId = SESSION_ID_EDEFAULT;

  /**
   * The default value of the '{@link #getInitialAngle() <em>Initial Angle</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getInitialAngle()
   * @generated
   * @ordered
   */
  protected static final double INITIAL_ANGLE_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getInitialAngle() <em>Initial Angle</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getInitialAngle()
   * @generated
   * @ordered
   */
  protected double initialAngle = INITIAL_ANGLE_EDEFAULT;

  /**
   * The default value of the '{@link #getReleaseTime() <em>Release Time</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getReleaseTime()
   * @generated
   * @ordered
   */
  protected static final double RELEASE_TIME_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getReleaseTime() <em>Release Time</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getReleaseTime()
   * @generated
   * @ordered
   */
  protected double releaseTime = RELEASE_TIME_EDEFAULT;

  /**
   * The default value of the '{@link #getAngleOffset() <em>Angle Offset</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAngleOffset()
   * @generated
   * @ordered
   */
  protected static final double ANGLE_OFFSET_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getAngleOffset() <em>Angle Offset</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAngleOffset()
   * @generated
   * @ordered
   */
  protected double angleOffset = ANGLE_OFFSET_EDEFAULT;

  /**
   * The default value of the '{@link #getRmsResidual() <em>Rms Residual</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRmsResidual()
   * @generated
   * @ordered
   */
  protected static final double RMS_RESIDUAL_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getRmsResidual() <em>Rms Residual</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRmsResidual()
   * @generated
   * @ordered
   */
  protected double rmsResidual = RMS_RESIDUAL_EDEFAULT;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected SessionFitImpl()
  {
    super();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  protected EClass eStaticClass()
  {
    return PendulinePackage.Literals.SESSION_FIT;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getSessionId()
  {
    return sessionId;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setSessionId(String newSessionId)
  {
    String oldSessionId = sessionId;
    sessionId = newSessionId;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.SESSION_FIT__SESSION_ID, oldSessionId, sessionId));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getInitialAngle()
  {
    return initialAngle;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setInitialAngle(double newInitialAngle)
  {
    double oldInitialAngle = initialAngle;
    initialAngle = newInitialAngle;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.SESSION_FIT__INITIAL_ANGLE, oldInitialAngle, initialAngle));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getReleaseTime()
  {
    return releaseTime;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setReleaseTime(double newReleaseTime)
  {
    double oldReleaseTime = releaseTime;
    releaseTime = newReleaseTime;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.SESSION_FIT__RELEASE_TIME, oldReleaseTime, releaseTime));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getAngleOffset()
  {
    return angleOffset;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAngleOffset(double newAngleOffset)
  {
    double oldAngleOffset = angleOffset;
    angleOffset = newAngleOffset;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.SESSION_FIT__ANGLE_OFFSET, oldAngleOffset, angleOffset));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getRmsResidual()
  {
    return rmsResidual;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setRmsResidual(double newRmsResidual)
  {
    double oldRmsResidual = rmsResidual;
    rmsResidual = newRmsResidual;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.SESSION_FIT__RMS_RESIDUAL, oldRmsResidual, rmsResidual));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public Object eGet(int featureID, boolean resolve, boolean coreType)
  {
    switch (featureID)
    {
      case PendulinePackage.SESSION_FIT__SESSION_ID:
        return getSessionId();
      case PendulinePackage.SESSION_FIT__INITIAL_ANGLE:
        return getInitialAngle();
      case PendulinePackage.SESSION_FIT__RELEASE_TIME:
        return getReleaseTime();
      case PendulinePackage.SESSION_FIT__ANGLE_OFFSET:
        return getAngleOffset();
      case PendulinePackage.SESSION_FIT__RMS_RESIDUAL:
        return getRmsResidual();
    }
    return super.eGet(featureID, resolve, coreType);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void eSet(int featureID, Object newValue)
  {
    switch (featureID)
    {
      case PendulinePackage.SESSION_FIT__SESSION_ID:
        setSessionId((String)newValue);
        return;
      case PendulinePackage.SESSION_FIT__INITIAL_ANGLE:
        setInitialAngle((Double)newValue);
        return;
      case PendulinePackage.SESSION_FIT__RELEASE_TIME:
        setReleaseTime((Double)newValue);
        return;
      case PendulinePackage.SESSION_FIT__ANGLE_OFFSET:
        setAngleOffset((Double)newValue);
        return;
      case PendulinePackage.SESSION_FIT__RMS_RESIDUAL:
        setRmsResidual((Double)newValue);
        return;
    }
    super.eSet(featureID, newValue);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void eUnset(int featureID)
  {
    switch (featureID)
    {
      case PendulinePackage.SESSION_FIT__SESSION_ID:
        setSessionId(SESSION_ID_EDEFAULT);
        return;
      case PendulinePackage.SESSION_FIT__INITIAL_ANGLE:
        setInitialAngle(INITIAL_ANGLE_EDEFAULT);
        return;
      case PendulinePackage.SESSION_FIT__RELEASE_TIME:
        setReleaseTime(RELEASE_TIME_EDEFAULT);
        return;
      case PendulinePackage.SESSION_FIT__ANGLE_OFFSET:
        setAngleOffset(ANGLE_OFFSET_EDEFAULT);
        return;
      case PendulinePackage.SESSION_FIT__RMS_RESIDUAL:
        setRmsResidual(RMS_RESIDUAL_EDEFAULT);
        return;
    }
    super.eUnset(featureID);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean eIsSet(int featureID)
  {
    switch (featureID)
    {
      case PendulinePackage.SESSION_FIT__SESSION_ID:
        return SESSION_ID_EDEFAULT == null ? sessionId != null : !SESSION_ID_EDEFAULT.equals(sessionId);
      case PendulinePackage.SESSION_FIT__INITIAL_ANGLE:
        return initialAngle != INITIAL_ANGLE_EDEFAULT;
      case PendulinePackage.SESSION_FIT__RELEASE_TIME:
        return releaseTime != RELEASE_TIME_EDEFAULT;
      case PendulinePackage.SESSION_FIT__ANGLE_OFFSET:
        return angleOffset != ANGLE_OFFSET_EDEFAULT;
      case PendulinePackage.SESSION_FIT__RMS_RESIDUAL:
        return rmsResidual != RMS_RESIDUAL_EDEFAULT;
    }
    return super.eIsSet(featureID);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String toString()
  {
    if (eIsProxy()) return super.toString();

    StringBuilder result = new StringBuilder(super.toString());
    result.append(" (sessionId: ");
    result.append(sessionId);
    result.append(", initialAngle: ");
    result.append(initialAngle);
    result.append(", releaseTime: ");
    result.append(releaseTime);
    result.append(", angleOffset: ");
    result.append(angleOffset);
    result.append(", rmsResidual: ");
    result.append(rmsResidual);
    result.append(')');
    return result.toString();
  }

} //SessionFitImpl
