/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Setting</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One setting of a computation, as text.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.Setting#getKey <em>Key</em>}</li>
 *   <li>{@link dev.penduline.model.Setting#getValue <em>Value</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getSetting()
 * @model extendedMetaData="name='Setting' kind='elementOnly'"
 * @generated
 */
public interface Setting extends EObject
{
  /**
   * Returns the value of the '<em><b>Key</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Name of the setting.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Key</em>' attribute.
   * @see #setKey(String)
   * @see dev.penduline.model.PendulinePackage#getSetting_Key()
   * @model extendedMetaData="kind='element' name='key'"
   * @generated
   */
  String getKey();

  /**
   * Sets the value of the '{@link dev.penduline.model.Setting#getKey <em>Key</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Key</em>' attribute.
   * @see #getKey()
   * @generated
   */
  void setKey(String value);

  /**
   * Returns the value of the '<em><b>Value</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Value of the setting, as text with its unit where it has one.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Value</em>' attribute.
   * @see #setValue(String)
   * @see dev.penduline.model.PendulinePackage#getSetting_Value()
   * @model extendedMetaData="kind='element' name='value'"
   * @generated
   */
  String getValue();

  /**
   * Sets the value of the '{@link dev.penduline.model.Setting#getValue <em>Value</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Value</em>' attribute.
   * @see #getValue()
   * @generated
   */
  void setValue(String value);

} // Setting
