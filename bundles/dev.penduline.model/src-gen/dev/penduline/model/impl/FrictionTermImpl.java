/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.FrictionKind;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.PendulinePackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Friction Term</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.impl.FrictionTermImpl#getId <em>Id</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FrictionTermImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FrictionTermImpl#getValue <em>Value</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FrictionTermImpl#getLowerBound <em>Lower Bound</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FrictionTermImpl#getUpperBound <em>Upper Bound</em>}</li>
 *   <li>{@link dev.penduline.model.impl.FrictionTermImpl#isFixed <em>Fixed</em>}</li>
 * </ul>
 *
 * @generated
 */
public class FrictionTermImpl extends MinimalEObjectImpl.Container implements FrictionTerm
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
   * The default value of the '{@link #getKind() <em>Kind</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getKind()
   * @generated
   * @ordered
   */
  protected static final FrictionKind KIND_EDEFAULT = FrictionKind.VISCOUS;

  /**
   * The cached value of the '{@link #getKind() <em>Kind</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getKind()
   * @generated
   * @ordered
   */
  protected FrictionKind kind = KIND_EDEFAULT;

  /**
   * This is true if the Kind attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean kindESet;

  /**
   * The default value of the '{@link #getValue() <em>Value</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getValue()
   * @generated
   * @ordered
   */
  protected static final double VALUE_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getValue() <em>Value</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getValue()
   * @generated
   * @ordered
   */
  protected double value = VALUE_EDEFAULT;

  /**
   * This is true if the Value attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean valueESet;

  /**
   * The default value of the '{@link #getLowerBound() <em>Lower Bound</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getLowerBound()
   * @generated
   * @ordered
   */
  protected static final double LOWER_BOUND_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getLowerBound() <em>Lower Bound</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getLowerBound()
   * @generated
   * @ordered
   */
  protected double lowerBound = LOWER_BOUND_EDEFAULT;

  /**
   * The default value of the '{@link #getUpperBound() <em>Upper Bound</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getUpperBound()
   * @generated
   * @ordered
   */
  protected static final double UPPER_BOUND_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getUpperBound() <em>Upper Bound</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getUpperBound()
   * @generated
   * @ordered
   */
  protected double upperBound = UPPER_BOUND_EDEFAULT;

  /**
   * This is true if the Upper Bound attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean upperBoundESet;

  /**
   * The default value of the '{@link #isFixed() <em>Fixed</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isFixed()
   * @generated
   * @ordered
   */
  protected static final boolean FIXED_EDEFAULT = false;

  /**
   * The cached value of the '{@link #isFixed() <em>Fixed</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isFixed()
   * @generated
   * @ordered
   */
  protected boolean fixed = FIXED_EDEFAULT;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected FrictionTermImpl()
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
    return PendulinePackage.Literals.FRICTION_TERM;
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
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FRICTION_TERM__ID, oldId, id));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public FrictionKind getKind()
  {
    return kind;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setKind(FrictionKind newKind)
  {
    FrictionKind oldKind = kind;
    kind = newKind == null ? KIND_EDEFAULT : newKind;
    boolean oldKindESet = kindESet;
    kindESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FRICTION_TERM__KIND, oldKind, kind, !oldKindESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetKind()
  {
    FrictionKind oldKind = kind;
    boolean oldKindESet = kindESet;
    kind = KIND_EDEFAULT;
    kindESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.FRICTION_TERM__KIND, oldKind, KIND_EDEFAULT, oldKindESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetKind()
  {
    return kindESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getValue()
  {
    return value;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setValue(double newValue)
  {
    double oldValue = value;
    value = newValue;
    boolean oldValueESet = valueESet;
    valueESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FRICTION_TERM__VALUE, oldValue, value, !oldValueESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetValue()
  {
    double oldValue = value;
    boolean oldValueESet = valueESet;
    value = VALUE_EDEFAULT;
    valueESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.FRICTION_TERM__VALUE, oldValue, VALUE_EDEFAULT, oldValueESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetValue()
  {
    return valueESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getLowerBound()
  {
    return lowerBound;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setLowerBound(double newLowerBound)
  {
    double oldLowerBound = lowerBound;
    lowerBound = newLowerBound;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FRICTION_TERM__LOWER_BOUND, oldLowerBound, lowerBound));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getUpperBound()
  {
    return upperBound;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setUpperBound(double newUpperBound)
  {
    double oldUpperBound = upperBound;
    upperBound = newUpperBound;
    boolean oldUpperBoundESet = upperBoundESet;
    upperBoundESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FRICTION_TERM__UPPER_BOUND, oldUpperBound, upperBound, !oldUpperBoundESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetUpperBound()
  {
    double oldUpperBound = upperBound;
    boolean oldUpperBoundESet = upperBoundESet;
    upperBound = UPPER_BOUND_EDEFAULT;
    upperBoundESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.FRICTION_TERM__UPPER_BOUND, oldUpperBound, UPPER_BOUND_EDEFAULT, oldUpperBoundESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetUpperBound()
  {
    return upperBoundESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isFixed()
  {
    return fixed;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setFixed(boolean newFixed)
  {
    boolean oldFixed = fixed;
    fixed = newFixed;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.FRICTION_TERM__FIXED, oldFixed, fixed));
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
      case PendulinePackage.FRICTION_TERM__ID:
        return getId();
      case PendulinePackage.FRICTION_TERM__KIND:
        return getKind();
      case PendulinePackage.FRICTION_TERM__VALUE:
        return getValue();
      case PendulinePackage.FRICTION_TERM__LOWER_BOUND:
        return getLowerBound();
      case PendulinePackage.FRICTION_TERM__UPPER_BOUND:
        return getUpperBound();
      case PendulinePackage.FRICTION_TERM__FIXED:
        return isFixed();
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
      case PendulinePackage.FRICTION_TERM__ID:
        setId((String)newValue);
        return;
      case PendulinePackage.FRICTION_TERM__KIND:
        setKind((FrictionKind)newValue);
        return;
      case PendulinePackage.FRICTION_TERM__VALUE:
        setValue((Double)newValue);
        return;
      case PendulinePackage.FRICTION_TERM__LOWER_BOUND:
        setLowerBound((Double)newValue);
        return;
      case PendulinePackage.FRICTION_TERM__UPPER_BOUND:
        setUpperBound((Double)newValue);
        return;
      case PendulinePackage.FRICTION_TERM__FIXED:
        setFixed((Boolean)newValue);
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
      case PendulinePackage.FRICTION_TERM__ID:
        setId(ID_EDEFAULT);
        return;
      case PendulinePackage.FRICTION_TERM__KIND:
        unsetKind();
        return;
      case PendulinePackage.FRICTION_TERM__VALUE:
        unsetValue();
        return;
      case PendulinePackage.FRICTION_TERM__LOWER_BOUND:
        setLowerBound(LOWER_BOUND_EDEFAULT);
        return;
      case PendulinePackage.FRICTION_TERM__UPPER_BOUND:
        unsetUpperBound();
        return;
      case PendulinePackage.FRICTION_TERM__FIXED:
        setFixed(FIXED_EDEFAULT);
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
      case PendulinePackage.FRICTION_TERM__ID:
        return ID_EDEFAULT == null ? id != null : !ID_EDEFAULT.equals(id);
      case PendulinePackage.FRICTION_TERM__KIND:
        return isSetKind();
      case PendulinePackage.FRICTION_TERM__VALUE:
        return isSetValue();
      case PendulinePackage.FRICTION_TERM__LOWER_BOUND:
        return lowerBound != LOWER_BOUND_EDEFAULT;
      case PendulinePackage.FRICTION_TERM__UPPER_BOUND:
        return isSetUpperBound();
      case PendulinePackage.FRICTION_TERM__FIXED:
        return fixed != FIXED_EDEFAULT;
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
    result.append(", kind: ");
    if (kindESet) result.append(kind); else result.append("<unset>");
    result.append(", value: ");
    if (valueESet) result.append(value); else result.append("<unset>");
    result.append(", lowerBound: ");
    result.append(lowerBound);
    result.append(", upperBound: ");
    if (upperBoundESet) result.append(upperBound); else result.append("<unset>");
    result.append(", fixed: ");
    result.append(fixed);
    result.append(')');
    return result.toString();
  }

} //FrictionTermImpl
