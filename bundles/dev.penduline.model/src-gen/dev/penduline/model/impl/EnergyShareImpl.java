/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.EnergyShare;
import dev.penduline.model.PendulinePackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Energy Share</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.impl.EnergyShareImpl#getTermId <em>Term Id</em>}</li>
 *   <li>{@link dev.penduline.model.impl.EnergyShareImpl#getShare <em>Share</em>}</li>
 * </ul>
 *
 * @generated
 */
public class EnergyShareImpl extends MinimalEObjectImpl.Container implements EnergyShare
{
  /**
   * The default value of the '{@link #getTermId() <em>Term Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTermId()
   * @generated
   * @ordered
   */
  protected static final String TERM_ID_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getTermId() <em>Term Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTermId()
   * @generated
   * @ordered
   */
  protected String termId = TERM_ID_EDEFAULT;

  /**
   * The default value of the '{@link #getShare() <em>Share</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getShare()
   * @generated
   * @ordered
   */
  protected static final double SHARE_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getShare() <em>Share</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getShare()
   * @generated
   * @ordered
   */
  protected double share = SHARE_EDEFAULT;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected EnergyShareImpl()
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
    return PendulinePackage.Literals.ENERGY_SHARE;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getTermId()
  {
    return termId;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setTermId(String newTermId)
  {
    String oldTermId = termId;
    termId = newTermId;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.ENERGY_SHARE__TERM_ID, oldTermId, termId));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getShare()
  {
    return share;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setShare(double newShare)
  {
    double oldShare = share;
    share = newShare;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.ENERGY_SHARE__SHARE, oldShare, share));
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
      case PendulinePackage.ENERGY_SHARE__TERM_ID:
        return getTermId();
      case PendulinePackage.ENERGY_SHARE__SHARE:
        return getShare();
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
      case PendulinePackage.ENERGY_SHARE__TERM_ID:
        setTermId((String)newValue);
        return;
      case PendulinePackage.ENERGY_SHARE__SHARE:
        setShare((Double)newValue);
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
      case PendulinePackage.ENERGY_SHARE__TERM_ID:
        setTermId(TERM_ID_EDEFAULT);
        return;
      case PendulinePackage.ENERGY_SHARE__SHARE:
        setShare(SHARE_EDEFAULT);
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
      case PendulinePackage.ENERGY_SHARE__TERM_ID:
        return TERM_ID_EDEFAULT == null ? termId != null : !TERM_ID_EDEFAULT.equals(termId);
      case PendulinePackage.ENERGY_SHARE__SHARE:
        return share != SHARE_EDEFAULT;
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
    result.append(" (termId: ");
    result.append(termId);
    result.append(", share: ");
    result.append(share);
    result.append(')');
    return result.toString();
  }

} //EnergyShareImpl
