/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Estimate</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A fitted parameter value.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.Estimate#getParameter <em>Parameter</em>}</li>
 *   <li>{@link dev.penduline.model.Estimate#getValue <em>Value</em>}</li>
 *   <li>{@link dev.penduline.model.Estimate#getStandardError <em>Standard Error</em>}</li>
 *   <li>{@link dev.penduline.model.Estimate#getResamplingError <em>Resampling Error</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getEstimate()
 * @model extendedMetaData="name='Estimate' kind='elementOnly'"
 * @generated
 */
public interface Estimate extends EObject
{
  /**
   * Returns the value of the '<em><b>Parameter</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Parameter name: a friction term identifier, or 'inertia'.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Parameter</em>' attribute.
   * @see #setParameter(String)
   * @see dev.penduline.model.PendulinePackage#getEstimate_Parameter()
   * @model extendedMetaData="kind='element' name='parameter'"
   * @generated
   */
  String getParameter();

  /**
   * Sets the value of the '{@link dev.penduline.model.Estimate#getParameter <em>Parameter</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Parameter</em>' attribute.
   * @see #getParameter()
   * @generated
   */
  void setParameter(String value);

  /**
   * Returns the value of the '<em><b>Value</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Estimated value (SI unit of the parameter).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Value</em>' attribute.
   * @see #setValue(double)
   * @see dev.penduline.model.PendulinePackage#getEstimate_Value()
   * @model extendedMetaData="kind='element' name='value'"
   * @generated
   */
  double getValue();

  /**
   * Sets the value of the '{@link dev.penduline.model.Estimate#getValue <em>Value</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Value</em>' attribute.
   * @see #getValue()
   * @generated
   */
  void setValue(double value);

  /**
   * Returns the value of the '<em><b>Standard Error</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Standard error of the estimate from the Jacobian at the optimum (same unit); unset when not available.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Standard Error</em>' attribute.
   * @see #isSetStandardError()
   * @see #unsetStandardError()
   * @see #setStandardError(double)
   * @see dev.penduline.model.PendulinePackage#getEstimate_StandardError()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='standardError'"
   * @generated
   */
  double getStandardError();

  /**
   * Sets the value of the '{@link dev.penduline.model.Estimate#getStandardError <em>Standard Error</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Standard Error</em>' attribute.
   * @see #isSetStandardError()
   * @see #unsetStandardError()
   * @see #getStandardError()
   * @generated
   */
  void setStandardError(double value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.Estimate#getStandardError <em>Standard Error</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetStandardError()
   * @see #getStandardError()
   * @see #setStandardError(double)
   * @generated
   */
  void unsetStandardError();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.Estimate#getStandardError <em>Standard Error</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Standard Error</em>' attribute is set.
   * @see #unsetStandardError()
   * @see #getStandardError()
   * @see #setStandardError(double)
   * @generated
   */
  boolean isSetStandardError();

  /**
   * Returns the value of the '<em><b>Resampling Error</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Standard error from resampling (moving-block bootstrap of the residuals), same unit; unset when not computed.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Resampling Error</em>' attribute.
   * @see #isSetResamplingError()
   * @see #unsetResamplingError()
   * @see #setResamplingError(double)
   * @see dev.penduline.model.PendulinePackage#getEstimate_ResamplingError()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='resamplingError'"
   * @generated
   */
  double getResamplingError();

  /**
   * Sets the value of the '{@link dev.penduline.model.Estimate#getResamplingError <em>Resampling Error</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Resampling Error</em>' attribute.
   * @see #isSetResamplingError()
   * @see #unsetResamplingError()
   * @see #getResamplingError()
   * @generated
   */
  void setResamplingError(double value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.Estimate#getResamplingError <em>Resampling Error</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetResamplingError()
   * @see #getResamplingError()
   * @see #setResamplingError(double)
   * @generated
   */
  void unsetResamplingError();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.Estimate#getResamplingError <em>Resampling Error</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Resampling Error</em>' attribute is set.
   * @see #unsetResamplingError()
   * @see #getResamplingError()
   * @see #setResamplingError(double)
   * @generated
   */
  boolean isSetResamplingError();

} // Estimate
