/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Friction Term</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One friction term of a hypothesis, with its starting or fixed value and bounds, in the SI unit of its kind (see FrictionKind).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.FrictionTerm#getId <em>Id</em>}</li>
 *   <li>{@link dev.penduline.model.FrictionTerm#getKind <em>Kind</em>}</li>
 *   <li>{@link dev.penduline.model.FrictionTerm#getValue <em>Value</em>}</li>
 *   <li>{@link dev.penduline.model.FrictionTerm#getLowerBound <em>Lower Bound</em>}</li>
 *   <li>{@link dev.penduline.model.FrictionTerm#getUpperBound <em>Upper Bound</em>}</li>
 *   <li>{@link dev.penduline.model.FrictionTerm#isFixed <em>Fixed</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getFrictionTerm()
 * @model extendedMetaData="name='FrictionTerm' kind='elementOnly'"
 * @generated
 */
public interface FrictionTerm extends EObject
{
  /**
   * Returns the value of the '<em><b>Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Stable identifier, derived from the name when the element is created (lower case, words joined by '-', a numeric suffix when taken); unique among its siblings. Other elements and the user refer to it; it never changes on rename. For terms: the kind's literal by default (viscous, coulomb, stiction, drag).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Id</em>' attribute.
   * @see #setId(String)
   * @see dev.penduline.model.PendulinePackage#getFrictionTerm_Id()
   * @model extendedMetaData="kind='element' name='id'"
   * @generated
   */
  String getId();

  /**
   * Sets the value of the '{@link dev.penduline.model.FrictionTerm#getId <em>Id</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Id</em>' attribute.
   * @see #getId()
   * @generated
   */
  void setId(String value);

  /**
   * Returns the value of the '<em><b>Kind</b></em>' attribute.
   * The literals are from the enumeration {@link dev.penduline.model.FrictionKind}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * The kind of torque. Unsettable so that it is written even when it is the first literal (viscous); unset reads as viscous.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Kind</em>' attribute.
   * @see dev.penduline.model.FrictionKind
   * @see #isSetKind()
   * @see #unsetKind()
   * @see #setKind(FrictionKind)
   * @see dev.penduline.model.PendulinePackage#getFrictionTerm_Kind()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='kind'"
   * @generated
   */
  FrictionKind getKind();

  /**
   * Sets the value of the '{@link dev.penduline.model.FrictionTerm#getKind <em>Kind</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Kind</em>' attribute.
   * @see dev.penduline.model.FrictionKind
   * @see #isSetKind()
   * @see #unsetKind()
   * @see #getKind()
   * @generated
   */
  void setKind(FrictionKind value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.FrictionTerm#getKind <em>Kind</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetKind()
   * @see #getKind()
   * @see #setKind(FrictionKind)
   * @generated
   */
  void unsetKind();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.FrictionTerm#getKind <em>Kind</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Kind</em>' attribute is set.
   * @see #unsetKind()
   * @see #getKind()
   * @see #setKind(FrictionKind)
   * @generated
   */
  boolean isSetKind();

  /**
   * Returns the value of the '<em><b>Value</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Starting value for a free term, or the value of a fixed term (SI unit of the kind); unset when the fit is to find its own start.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Value</em>' attribute.
   * @see #isSetValue()
   * @see #unsetValue()
   * @see #setValue(double)
   * @see dev.penduline.model.PendulinePackage#getFrictionTerm_Value()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='value'"
   * @generated
   */
  double getValue();

  /**
   * Sets the value of the '{@link dev.penduline.model.FrictionTerm#getValue <em>Value</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Value</em>' attribute.
   * @see #isSetValue()
   * @see #unsetValue()
   * @see #getValue()
   * @generated
   */
  void setValue(double value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.FrictionTerm#getValue <em>Value</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetValue()
   * @see #getValue()
   * @see #setValue(double)
   * @generated
   */
  void unsetValue();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.FrictionTerm#getValue <em>Value</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Value</em>' attribute is set.
   * @see #unsetValue()
   * @see #getValue()
   * @see #setValue(double)
   * @generated
   */
  boolean isSetValue();

  /**
   * Returns the value of the '<em><b>Lower Bound</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Lower bound for the fit (SI unit of the kind); 0 by default since friction dissipates.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Lower Bound</em>' attribute.
   * @see #setLowerBound(double)
   * @see dev.penduline.model.PendulinePackage#getFrictionTerm_LowerBound()
   * @model extendedMetaData="kind='element' name='lowerBound'"
   * @generated
   */
  double getLowerBound();

  /**
   * Sets the value of the '{@link dev.penduline.model.FrictionTerm#getLowerBound <em>Lower Bound</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Lower Bound</em>' attribute.
   * @see #getLowerBound()
   * @generated
   */
  void setLowerBound(double value);

  /**
   * Returns the value of the '<em><b>Upper Bound</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Upper bound for the fit (SI unit of the kind); unset for none.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Upper Bound</em>' attribute.
   * @see #isSetUpperBound()
   * @see #unsetUpperBound()
   * @see #setUpperBound(double)
   * @see dev.penduline.model.PendulinePackage#getFrictionTerm_UpperBound()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='upperBound'"
   * @generated
   */
  double getUpperBound();

  /**
   * Sets the value of the '{@link dev.penduline.model.FrictionTerm#getUpperBound <em>Upper Bound</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Upper Bound</em>' attribute.
   * @see #isSetUpperBound()
   * @see #unsetUpperBound()
   * @see #getUpperBound()
   * @generated
   */
  void setUpperBound(double value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.FrictionTerm#getUpperBound <em>Upper Bound</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetUpperBound()
   * @see #getUpperBound()
   * @see #setUpperBound(double)
   * @generated
   */
  void unsetUpperBound();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.FrictionTerm#getUpperBound <em>Upper Bound</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Upper Bound</em>' attribute is set.
   * @see #unsetUpperBound()
   * @see #getUpperBound()
   * @see #setUpperBound(double)
   * @generated
   */
  boolean isSetUpperBound();

  /**
   * Returns the value of the '<em><b>Fixed</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * True when the value is held fixed instead of fitted.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Fixed</em>' attribute.
   * @see #setFixed(boolean)
   * @see dev.penduline.model.PendulinePackage#getFrictionTerm_Fixed()
   * @model extendedMetaData="kind='element' name='fixed'"
   * @generated
   */
  boolean isFixed();

  /**
   * Sets the value of the '{@link dev.penduline.model.FrictionTerm#isFixed <em>Fixed</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Fixed</em>' attribute.
   * @see #isFixed()
   * @generated
   */
  void setFixed(boolean value);

} // FrictionTerm
