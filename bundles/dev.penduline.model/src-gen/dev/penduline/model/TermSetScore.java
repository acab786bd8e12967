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
 * A representation of the model object '<em><b>Term Set Score</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * How well one set of friction terms explained the records.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.TermSetScore#getTermIds <em>Term Ids</em>}</li>
 *   <li>{@link dev.penduline.model.TermSetScore#getAic <em>Aic</em>}</li>
 *   <li>{@link dev.penduline.model.TermSetScore#getBic <em>Bic</em>}</li>
 *   <li>{@link dev.penduline.model.TermSetScore#getRmsResidual <em>Rms Residual</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getTermSetScore()
 * @model extendedMetaData="name='TermSetScore' kind='elementOnly'"
 * @generated
 */
public interface TermSetScore extends EObject
{
  /**
   * Returns the value of the '<em><b>Term Ids</b></em>' attribute list.
   * The list contents are of type {@link java.lang.String}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Identifiers (kinds) of the terms in the set.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Term Ids</em>' attribute list.
   * @see dev.penduline.model.PendulinePackage#getTermSetScore_TermIds()
   * @model extendedMetaData="kind='element' name='termId'"
   * @generated
   */
  EList<String> getTermIds();

  /**
   * Returns the value of the '<em><b>Aic</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Akaike information criterion (dimensionless; lower is better).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Aic</em>' attribute.
   * @see #setAic(double)
   * @see dev.penduline.model.PendulinePackage#getTermSetScore_Aic()
   * @model extendedMetaData="kind='element' name='aic'"
   * @generated
   */
  double getAic();

  /**
   * Sets the value of the '{@link dev.penduline.model.TermSetScore#getAic <em>Aic</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Aic</em>' attribute.
   * @see #getAic()
   * @generated
   */
  void setAic(double value);

  /**
   * Returns the value of the '<em><b>Bic</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Bayesian information criterion (dimensionless; lower is better).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Bic</em>' attribute.
   * @see #setBic(double)
   * @see dev.penduline.model.PendulinePackage#getTermSetScore_Bic()
   * @model extendedMetaData="kind='element' name='bic'"
   * @generated
   */
  double getBic();

  /**
   * Sets the value of the '{@link dev.penduline.model.TermSetScore#getBic <em>Bic</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Bic</em>' attribute.
   * @see #getBic()
   * @generated
   */
  void setBic(double value);

  /**
   * Returns the value of the '<em><b>Rms Residual</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Root-mean-square residual of the angle (rad).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Rms Residual</em>' attribute.
   * @see #setRmsResidual(double)
   * @see dev.penduline.model.PendulinePackage#getTermSetScore_RmsResidual()
   * @model extendedMetaData="kind='element' name='rmsResidual'"
   * @generated
   */
  double getRmsResidual();

  /**
   * Sets the value of the '{@link dev.penduline.model.TermSetScore#getRmsResidual <em>Rms Residual</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Rms Residual</em>' attribute.
   * @see #getRmsResidual()
   * @generated
   */
  void setRmsResidual(double value);

} // TermSetScore
