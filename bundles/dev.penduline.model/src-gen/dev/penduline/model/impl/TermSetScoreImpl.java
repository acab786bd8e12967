/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.PendulinePackage;
import dev.penduline.model.TermSetScore;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.eclipse.emf.ecore.util.EDataTypeUniqueEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Term Set Score</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.impl.TermSetScoreImpl#getTermIds <em>Term Ids</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TermSetScoreImpl#getAic <em>Aic</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TermSetScoreImpl#getBic <em>Bic</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TermSetScoreImpl#getRmsResidual <em>Rms Residual</em>}</li>
 * </ul>
 *
 * @generated
 */
public class TermSetScoreImpl extends MinimalEObjectImpl.Container implements TermSetScore
{
  /**
   * The cached value of the '{@link #getTermIds() <em>Term Ids</em>}' attribute list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTermIds()
   * @generated
   * @ordered
   */
  protected EList<String> termIds;

  /**
   * The default value of the '{@link #getAic() <em>Aic</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAic()
   * @generated
   * @ordered
   */
  protected static final double AIC_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getAic() <em>Aic</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAic()
   * @generated
   * @ordered
   */
  protected double aic = AIC_EDEFAULT;

  /**
   * The default value of the '{@link #getBic() <em>Bic</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getBic()
   * @generated
   * @ordered
   */
  protected static final double BIC_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getBic() <em>Bic</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getBic()
   * @generated
   * @ordered
   */
  protected double bic = BIC_EDEFAULT;

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
  protected TermSetScoreImpl()
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
    return PendulinePackage.Literals.TERM_SET_SCORE;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<String> getTermIds()
  {
    if (termIds == null)
    {
      termIds = new EDataTypeUniqueEList<String>(String.class, this, PendulinePackage.TERM_SET_SCORE__TERM_IDS);
    }
    return termIds;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getAic()
  {
    return aic;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAic(double newAic)
  {
    double oldAic = aic;
    aic = newAic;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TERM_SET_SCORE__AIC, oldAic, aic));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getBic()
  {
    return bic;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setBic(double newBic)
  {
    double oldBic = bic;
    bic = newBic;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TERM_SET_SCORE__BIC, oldBic, bic));
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
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TERM_SET_SCORE__RMS_RESIDUAL, oldRmsResidual, rmsResidual));
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
      case PendulinePackage.TERM_SET_SCORE__TERM_IDS:
        return getTermIds();
      case PendulinePackage.TERM_SET_SCORE__AIC:
        return getAic();
      case PendulinePackage.TERM_SET_SCORE__BIC:
        return getBic();
      case PendulinePackage.TERM_SET_SCORE__RMS_RESIDUAL:
        return getRmsResidual();
    }
    return super.eGet(featureID, resolve, coreType);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @SuppressWarnings("unchecked")
  @Override
  public void eSet(int featureID, Object newValue)
  {
    switch (featureID)
    {
      case PendulinePackage.TERM_SET_SCORE__TERM_IDS:
        getTermIds().clear();
        getTermIds().addAll((Collection<? extends String>)newValue);
        return;
      case PendulinePackage.TERM_SET_SCORE__AIC:
        setAic((Double)newValue);
        return;
      case PendulinePackage.TERM_SET_SCORE__BIC:
        setBic((Double)newValue);
        return;
      case PendulinePackage.TERM_SET_SCORE__RMS_RESIDUAL:
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
      case PendulinePackage.TERM_SET_SCORE__TERM_IDS:
        getTermIds().clear();
        return;
      case PendulinePackage.TERM_SET_SCORE__AIC:
        setAic(AIC_EDEFAULT);
        return;
      case PendulinePackage.TERM_SET_SCORE__BIC:
        setBic(BIC_EDEFAULT);
        return;
      case PendulinePackage.TERM_SET_SCORE__RMS_RESIDUAL:
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
      case PendulinePackage.TERM_SET_SCORE__TERM_IDS:
        return termIds != null && !termIds.isEmpty();
      case PendulinePackage.TERM_SET_SCORE__AIC:
        return aic != AIC_EDEFAULT;
      case PendulinePackage.TERM_SET_SCORE__BIC:
        return bic != BIC_EDEFAULT;
      case PendulinePackage.TERM_SET_SCORE__RMS_RESIDUAL:
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
    result.append(" (termIds: ");
    result.append(termIds);
    result.append(", aic: ");
    result.append(aic);
    result.append(", bic: ");
    result.append(bic);
    result.append(", rmsResidual: ");
    result.append(rmsResidual);
    result.append(')');
    return result.toString();
  }

} //TermSetScoreImpl
