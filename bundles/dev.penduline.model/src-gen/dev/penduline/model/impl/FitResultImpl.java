/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.EnergyShare;
import dev.penduline.model.Estimate;
import dev.penduline.model.FitResult;
import dev.penduline.model.PendulinePackage;
import dev.penduline.model.SessionFit;
import dev.penduline.model.Setting;
import dev.penduline.model.TermSetScore;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.eclipse.emf.ecore.util.EDataTypeEList;
import org.eclipse.emf.ecore.util.EDataTypeUniqueEList;
import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Fit Result</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getId <em>Id</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getName <em>Name</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getComputedAt <em>Computed At</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getHypothesisId <em>Hypothesis Id</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getSessionIds <em>Session Ids</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getTermIds <em>Term Ids</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getEstimates <em>Estimates</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getCorrelationParameters <em>Correlation Parameters</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getCorrelations <em>Correlations</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getCalculatedInertia <em>Calculated Inertia</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getFittedInertia <em>Fitted Inertia</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getSessionFits <em>Session Fits</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getComparisons <em>Comparisons</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getDominantLoss <em>Dominant Loss</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getEnergyShares <em>Energy Shares</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FitResultImpl#getSettings <em>Settings</em>}</li>
 * </ul>
 *
 * @generated
 */
public class FitResultImpl extends MinimalEObjectImpl.Container implements FitResult
{
  /**
   * The default value of the '{@link #getId() <em>Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getId()
   * @generated
   * @ordered
   */
  protected static final String ID_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getId() <em>Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getId()
   * @generated
   * @ordered
   */
  protected String id = ID_EDEFAULT;

  /**
   * The default value of the '{@link #getName() <em>Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getName()
   * @generated
   * @ordered
   */
  protected static final String NAME_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getName()
   * @generated
   * @ordered
   */
  protected String name = NAME_EDEFAULT;

  /**
   * The default value of the '{@link #getComputedAt() <em>Computed At</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getComputedAt()
   * @generated
   * @ordered
   */
  protected static final String COMPUTED_AT_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getComputedAt() <em>Computed At</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getComputedAt()
   * @generated
   * @ordered
   */
  protected String computedAt = COMPUTED_AT_EDEFAULT;

  /**
   * The default value of the '{@link #getHypothesisId() <em>Hypothesis Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getHypothesisId()
   * @generated
   * @ordered
   */
  protected static final String HYPOTHESIS_ID_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getHypothesisId() <em>Hypothesis Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getHypothesisId()
   * @generated
   * @ordered
   */
  protected String hypothesisId = HYPOTHESIS_ID_EDEFAULT;

  /**
   * The cached value of the '{@link #getSessionIds() <em>Session Ids</em>}' attribute list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getSessionIds()
   * @generated
   * @ordered
   */
  protected EList<String> sessionIds;

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
   * The cached value of the '{@link #getEstimates() <em>Estimates</em>}' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getEstimates()
   * @generated
   * @ordered
   */
  protected EList<Estimate> estimates;

  /**
   * The cached value of the '{@link #getCorrelationParameters() <em>Correlation Parameters</em>}' attribute list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCorrelationParameters()
   * @generated
   * @ordered
   */
  protected EList<String> correlationParameters;

  /**
   * The cached value of the '{@link #getCorrelations() <em>Correlations</em>}' attribute list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCorrelations()
   * @generated
   * @ordered
   */
  protected EList<Double> correlations;

  /**
   * The default value of the '{@link #getCalculatedInertia() <em>Calculated Inertia</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCalculatedInertia()
   * @generated
   * @ordered
   */
  protected static final double CALCULATED_INERTIA_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getCalculatedInertia() <em>Calculated Inertia</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCalculatedInertia()
   * @generated
   * @ordered
   */
  protected double calculatedInertia = CALCULATED_INERTIA_EDEFAULT;

  /**
   * This is true if the Calculated Inertia attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean calculatedInertiaESet;

  /**
   * The default value of the '{@link #getFittedInertia() <em>Fitted Inertia</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getFittedInertia()
   * @generated
   * @ordered
   */
  protected static final double FITTED_INERTIA_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getFittedInertia() <em>Fitted Inertia</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getFittedInertia()
   * @generated
   * @ordered
   */
  protected double fittedInertia = FITTED_INERTIA_EDEFAULT;

  /**
   * This is true if the Fitted Inertia attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean fittedInertiaESet;

  /**
   * The cached value of the '{@link #getSessionFits() <em>Session Fits</em>}' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getSessionFits()
   * @generated
   * @ordered
   */
  protected EList<SessionFit> sessionFits;

  /**
   * The cached value of the '{@link #getComparisons() <em>Comparisons</em>}' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getComparisons()
   * @generated
   * @ordered
   */
  protected EList<TermSetScore> comparisons;

  /**
   * The default value of the '{@link #getDominantLoss() <em>Dominant Loss</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDominantLoss()
   * @generated
   * @ordered
   */
  protected static final String DOMINANT_LOSS_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getDominantLoss() <em>Dominant Loss</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDominantLoss()
   * @generated
   * @ordered
   */
  protected String dominantLoss = DOMINANT_LOSS_EDEFAULT;

  /**
   * The cached value of the '{@link #getEnergyShares() <em>Energy Shares</em>}' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getEnergyShares()
   * @generated
   * @ordered
   */
  protected EList<EnergyShare> energyShares;

  /**
   * The cached value of the '{@link #getSettings() <em>Settings</em>}' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getSettings()
   * @generated
   * @ordered
   */
  protected EList<Setting> settings;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected FitResultImpl()
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
    return PendulinePackage.Literals.FIT_RESULT;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getId()
  {
    return id;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setId(String newId)
  {
    String oldId = id;
    id = newId;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FIT_RESULT__ID, oldId, id));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getName()
  {
    return name;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setName(String newName)
  {
    String oldName = name;
    name = newName;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FIT_RESULT__NAME, oldName, name));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getComputedAt()
  {
    return computedAt;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setComputedAt(String newComputedAt)
  {
    String oldComputedAt = computedAt;
    computedAt = newComputedAt;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FIT_RESULT__COMPUTED_AT, oldComputedAt, computedAt));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getHypothesisId()
  {
    return hypothesisId;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setHypothesisId(String newHypothesisId)
  {
    String oldHypothesisId = hypothesisId;
    hypothesisId = newHypothesisId;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FIT_RESULT__HYPOTHESIS_ID, oldHypothesisId, hypothesisId));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<String> getSessionIds()
  {
    if (sessionIds == null)
    {
      sessionIds = new EDataTypeUniqueEList<String>(String.class, this, PendulinePackage.FIT_RESULT__SESSION_IDS);
    }
    return sessionIds;
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
      termIds = new EDataTypeUniqueEList<String>(String.class, this, PendulinePackage.FIT_RESULT__TERM_IDS);
    }
    return termIds;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<Estimate> getEstimates()
  {
    if (estimates == null)
    {
      estimates = new EObjectContainmentEList<Estimate>(Estimate.class, this, PendulinePackage.FIT_RESULT__ESTIMATES);
    }
    return estimates;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<String> getCorrelationParameters()
  {
    if (correlationParameters == null)
    {
      correlationParameters = new EDataTypeUniqueEList<String>(String.class, this, PendulinePackage.FIT_RESULT__CORRELATION_PARAMETERS);
    }
    return correlationParameters;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<Double> getCorrelations()
  {
    if (correlations == null)
    {
      correlations = new EDataTypeEList<Double>(Double.class, this, PendulinePackage.FIT_RESULT__CORRELATIONS);
    }
    return correlations;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getCalculatedInertia()
  {
    return calculatedInertia;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setCalculatedInertia(double newCalculatedInertia)
  {
    double oldCalculatedInertia = calculatedInertia;
    calculatedInertia = newCalculatedInertia;
    boolean oldCalculatedInertiaESet = calculatedInertiaESet;
    calculatedInertiaESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FIT_RESULT__CALCULATED_INERTIA, oldCalculatedInertia, calculatedInertia, !oldCalculatedInertiaESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetCalculatedInertia()
  {
    double oldCalculatedInertia = calculatedInertia;
    boolean oldCalculatedInertiaESet = calculatedInertiaESet;
    calculatedInertia = CALCULATED_INERTIA_EDEFAULT;
    calculatedInertiaESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.FIT_RESULT__CALCULATED_INERTIA, oldCalculatedInertia, CALCULATED_INERTIA_EDEFAULT, oldCalculatedInertiaESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetCalculatedInertia()
  {
    return calculatedInertiaESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getFittedInertia()
  {
    return fittedInertia;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setFittedInertia(double newFittedInertia)
  {
    double oldFittedInertia = fittedInertia;
    fittedInertia = newFittedInertia;
    boolean oldFittedInertiaESet = fittedInertiaESet;
    fittedInertiaESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FIT_RESULT__FITTED_INERTIA, oldFittedInertia, fittedInertia, !oldFittedInertiaESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetFittedInertia()
  {
    double oldFittedInertia = fittedInertia;
    boolean oldFittedInertiaESet = fittedInertiaESet;
    fittedInertia = FITTED_INERTIA_EDEFAULT;
    fittedInertiaESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.FIT_RESULT__FITTED_INERTIA, oldFittedInertia, FITTED_INERTIA_EDEFAULT, oldFittedInertiaESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetFittedInertia()
  {
    return fittedInertiaESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<SessionFit> getSessionFits()
  {
    if (sessionFits == null)
    {
      sessionFits = new EObjectContainmentEList<SessionFit>(SessionFit.class, this, PendulinePackage.FIT_RESULT__SESSION_FITS);
    }
    return sessionFits;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<TermSetScore> getComparisons()
  {
    if (comparisons == null)
    {
      comparisons = new EObjectContainmentEList<TermSetScore>(TermSetScore.class, this, PendulinePackage.FIT_RESULT__COMPARISONS);
    }
    return comparisons;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getDominantLoss()
  {
    return dominantLoss;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setDominantLoss(String newDominantLoss)
  {
    String oldDominantLoss = dominantLoss;
    dominantLoss = newDominantLoss;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FIT_RESULT__DOMINANT_LOSS, oldDominantLoss, dominantLoss));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<EnergyShare> getEnergyShares()
  {
    if (energyShares == null)
    {
      energyShares = new EObjectContainmentEList<EnergyShare>(EnergyShare.class, this, PendulinePackage.FIT_RESULT__ENERGY_SHARES);
    }
    return energyShares;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<Setting> getSettings()
  {
    if (settings == null)
    {
      settings = new EObjectContainmentEList<Setting>(Setting.class, this, PendulinePackage.FIT_RESULT__SETTINGS);
    }
    return settings;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs)
  {
    switch (featureID)
    {
      case PendulinePackage.FIT_RESULT__ESTIMATES:
        return ((InternalEList<?>)getEstimates()).basicRemove(otherEnd, msgs);
      case PendulinePackage.FIT_RESULT__SESSION_FITS:
        return ((InternalEList<?>)getSessionFits()).basicRemove(otherEnd, msgs);
      case PendulinePackage.FIT_RESULT__COMPARISONS:
        return ((InternalEList<?>)getComparisons()).basicRemove(otherEnd, msgs);
      case PendulinePackage.FIT_RESULT__ENERGY_SHARES:
        return ((InternalEList<?>)getEnergyShares()).basicRemove(otherEnd, msgs);
      case PendulinePackage.FIT_RESULT__SETTINGS:
        return ((InternalEList<?>)getSettings()).basicRemove(otherEnd, msgs);
    }
    return super.eInverseRemove(otherEnd, featureID, msgs);
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
      case PendulinePackage.FIT_RESULT__ID:
        return getId();
      case PendulinePackage.FIT_RESULT__NAME:
        return getName();
      case PendulinePackage.FIT_RESULT__COMPUTED_AT:
        return getComputedAt();
      case PendulinePackage.FIT_RESULT__HYPOTHESIS_ID:
        return getHypothesisId();
      case PendulinePackage.FIT_RESULT__SESSION_IDS:
        return getSessionIds();
      case PendulinePackage.FIT_RESULT__TERM_IDS:
        return getTermIds();
      case PendulinePackage.FIT_RESULT__ESTIMATES:
        return getEstimates();
      case PendulinePackage.FIT_RESULT__CORRELATION_PARAMETERS:
        return getCorrelationParameters();
      case PendulinePackage.FIT_RESULT__CORRELATIONS:
        return getCorrelations();
      case PendulinePackage.FIT_RESULT__CALCULATED_INERTIA:
        return getCalculatedInertia();
      case PendulinePackage.FIT_RESULT__FITTED_INERTIA:
        return getFittedInertia();
      case PendulinePackage.FIT_RESULT__SESSION_FITS:
        return getSessionFits();
      case PendulinePackage.FIT_RESULT__COMPARISONS:
        return getComparisons();
      case PendulinePackage.FIT_RESULT__DOMINANT_LOSS:
        return getDominantLoss();
      case PendulinePackage.FIT_RESULT__ENERGY_SHARES:
        return getEnergyShares();
      case PendulinePackage.FIT_RESULT__SETTINGS:
        return getSettings();
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
      case PendulinePackage.FIT_RESULT__ID:
        setId((String)newValue);
        return;
      case PendulinePackage.FIT_RESULT__NAME:
        setName((String)newValue);
        return;
      case PendulinePackage.FIT_RESULT__COMPUTED_AT:
        setComputedAt((String)newValue);
        return;
      case PendulinePackage.FIT_RESULT__HYPOTHESIS_ID:
        setHypothesisId((String)newValue);
        return;
      case PendulinePackage.FIT_RESULT__SESSION_IDS:
        getSessionIds().clear();
        getSessionIds().addAll((Collection<? extends String>)newValue);
        return;
      case PendulinePackage.FIT_RESULT__TERM_IDS:
        getTermIds().clear();
        getTermIds().addAll((Collection<? extends String>)newValue);
        return;
      case PendulinePackage.FIT_RESULT__ESTIMATES:
        getEstimates().clear();
        getEstimates().addAll((Collection<? extends Estimate>)newValue);
        return;
      case PendulinePackage.FIT_RESULT__CORRELATION_PARAMETERS:
        getCorrelationParameters().clear();
        getCorrelationParameters().addAll((Collection<? extends String>)newValue);
        return;
      case PendulinePackage.FIT_RESULT__CORRELATIONS:
        getCorrelations().clear();
        getCorrelations().addAll((Collection<? extends Double>)newValue);
        return;
      case PendulinePackage.FIT_RESULT__CALCULATED_INERTIA:
        setCalculatedInertia((Double)newValue);
        return;
      case PendulinePackage.FIT_RESULT__FITTED_INERTIA:
        setFittedInertia((Double)newValue);
        return;
      case PendulinePackage.FIT_RESULT__SESSION_FITS:
        getSessionFits().clear();
        getSessionFits().addAll((Collection<? extends SessionFit>)newValue);
        return;
      case PendulinePackage.FIT_RESULT__COMPARISONS:
        getComparisons().clear();
        getComparisons().addAll((Collection<? extends TermSetScore>)newValue);
        return;
      case PendulinePackage.FIT_RESULT__DOMINANT_LOSS:
        setDominantLoss((String)newValue);
        return;
      case PendulinePackage.FIT_RESULT__ENERGY_SHARES:
        getEnergyShares().clear();
        getEnergyShares().addAll((Collection<? extends EnergyShare>)newValue);
        return;
      case PendulinePackage.FIT_RESULT__SETTINGS:
        getSettings().clear();
        getSettings().addAll((Collection<? extends Setting>)newValue);
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
      case PendulinePackage.FIT_RESULT__ID:
        setId(ID_EDEFAULT);
        return;
      case PendulinePackage.FIT_RESULT__NAME:
        setName(NAME_EDEFAULT);
        return;
      case PendulinePackage.FIT_RESULT__COMPUTED_AT:
        setComputedAt(COMPUTED_AT_EDEFAULT);
        return;
      case PendulinePackage.FIT_RESULT__HYPOTHESIS_ID:
        setHypothesisId(HYPOTHESIS_ID_EDEFAULT);
        return;
      case PendulinePackage.FIT_RESULT__SESSION_IDS:
        getSessionIds().clear();
        return;
      case PendulinePackage.FIT_RESULT__TERM_IDS:
        getTermIds().clear();
        return;
      case PendulinePackage.FIT_RESULT__ESTIMATES:
        getEstimates().clear();
        return;
      case PendulinePackage.FIT_RESULT__CORRELATION_PARAMETERS:
        getCorrelationParameters().clear();
        return;
      case PendulinePackage.FIT_RESULT__CORRELATIONS:
        getCorrelations().clear();
        return;
      case PendulinePackage.FIT_RESULT__CALCULATED_INERTIA:
        unsetCalculatedInertia();
        return;
      case PendulinePackage.FIT_RESULT__FITTED_INERTIA:
        unsetFittedInertia();
        return;
      case PendulinePackage.FIT_RESULT__SESSION_FITS:
        getSessionFits().clear();
        return;
      case PendulinePackage.FIT_RESULT__COMPARISONS:
        getComparisons().clear();
        return;
      case PendulinePackage.FIT_RESULT__DOMINANT_LOSS:
        setDominantLoss(DOMINANT_LOSS_EDEFAULT);
        return;
      case PendulinePackage.FIT_RESULT__ENERGY_SHARES:
        getEnergyShares().clear();
        return;
      case PendulinePackage.FIT_RESULT__SETTINGS:
        getSettings().clear();
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
      case PendulinePackage.FIT_RESULT__ID:
        return ID_EDEFAULT == null ? id != null : !ID_EDEFAULT.equals(id);
      case PendulinePackage.FIT_RESULT__NAME:
        return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
      case PendulinePackage.FIT_RESULT__COMPUTED_AT:
        return COMPUTED_AT_EDEFAULT == null ? computedAt != null : !COMPUTED_AT_EDEFAULT.equals(computedAt);
      case PendulinePackage.FIT_RESULT__HYPOTHESIS_ID:
        return HYPOTHESIS_ID_EDEFAULT == null ? hypothesisId != null : !HYPOTHESIS_ID_EDEFAULT.equals(hypothesisId);
      case PendulinePackage.FIT_RESULT__SESSION_IDS:
        return sessionIds != null && !sessionIds.isEmpty();
      case PendulinePackage.FIT_RESULT__TERM_IDS:
        return termIds != null && !termIds.isEmpty();
      case PendulinePackage.FIT_RESULT__ESTIMATES:
        return estimates != null && !estimates.isEmpty();
      case PendulinePackage.FIT_RESULT__CORRELATION_PARAMETERS:
        return correlationParameters != null && !correlationParameters.isEmpty();
      case PendulinePackage.FIT_RESULT__CORRELATIONS:
        return correlations != null && !correlations.isEmpty();
      case PendulinePackage.FIT_RESULT__CALCULATED_INERTIA:
        return isSetCalculatedInertia();
      case PendulinePackage.FIT_RESULT__FITTED_INERTIA:
        return isSetFittedInertia();
      case PendulinePackage.FIT_RESULT__SESSION_FITS:
        return sessionFits != null && !sessionFits.isEmpty();
      case PendulinePackage.FIT_RESULT__COMPARISONS:
        return comparisons != null && !comparisons.isEmpty();
      case PendulinePackage.FIT_RESULT__DOMINANT_LOSS:
        return DOMINANT_LOSS_EDEFAULT == null ? dominantLoss != null : !DOMINANT_LOSS_EDEFAULT.equals(dominantLoss);
      case PendulinePackage.FIT_RESULT__ENERGY_SHARES:
        return energyShares != null && !energyShares.isEmpty();
      case PendulinePackage.FIT_RESULT__SETTINGS:
        return settings != null && !settings.isEmpty();
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
    result.append(" (id: ");
    result.append(id);
    result.append(", name: ");
    result.append(name);
    result.append(", computedAt: ");
    result.append(computedAt);
    result.append(", hypothesisId: ");
    result.append(hypothesisId);
    result.append(", sessionIds: ");
    result.append(sessionIds);
    result.append(", termIds: ");
    result.append(termIds);
    result.append(", correlationParameters: ");
    result.append(correlationParameters);
    result.append(", correlations: ");
    result.append(correlations);
    result.append(", calculatedInertia: ");
    if (calculatedInertiaESet) result.append(calculatedInertia); else result.append("<unset>");
    result.append(", fittedInertia: ");
    if (fittedInertiaESet) result.append(fittedInertia); else result.append("<unset>");
    result.append(", dominantLoss: ");
    result.append(dominantLoss);
    result.append(')');
    return result.toString();
  }

} //FitResultImpl
