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
 * A representation of the model object '<em><b>Fit Result</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The stored result of one friction fit over one or more sessions.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.FitResult#getId <em>Id</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getName <em>Name</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getComputedAt <em>Computed At</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getHypothesisId <em>Hypothesis Id</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getSessionIds <em>Session Ids</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getTermIds <em>Term Ids</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getEstimates <em>Estimates</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getCorrelationParameters <em>Correlation Parameters</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getCorrelations <em>Correlations</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getCalculatedInertia <em>Calculated Inertia</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getFittedInertia <em>Fitted Inertia</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getSessionFits <em>Session Fits</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getComparisons <em>Comparisons</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getDominantLoss <em>Dominant Loss</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getEnergyShares <em>Energy Shares</em>}</li>
 *   <li>{@link dev.penduline.model.FitResult#getSettings <em>Settings</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getFitResult()
 * @model extendedMetaData="name='FitResult' kind='elementOnly'"
 * @generated
 */
public interface FitResult extends EObject
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
   * @see dev.penduline.model.PendulinePackage#getFitResult_Id()
   * @model extendedMetaData="kind='element' name='id'"
   * @generated
   */
  String getId();

  /**
   * Sets the value of the '{@link dev.penduline.model.FitResult#getId <em>Id</em>}' attribute.
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
   * Name of the fit.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Name</em>' attribute.
   * @see #setName(String)
   * @see dev.penduline.model.PendulinePackage#getFitResult_Name()
   * @model extendedMetaData="kind='element' name='name'"
   * @generated
   */
  String getName();

  /**
   * Sets the value of the '{@link dev.penduline.model.FitResult#getName <em>Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Name</em>' attribute.
   * @see #getName()
   * @generated
   */
  void setName(String value);

  /**
   * Returns the value of the '<em><b>Computed At</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * When the fit was computed, as an ISO-8601 instant (e.g. 2026-09-14T10:15:30Z): the only timestamp in the file.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Computed At</em>' attribute.
   * @see #setComputedAt(String)
   * @see dev.penduline.model.PendulinePackage#getFitResult_ComputedAt()
   * @model extendedMetaData="kind='element' name='computedAt'"
   * @generated
   */
  String getComputedAt();

  /**
   * Sets the value of the '{@link dev.penduline.model.FitResult#getComputedAt <em>Computed At</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Computed At</em>' attribute.
   * @see #getComputedAt()
   * @generated
   */
  void setComputedAt(String value);

  /**
   * Returns the value of the '<em><b>Hypothesis Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Identifier of the friction hypothesis fitted.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Hypothesis Id</em>' attribute.
   * @see #setHypothesisId(String)
   * @see dev.penduline.model.PendulinePackage#getFitResult_HypothesisId()
   * @model extendedMetaData="kind='element' name='hypothesisId'"
   * @generated
   */
  String getHypothesisId();

  /**
   * Sets the value of the '{@link dev.penduline.model.FitResult#getHypothesisId <em>Hypothesis Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Hypothesis Id</em>' attribute.
   * @see #getHypothesisId()
   * @generated
   */
  void setHypothesisId(String value);

  /**
   * Returns the value of the '<em><b>Session Ids</b></em>' attribute list.
   * The list contents are of type {@link java.lang.String}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Identifiers of the sessions fitted jointly, in fit order.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Session Ids</em>' attribute list.
   * @see dev.penduline.model.PendulinePackage#getFitResult_SessionIds()
   * @model extendedMetaData="kind='element' name='sessionId'"
   * @generated
   */
  EList<String> getSessionIds();

  /**
   * Returns the value of the '<em><b>Term Ids</b></em>' attribute list.
   * The list contents are of type {@link java.lang.String}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Identifiers of the friction terms that were free in the fit.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Term Ids</em>' attribute list.
   * @see dev.penduline.model.PendulinePackage#getFitResult_TermIds()
   * @model extendedMetaData="kind='element' name='termId'"
   * @generated
   */
  EList<String> getTermIds();

  /**
   * Returns the value of the '<em><b>Estimates</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.Estimate}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Fitted parameter values with standard errors.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Estimates</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getFitResult_Estimates()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='estimate'"
   * @generated
   */
  EList<Estimate> getEstimates();

  /**
   * Returns the value of the '<em><b>Correlation Parameters</b></em>' attribute list.
   * The list contents are of type {@link java.lang.String}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Parameter names labelling the rows and columns of the correlation matrix, in order.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Correlation Parameters</em>' attribute list.
   * @see dev.penduline.model.PendulinePackage#getFitResult_CorrelationParameters()
   * @model extendedMetaData="kind='element' name='correlationParameter'"
   * @generated
   */
  EList<String> getCorrelationParameters();

  /**
   * Returns the value of the '<em><b>Correlations</b></em>' attribute list.
   * The list contents are of type {@link java.lang.Double}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * The correlation matrix, row by row (n² values for n parameters; dimensionless, diagonal 1).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Correlations</em>' attribute list.
   * @see dev.penduline.model.PendulinePackage#getFitResult_Correlations()
   * @model unique="false"
   *        extendedMetaData="kind='element' name='correlation'"
   * @generated
   */
  EList<Double> getCorrelations();

  /**
   * Returns the value of the '<em><b>Calculated Inertia</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Inertia about the pivot J0 calculated from the parts (kg·m²).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Calculated Inertia</em>' attribute.
   * @see #isSetCalculatedInertia()
   * @see #unsetCalculatedInertia()
   * @see #setCalculatedInertia(double)
   * @see dev.penduline.model.PendulinePackage#getFitResult_CalculatedInertia()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='calculatedInertia'"
   * @generated
   */
  double getCalculatedInertia();

  /**
   * Sets the value of the '{@link dev.penduline.model.FitResult#getCalculatedInertia <em>Calculated Inertia</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Calculated Inertia</em>' attribute.
   * @see #isSetCalculatedInertia()
   * @see #unsetCalculatedInertia()
   * @see #getCalculatedInertia()
   * @generated
   */
  void setCalculatedInertia(double value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.FitResult#getCalculatedInertia <em>Calculated Inertia</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetCalculatedInertia()
   * @see #getCalculatedInertia()
   * @see #setCalculatedInertia(double)
   * @generated
   */
  void unsetCalculatedInertia();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.FitResult#getCalculatedInertia <em>Calculated Inertia</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Calculated Inertia</em>' attribute is set.
   * @see #unsetCalculatedInertia()
   * @see #getCalculatedInertia()
   * @see #setCalculatedInertia(double)
   * @generated
   */
  boolean isSetCalculatedInertia();

  /**
   * Returns the value of the '<em><b>Fitted Inertia</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Inertia about the pivot J0 found by the fit (kg·m²); unset when it was held at the calculated value.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Fitted Inertia</em>' attribute.
   * @see #isSetFittedInertia()
   * @see #unsetFittedInertia()
   * @see #setFittedInertia(double)
   * @see dev.penduline.model.PendulinePackage#getFitResult_FittedInertia()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='fittedInertia'"
   * @generated
   */
  double getFittedInertia();

  /**
   * Sets the value of the '{@link dev.penduline.model.FitResult#getFittedInertia <em>Fitted Inertia</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Fitted Inertia</em>' attribute.
   * @see #isSetFittedInertia()
   * @see #unsetFittedInertia()
   * @see #getFittedInertia()
   * @generated
   */
  void setFittedInertia(double value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.FitResult#getFittedInertia <em>Fitted Inertia</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetFittedInertia()
   * @see #getFittedInertia()
   * @see #setFittedInertia(double)
   * @generated
   */
  void unsetFittedInertia();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.FitResult#getFittedInertia <em>Fitted Inertia</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Fitted Inertia</em>' attribute is set.
   * @see #unsetFittedInertia()
   * @see #getFittedInertia()
   * @see #setFittedInertia(double)
   * @generated
   */
  boolean isSetFittedInertia();

  /**
   * Returns the value of the '<em><b>Session Fits</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.SessionFit}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Per-session nuisance values.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Session Fits</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getFitResult_SessionFits()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='sessionFit'"
   * @generated
   */
  EList<SessionFit> getSessionFits();

  /**
   * Returns the value of the '<em><b>Comparisons</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.TermSetScore}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Scores of the term sets compared, best first.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Comparisons</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getFitResult_Comparisons()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='comparison'"
   * @generated
   */
  EList<TermSetScore> getComparisons();

  /**
   * Returns the value of the '<em><b>Dominant Loss</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Identifier of the term that dissipated most energy over the records.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Dominant Loss</em>' attribute.
   * @see #setDominantLoss(String)
   * @see dev.penduline.model.PendulinePackage#getFitResult_DominantLoss()
   * @model extendedMetaData="kind='element' name='dominantLoss'"
   * @generated
   */
  String getDominantLoss();

  /**
   * Sets the value of the '{@link dev.penduline.model.FitResult#getDominantLoss <em>Dominant Loss</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Dominant Loss</em>' attribute.
   * @see #getDominantLoss()
   * @generated
   */
  void setDominantLoss(String value);

  /**
   * Returns the value of the '<em><b>Energy Shares</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.EnergyShare}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Share of the dissipated energy per term.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Energy Shares</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getFitResult_EnergyShares()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='energyShare'"
   * @generated
   */
  EList<EnergyShare> getEnergyShares();

  /**
   * Returns the value of the '<em><b>Settings</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.Setting}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * The settings the fit ran with, as key/value pairs in a stable order.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Settings</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getFitResult_Settings()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='setting'"
   * @generated
   */
  EList<Setting> getSettings();

} // FitResult
