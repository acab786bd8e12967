/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Friction Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * A kind of torque opposing the motion.
 * <!-- end-model-doc -->
 * @see dev.penduline.model.PendulinePackage#getFrictionKind()
 * @model
 * @generated
 */
public enum FrictionKind implements Enumerator
{
  /**
   * The '<em><b>VISCOUS</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Viscous (linear) torque b·ω; b in N·m·s/rad.
   * <!-- end-model-doc -->
   * @see #VISCOUS_VALUE
   * @generated
   * @ordered
   */
  VISCOUS(0, "VISCOUS", "viscous"),

  /**
   * The '<em><b>COULOMB</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Dry (Coulomb) torque Tc·sgn(ω); Tc in N·m.
   * <!-- end-model-doc -->
   * @see #COULOMB_VALUE
   * @generated
   * @ordered
   */
  COULOMB(1, "COULOMB", "coulomb"),

  /**
   * The '<em><b>STICTION</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Static friction: holds the body at rest while the gravity torque is at most Ts; Ts in N·m, Ts ≥ Tc.
   * <!-- end-model-doc -->
   * @see #STICTION_VALUE
   * @generated
   * @ordered
   */
  STICTION(2, "STICTION", "stiction"),

  /**
   * The '<em><b>DRAG</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Quadratic (air) drag c·ω·|ω|; c in N·m·s²/rad².
   * <!-- end-model-doc -->
   * @see #DRAG_VALUE
   * @generated
   * @ordered
   */
  DRAG(3, "DRAG", "drag");

  /**
   * The '<em><b>VISCOUS</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Viscous (linear) torque b·ω; b in N·m·s/rad.
   * <!-- end-model-doc -->
   * @see #VISCOUS
   * @model literal="viscous"
   * @generated
   * @ordered
   */
  public static final int VISCOUS_VALUE = 0;

  /**
   * The '<em><b>COULOMB</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Dry (Coulomb) torque Tc·sgn(ω); Tc in N·m.
   * <!-- end-model-doc -->
   * @see #COULOMB
   * @model literal="coulomb"
   * @generated
   * @ordered
   */
  public static final int COULOMB_VALUE = 1;

  /**
   * The '<em><b>STICTION</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Static friction: holds the body at rest while the gravity torque is at most Ts; Ts in N·m, Ts ≥ Tc.
   * <!-- end-model-doc -->
   * @see #STICTION
   * @model literal="stiction"
   * @generated
   * @ordered
   */
  public static final int STICTION_VALUE = 2;

  /**
   * The '<em><b>DRAG</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Quadratic (air) drag c·ω·|ω|; c in N·m·s²/rad².
   * <!-- end-model-doc -->
   * @see #DRAG
   * @model literal="drag"
   * @generated
   * @ordered
   */
  public static final int DRAG_VALUE = 3;

  /**
   * An array of all the '<em><b>Friction Kind</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private static final FrictionKind[] VALUES_ARRAY =
    new FrictionKind[]
    {
      VISCOUS,
      COULOMB,
      STICTION,
      DRAG,
    };

  /**
   * A public read-only list of all the '<em><b>Friction Kind</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public static final List<FrictionKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

  /**
   * Returns the '<em><b>Friction Kind</b></em>' literal with the specified literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param literal the literal.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static FrictionKind get(String literal)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      FrictionKind result = VALUES_ARRAY[i];
      if (result.toString().equals(literal))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Friction Kind</b></em>' literal with the specified name.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param name the name.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static FrictionKind getByName(String name)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      FrictionKind result = VALUES_ARRAY[i];
      if (result.getName().equals(name))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Friction Kind</b></em>' literal with the specified integer value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the integer value.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static FrictionKind get(int value)
  {
    switch (value)
    {
      case VISCOUS_VALUE: return VISCOUS;
      case COULOMB_VALUE: return COULOMB;
      case STICTION_VALUE: return STICTION;
      case DRAG_VALUE: return DRAG;
    }
    return null;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private final int value;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private final String name;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private final String literal;

  /**
   * Only this class can construct instances.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private FrictionKind(int value, String name, String literal)
  {
    this.value = value;
    this.name = name;
    this.literal = literal;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public int getValue()
  {
    return value;
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
  public String getLiteral()
  {
    return literal;
  }

  /**
   * Returns the literal value of the enumerator, which is its string representation.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String toString()
  {
    return literal;
  }
  
} //FrictionKind
