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
 * A representation of the literals of the enumeration '<em><b>Delimiter</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The character between the columns of a record file.
 * <!-- end-model-doc -->
 * @see dev.penduline.model.PendulinePackage#getDelimiter()
 * @model
 * @generated
 */
public enum Delimiter implements Enumerator
{
  /**
   * The '<em><b>COMMA</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Comma.
   * <!-- end-model-doc -->
   * @see #COMMA_VALUE
   * @generated
   * @ordered
   */
  COMMA(0, "COMMA", "comma"),

  /**
   * The '<em><b>SEMICOLON</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Semicolon.
   * <!-- end-model-doc -->
   * @see #SEMICOLON_VALUE
   * @generated
   * @ordered
   */
  SEMICOLON(1, "SEMICOLON", "semicolon"),

  /**
   * The '<em><b>TAB</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Tab.
   * <!-- end-model-doc -->
   * @see #TAB_VALUE
   * @generated
   * @ordered
   */
  TAB(2, "TAB", "tab"),

  /**
   * The '<em><b>WHITESPACE</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * One or more spaces or tabs.
   * <!-- end-model-doc -->
   * @see #WHITESPACE_VALUE
   * @generated
   * @ordered
   */
  WHITESPACE(3, "WHITESPACE", "whitespace");

  /**
   * The '<em><b>COMMA</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Comma.
   * <!-- end-model-doc -->
   * @see #COMMA
   * @model literal="comma"
   * @generated
   * @ordered
   */
  public static final int COMMA_VALUE = 0;

  /**
   * The '<em><b>SEMICOLON</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Semicolon.
   * <!-- end-model-doc -->
   * @see #SEMICOLON
   * @model literal="semicolon"
   * @generated
   * @ordered
   */
  public static final int SEMICOLON_VALUE = 1;

  /**
   * The '<em><b>TAB</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Tab.
   * <!-- end-model-doc -->
   * @see #TAB
   * @model literal="tab"
   * @generated
   * @ordered
   */
  public static final int TAB_VALUE = 2;

  /**
   * The '<em><b>WHITESPACE</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * One or more spaces or tabs.
   * <!-- end-model-doc -->
   * @see #WHITESPACE
   * @model literal="whitespace"
   * @generated
   * @ordered
   */
  public static final int WHITESPACE_VALUE = 3;

  /**
   * An array of all the '<em><b>Delimiter</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private static final Delimiter[] VALUES_ARRAY =
    new Delimiter[]
    {
      COMMA,
      SEMICOLON,
      TAB,
      WHITESPACE,
    };

  /**
   * A public read-only list of all the '<em><b>Delimiter</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public static final List<Delimiter> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

  /**
   * Returns the '<em><b>Delimiter</b></em>' literal with the specified literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param literal the literal.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static Delimiter get(String literal)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      Delimiter result = VALUES_ARRAY[i];
      if (result.toString().equals(literal))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Delimiter</b></em>' literal with the specified name.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param name the name.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static Delimiter getByName(String name)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      Delimiter result = VALUES_ARRAY[i];
      if (result.getName().equals(name))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Delimiter</b></em>' literal with the specified integer value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the integer value.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static Delimiter get(int value)
  {
    switch (value)
    {
      case COMMA_VALUE: return COMMA;
      case SEMICOLON_VALUE: return SEMICOLON;
      case TAB_VALUE: return TAB;
      case WHITESPACE_VALUE: return WHITESPACE;
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
  private Delimiter(int value, String name, String literal)
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
  
} //Delimiter
