/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.Estimate;
import dev.penduline.model.PendulinePackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Estimate</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.impl.EstimateImpl#getParameter <em>Parameter</em>}</li>
 *   <li>{@link dev.penduline.model.impl.EstimateImpl#getValue <em>Value</em>}</li>
 *   <li>{@link dev.penduline.model.impl.EstimateImpl#getStandardError <em>Standard Error</em>}</li>
 *   <li>{@link dev.penduline.model.impl.EstimateImpl#getResamplingError <em>Resampling Error</em>}</li>
 * </ul>
 *
 * @generated
 */
public class EstimateImpl extends MinimalEObjectImpl.Container implements Estimate
{
  /**
   * The default value of the '{@link #getParameter() <em>Parameter</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getParameter()
   * @generated
   * @ordered
   */
  protected static final String PARAMETER_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getParameter() <em>Parameter</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getParameter()
   * @generated
   * @ordered
   */
  protected String parameter = PARAMETER_EDEFAULT;

  /**
   * The default value of the '{@link #getValue() <em>Value</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getValue()
   * @generated
   * @ordered
   */
  protected static final double VALUE_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getValue() <em>Value</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getValue()
   * @generated
   * @ordered
   */
  protected double value = VALUE_EDEFAULT;

  /**
   * The default value of the '{@link #getStandardError() <em>Standard Error</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getStandardError()
   * @generated
   * @ordered
   */
  protected static final double STANDARD_ERROR_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getStandardError() <em>Standard Error</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getStandardError()
   * @generated
   * @ordered
   */
  protected double standardError = STANDARD_ERROR_EDEFAULT;

  /**
   * This is true if the Standard Error attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean standardErrorESet;

  /**
   * The default value of the '{@link #getResamplingError() <em>Resampling Error</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getResamplingError()
   * @generated
   * @ordered
   */
  protected static final double RESAMPLING_ERROR_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getResamplingError() <em>Resampling Error</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getResamplingError()
   * @generated
   * @ordered
   */
  protected double resamplingError = RESAMPLING_ERROR_EDEFAULT;

  /**
   * This is true if the Resampling Error attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean resamplingErrorESet;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected EstimateImpl()
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
    return PendulinePackage.Literals.ESTIMATE;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getParameter()
  {
    return parameter;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setParameter(String newParameter)
  {
    String oldParameter = parameter;
    parameter = newParameter;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.ESTIMATE__PARAMETER, oldParameter, parameter));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getValue()
  {
    return value;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setValue(double newValue)
  {
    double oldValue = value;
    value = newValue;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.ESTIMATE__VALUE, oldValue, value));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getStandardError()
  {
    return standardError;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setStandardError(double newStandardError)
  {
    double oldStandardError = standardError;
    standardError = newStandardError;
    boolean oldStandardErrorESet = standardErrorESet;
    standardErrorESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.ESTIMATE__STANDARD_ERROR, oldStandardError, standardError, !oldStandardErrorESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetStandardError()
  {
    double oldStandardError = standardError;
    boolean oldStandardErrorESet = standardErrorESet;
    standardError = STANDARD_ERROR_EDEFAULT;
    standardErrorESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.ESTIMATE__STANDARD_ERROR, oldStandardError, STANDARD_ERROR_EDEFAULT, oldStandardErrorESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetStandardError()
  {
    return standardErrorESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getResamplingError()
  {
    return resamplingError;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setResamplingError(double newResamplingError)
  {
    double oldResamplingError = resamplingError;
    resamplingError = newResamplingError;
    boolean oldResamplingErrorESet = resamplingErrorESet;
    resamplingErrorESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.ESTIMATE__RESAMPLING_ERROR, oldResamplingError, resamplingError, !oldResamplingErrorESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetResamplingError()
  {
    double oldResamplingError = resamplingError;
    boolean oldResamplingErrorESet = resamplingErrorESet;
    resamplingError = RESAMPLING_ERROR_EDEFAULT;
    resamplingErrorESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.ESTIMATE__RESAMPLING_ERROR, oldResamplingError, RESAMPLING_ERROR_EDEFAULT, oldResamplingErrorESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetResamplingError()
  {
    return resamplingErrorESet;
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
      case PendulinePackage.ESTIMATE__PARAMETER:
        return getParameter();
      case PendulinePackage.ESTIMATE__VALUE:
        return getValue();
      case PendulinePackage.ESTIMATE__STANDARD_ERROR:
        return getStandardError();
      case PendulinePackage.ESTIMATE__RESAMPLING_ERROR:
        return getResamplingError();
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
      case PendulinePackage.ESTIMATE__PARAMETER:
        setParameter((String)newValue);
        return;
      case PendulinePackage.ESTIMATE__VALUE:
        setValue((Double)newValue);
        return;
      case PendulinePackage.ESTIMATE__STANDARD_ERROR:
        setStandardError((Double)newValue);
        return;
      case PendulinePackage.ESTIMATE__RESAMPLING_ERROR:
        setResamplingError((Double)newValue);
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
      case PendulinePackage.ESTIMATE__PARAMETER:
        setParameter(PARAMETER_EDEFAULT);
        return;
      case PendulinePackage.ESTIMATE__VALUE:
        setValue(VALUE_EDEFAULT);
        return;
      case PendulinePackage.ESTIMATE__STANDARD_ERROR:
        unsetStandardError();
        return;
      case PendulinePackage.ESTIMATE__RESAMPLING_ERROR:
        unsetResamplingError();
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
      case PendulinePackage.ESTIMATE__PARAMETER:
        return PARAMETER_EDEFAULT == null ? parameter != null : !PARAMETER_EDEFAULT.equals(parameter);
      case PendulinePackage.ESTIMATE__VALUE:
        return value != VALUE_EDEFAULT;
      case PendulinePackage.ESTIMATE__STANDARD_ERROR:
        return isSetStandardError();
      case PendulinePackage.ESTIMATE__RESAMPLING_ERROR:
        return isSetResamplingError();
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
    result.append(" (parameter: ");
    result.append(parameter);
    result.append(", value: ");
    result.append(value);
    result.append(", standardError: ");
    if (standardErrorESet) result.append(standardError); else result.append("<unset>");
    result.append(", resamplingError: ");
    if (resamplingErrorESet) result.append(resamplingError); else result.append("<unset>");
    result.append(')');
    return result.toString();
  }

} //EstimateImpl
