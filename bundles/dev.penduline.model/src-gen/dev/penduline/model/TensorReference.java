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
 * A representation of the literals of the enumeration '<em><b>Tensor Reference</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The point a given inertia tensor is taken about.
 * <!-- end-model-doc -->
 * @see dev.penduline.model.PendulinePackage#getTensorReference()
 * @model
 * @generated
 */
public enum TensorReference implements Enumerator
{
  /**
   * The '<em><b>CENTROID</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * About the part's centroid, along the part frame's axes.
   * <!-- end-model-doc -->
   * @see #CENTROID_VALUE
   * @generated
   * @ordered
   */
  CENTROID(0, "CENTROID", "centroid"),

  /**
   * The '<em><b>FRAME ORIGIN</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * About the origin of the mechanism frame, along the part frame's axes (the mechanism's axes when the part's rotations are zero), as CAD prints the mass properties of a part modelled in the assembly's frame; the centroid fields still give the centroid in the mechanism frame.
   * <!-- end-model-doc -->
   * @see #FRAME_ORIGIN_VALUE
   * @generated
   * @ordered
   */
  FRAME_ORIGIN(1, "FRAME_ORIGIN", "frame-origin");

  /**
   * The '<em><b>CENTROID</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * About the part's centroid, along the part frame's axes.
   * <!-- end-model-doc -->
   * @see #CENTROID
   * @model literal="centroid"
   * @generated
   * @ordered
   */
  public static final int CENTROID_VALUE = 0;

  /**
   * The '<em><b>FRAME ORIGIN</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * About the origin of the mechanism frame, along the part frame's axes (the mechanism's axes when the part's rotations are zero), as CAD prints the mass properties of a part modelled in the assembly's frame; the centroid fields still give the centroid in the mechanism frame.
   * <!-- end-model-doc -->
   * @see #FRAME_ORIGIN
   * @model literal="frame-origin"
   * @generated
   * @ordered
   */
  public static final int FRAME_ORIGIN_VALUE = 1;

  /**
   * An array of all the '<em><b>Tensor Reference</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private static final TensorReference[] VALUES_ARRAY =
    new TensorReference[]
    {
      CENTROID,
      FRAME_ORIGIN,
    };

  /**
   * A public read-only list of all the '<em><b>Tensor Reference</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public static final List<TensorReference> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

  /**
   * Returns the '<em><b>Tensor Reference</b></em>' literal with the specified literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param literal the literal.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static TensorReference get(String literal)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      TensorReference result = VALUES_ARRAY[i];
      if (result.toString().equals(literal))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Tensor Reference</b></em>' literal with the specified name.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param name the name.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static TensorReference getByName(String name)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      TensorReference result = VALUES_ARRAY[i];
      if (result.getName().equals(name))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Tensor Reference</b></em>' literal with the specified integer value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the integer value.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static TensorReference get(int value)
  {
    switch (value)
    {
      case CENTROID_VALUE: return CENTROID;
      case FRAME_ORIGIN_VALUE: return FRAME_ORIGIN;
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
  private TensorReference(int value, String name, String literal)
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
  
} //TensorReference
