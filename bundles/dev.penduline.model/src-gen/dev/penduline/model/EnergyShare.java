/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Energy Share</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The share of dissipated energy taken by one term.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.EnergyShare#getTermId <em>Term Id</em>}</li>
 *   <li>{@link dev.penduline.model.EnergyShare#getShare <em>Share</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getEnergyShare()
 * @model extendedMetaData="name='EnergyShare' kind='elementOnly'"
 * @generated
 */
public interface EnergyShare extends EObject
{
  /**
   * Returns the value of the '<em><b>Term Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Identifier of the term.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Term Id</em>' attribute.
   * @see #setTermId(String)
   * @see dev.penduline.model.PendulinePackage#getEnergyShare_TermId()
   * @model extendedMetaData="kind='element' name='termId'"
   * @generated
   */
  String getTermId();

  /**
   * Sets the value of the '{@link dev.penduline.model.EnergyShare#getTermId <em>Term Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Term Id</em>' attribute.
   * @see #getTermId()
   * @generated
   */
  void setTermId(String value);

  /**
   * Returns the value of the '<em><b>Share</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Fraction of the energy dissipated over the records (0 … 1, dimensionless).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Share</em>' attribute.
   * @see #setShare(double)
   * @see dev.penduline.model.PendulinePackage#getEnergyShare_Share()
   * @model extendedMetaData="kind='element' name='share'"
   * @generated
   */
  double getShare();

  /**
   * Sets the value of the '{@link dev.penduline.model.EnergyShare#getShare <em>Share</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Share</em>' attribute.
   * @see #getShare()
   * @generated
   */
  void setShare(double value);

} // EnergyShare
