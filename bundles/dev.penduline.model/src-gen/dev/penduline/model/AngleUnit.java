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
 * A representation of the literals of the enumeration '<em><b>Angle Unit</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The unit of a record's angle column.
 * <!-- end-model-doc -->
 * @see dev.penduline.model.PendulinePackage#getAngleUnit()
 * @model
 * @generated
 */
public enum AngleUnit implements Enumerator
{
  /**
   * The '<em><b>RADIAN</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Radians.
   * <!-- end-model-doc -->
   * @see #RADIAN_VALUE
   * @generated
   * @ordered
   */
  RADIAN(0, "RADIAN", "rad"),

  /**
   * The '<em><b>DEGREE</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Degrees.
   * <!-- end-model-doc -->
   * @see #DEGREE_VALUE
   * @generated
   * @ordered
   */
  DEGREE(1, "DEGREE", "deg"),

  /**
   * The '<em><b>COUNT</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Encoder counts; converted with the session's counts per revolution.
   * <!-- end-model-doc -->
   * @see #COUNT_VALUE
   * @generated
   * @ordered
   */
  COUNT(2, "COUNT", "counts");

  /**
   * The '<em><b>RADIAN</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Radians.
   * <!-- end-model-doc -->
   * @see #RADIAN
   * @model literal="rad"
   * @generated
   * @ordered
   */
  public static final int RADIAN_VALUE = 0;

  /**
   * The '<em><b>DEGREE</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Degrees.
   * <!-- end-model-doc -->
   * @see #DEGREE
   * @model literal="deg"
   * @generated
   * @ordered
   */
  public static final int DEGREE_VALUE = 1;

  /**
   * The '<em><b>COUNT</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Encoder counts; converted with the session's counts per revolution.
   * <!-- end-model-doc -->
   * @see #COUNT
   * @model literal="counts"
   * @generated
   * @ordered
   */
  public static final int COUNT_VALUE = 2;

  /**
   * An array of all the '<em><b>Angle Unit</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private static final AngleUnit[] VALUES_ARRAY =
    new AngleUnit[]
    {
      RADIAN,
      DEGREE,
      COUNT,
    };

  /**
   * A public read-only list of all the '<em><b>Angle Unit</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public static final List<AngleUnit> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

  /**
   * Returns the '<em><b>Angle Unit</b></em>' literal with the specified literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param literal the literal.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static AngleUnit get(String literal)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      AngleUnit result = VALUES_ARRAY[i];
      if (result.toString().equals(literal))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Angle Unit</b></em>' literal with the specified name.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param name the name.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static AngleUnit getByName(String name)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      AngleUnit result = VALUES_ARRAY[i];
      if (result.getName().equals(name))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Angle Unit</b></em>' literal with the specified integer value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the integer value.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static AngleUnit get(int value)
  {
    switch (value)
    {
      case RADIAN_VALUE: return RADIAN;
      case DEGREE_VALUE: return DEGREE;
      case COUNT_VALUE: return COUNT;
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
  private AngleUnit(int value, String name, String literal)
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
  
} //AngleUnit
