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
 * A representation of the model object '<em><b>Friction Hypothesis</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A named set of friction terms, fitted together and compared with other sets.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.FrictionHypothesis#getId <em>Id</em>}</li>
 *   <li>{@link dev.penduline.model.FrictionHypothesis#getName <em>Name</em>}</li>
 *   <li>{@link dev.penduline.model.FrictionHypothesis#getDescription <em>Description</em>}</li>
 *   <li>{@link dev.penduline.model.FrictionHypothesis#getTerms <em>Terms</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getFrictionHypothesis()
 * @model extendedMetaData="name='FrictionHypothesis' kind='elementOnly'"
 * @generated
 */
public interface FrictionHypothesis extends EObject
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
   * @see dev.penduline.model.PendulinePackage#getFrictionHypothesis_Id()
   * @model extendedMetaData="kind='element' name='id'"
   * @generated
   */
  String getId();

  /**
   * Sets the value of the '{@link dev.penduline.model.FrictionHypothesis#getId <em>Id</em>}' attribute.
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
   * Name of the hypothesis, e.g. 'viscous and Coulomb'.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Name</em>' attribute.
   * @see #setName(String)
   * @see dev.penduline.model.PendulinePackage#getFrictionHypothesis_Name()
   * @model extendedMetaData="kind='element' name='name'"
   * @generated
   */
  String getName();

  /**
   * Sets the value of the '{@link dev.penduline.model.FrictionHypothesis#getName <em>Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Name</em>' attribute.
   * @see #getName()
   * @generated
   */
  void setName(String value);

  /**
   * Returns the value of the '<em><b>Description</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Free text: why this set is worth testing.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Description</em>' attribute.
   * @see #setDescription(String)
   * @see dev.penduline.model.PendulinePackage#getFrictionHypothesis_Description()
   * @model extendedMetaData="kind='element' name='description'"
   * @generated
   */
  String getDescription();

  /**
   * Sets the value of the '{@link dev.penduline.model.FrictionHypothesis#getDescription <em>Description</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Description</em>' attribute.
   * @see #getDescription()
   * @generated
   */
  void setDescription(String value);

  /**
   * Returns the value of the '<em><b>Terms</b></em>' containment reference list.
   * The list contents are of type {@link dev.penduline.model.FrictionTerm}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * The terms of the set, at most one of each kind.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Terms</em>' containment reference list.
   * @see dev.penduline.model.PendulinePackage#getFrictionHypothesis_Terms()
   * @model containment="true"
   *        extendedMetaData="kind='element' name='term'"
   * @generated
   */
  EList<FrictionTerm> getTerms();

} // FrictionHypothesis
