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
 * A representation of the literals of the enumeration '<em><b>Shape Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The shape a part's inertia is computed from. Dimensions are in the part's own frame (before its rotation).
 * <!-- end-model-doc -->
 * @see dev.penduline.model.PendulinePackage#getShapeKind()
 * @model
 * @generated
 */
public enum ShapeKind implements Enumerator
{
  /**
   * The '<em><b>POINT MASS</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * All mass at the centroid; no dimensions.
   * <!-- end-model-doc -->
   * @see #POINT_MASS_VALUE
   * @generated
   * @ordered
   */
  POINT_MASS(0, "POINT_MASS", "point"),

  /**
   * The '<em><b>SLENDER ROD</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Thin rod of the given length along the shape axis: Jcg = m L²/12 across it.
   * <!-- end-model-doc -->
   * @see #SLENDER_ROD_VALUE
   * @generated
   * @ordered
   */
  SLENDER_ROD(1, "SLENDER_ROD", "rod"),

  /**
   * The '<em><b>BOX</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Rectangular box or plate: length along x, width along y, height along z of the part frame.
   * <!-- end-model-doc -->
   * @see #BOX_VALUE
   * @generated
   * @ordered
   */
  BOX(2, "BOX", "box"),

  /**
   * The '<em><b>CYLINDER</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Solid cylinder of the given radius and length along the shape axis.
   * <!-- end-model-doc -->
   * @see #CYLINDER_VALUE
   * @generated
   * @ordered
   */
  CYLINDER(3, "CYLINDER", "cylinder"),

  /**
   * The '<em><b>HOLLOW CYLINDER</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Thick-walled tube: radius (outer), inner radius and length along the shape axis.
   * <!-- end-model-doc -->
   * @see #HOLLOW_CYLINDER_VALUE
   * @generated
   * @ordered
   */
  HOLLOW_CYLINDER(4, "HOLLOW_CYLINDER", "hollow-cylinder"),

  /**
   * The '<em><b>SPHERE</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Solid sphere of the given radius.
   * <!-- end-model-doc -->
   * @see #SPHERE_VALUE
   * @generated
   * @ordered
   */
  SPHERE(5, "SPHERE", "sphere"),

  /**
   * The '<em><b>THIN RING</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Thin ring (hoop) of the given radius, lying in the plane normal to the shape axis.
   * <!-- end-model-doc -->
   * @see #THIN_RING_VALUE
   * @generated
   * @ordered
   */
  THIN_RING(6, "THIN_RING", "ring"),

  /**
   * The '<em><b>MASS PROPERTIES</b></em>' literal object.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Mass properties from CAD: mass, centroid and a full inertia tensor (ixx … iyz).
   * <!-- end-model-doc -->
   * @see #MASS_PROPERTIES_VALUE
   * @generated
   * @ordered
   */
  MASS_PROPERTIES(7, "MASS_PROPERTIES", "tensor");

  /**
   * The '<em><b>POINT MASS</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * All mass at the centroid; no dimensions.
   * <!-- end-model-doc -->
   * @see #POINT_MASS
   * @model literal="point"
   * @generated
   * @ordered
   */
  public static final int POINT_MASS_VALUE = 0;

  /**
   * The '<em><b>SLENDER ROD</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Thin rod of the given length along the shape axis: Jcg = m L²/12 across it.
   * <!-- end-model-doc -->
   * @see #SLENDER_ROD
   * @model literal="rod"
   * @generated
   * @ordered
   */
  public static final int SLENDER_ROD_VALUE = 1;

  /**
   * The '<em><b>BOX</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Rectangular box or plate: length along x, width along y, height along z of the part frame.
   * <!-- end-model-doc -->
   * @see #BOX
   * @model literal="box"
   * @generated
   * @ordered
   */
  public static final int BOX_VALUE = 2;

  /**
   * The '<em><b>CYLINDER</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Solid cylinder of the given radius and length along the shape axis.
   * <!-- end-model-doc -->
   * @see #CYLINDER
   * @model literal="cylinder"
   * @generated
   * @ordered
   */
  public static final int CYLINDER_VALUE = 3;

  /**
   * The '<em><b>HOLLOW CYLINDER</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Thick-walled tube: radius (outer), inner radius and length along the shape axis.
   * <!-- end-model-doc -->
   * @see #HOLLOW_CYLINDER
   * @model literal="hollow-cylinder"
   * @generated
   * @ordered
   */
  public static final int HOLLOW_CYLINDER_VALUE = 4;

  /**
   * The '<em><b>SPHERE</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Solid sphere of the given radius.
   * <!-- end-model-doc -->
   * @see #SPHERE
   * @model literal="sphere"
   * @generated
   * @ordered
   */
  public static final int SPHERE_VALUE = 5;

  /**
   * The '<em><b>THIN RING</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Thin ring (hoop) of the given radius, lying in the plane normal to the shape axis.
   * <!-- end-model-doc -->
   * @see #THIN_RING
   * @model literal="ring"
   * @generated
   * @ordered
   */
  public static final int THIN_RING_VALUE = 6;

  /**
   * The '<em><b>MASS PROPERTIES</b></em>' literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Mass properties from CAD: mass, centroid and a full inertia tensor (ixx … iyz).
   * <!-- end-model-doc -->
   * @see #MASS_PROPERTIES
   * @model literal="tensor"
   * @generated
   * @ordered
   */
  public static final int MASS_PROPERTIES_VALUE = 7;

  /**
   * An array of all the '<em><b>Shape Kind</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private static final ShapeKind[] VALUES_ARRAY =
    new ShapeKind[]
    {
      POINT_MASS,
      SLENDER_ROD,
      BOX,
      CYLINDER,
      HOLLOW_CYLINDER,
      SPHERE,
      THIN_RING,
      MASS_PROPERTIES,
    };

  /**
   * A public read-only list of all the '<em><b>Shape Kind</b></em>' enumerators.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public static final List<ShapeKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

  /**
   * Returns the '<em><b>Shape Kind</b></em>' literal with the specified literal value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param literal the literal.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static ShapeKind get(String literal)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      ShapeKind result = VALUES_ARRAY[i];
      if (result.toString().equals(literal))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Shape Kind</b></em>' literal with the specified name.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param name the name.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static ShapeKind getByName(String name)
  {
    for (int i = 0; i < VALUES_ARRAY.length; ++i)
    {
      ShapeKind result = VALUES_ARRAY[i];
      if (result.getName().equals(name))
      {
        return result;
      }
    }
    return null;
  }

  /**
   * Returns the '<em><b>Shape Kind</b></em>' literal with the specified integer value.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the integer value.
   * @return the matching enumerator or <code>null</code>.
   * @generated
   */
  public static ShapeKind get(int value)
  {
    switch (value)
    {
      case POINT_MASS_VALUE: return POINT_MASS;
      case SLENDER_ROD_VALUE: return SLENDER_ROD;
      case BOX_VALUE: return BOX;
      case CYLINDER_VALUE: return CYLINDER;
      case HOLLOW_CYLINDER_VALUE: return HOLLOW_CYLINDER;
      case SPHERE_VALUE: return SPHERE;
      case THIN_RING_VALUE: return THIN_RING;
      case MASS_PROPERTIES_VALUE: return MASS_PROPERTIES;
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
  private ShapeKind(int value, String name, String literal)
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
  
} //ShapeKind
