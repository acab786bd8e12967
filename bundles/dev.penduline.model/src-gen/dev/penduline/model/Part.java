/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Part</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One part of a mechanism: a shape with a mass, a centroid and an orientation in the mechanism frame. Orientation convention: the part frame is turned from the mechanism frame by rotationX about the mechanism's x axis, then rotationY about its y axis, then rotationZ about its z axis (fixed axes x-y-z; the matrix is R = Rz·Ry·Rx; equivalently intrinsic z-y′-x″ angles). Its centroidal tensor becomes R·Icg·Rᵀ.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.Part#getId <em>Id</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getName <em>Name</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getShape <em>Shape</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getShapeAxis <em>Shape Axis</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getLength <em>Length</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getWidth <em>Width</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getHeight <em>Height</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getRadius <em>Radius</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getInnerRadius <em>Inner Radius</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getMass <em>Mass</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getDensity <em>Density</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getCentroidX <em>Centroid X</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getCentroidY <em>Centroid Y</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getCentroidZ <em>Centroid Z</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getRotationX <em>Rotation X</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getRotationY <em>Rotation Y</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getRotationZ <em>Rotation Z</em>}</li>
 *   <li>{@link dev.penduline.model.Part#isCutout <em>Cutout</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getQuantity <em>Quantity</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getMassTolerance <em>Mass Tolerance</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getDimensionTolerance <em>Dimension Tolerance</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getIxx <em>Ixx</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getIyy <em>Iyy</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getIzz <em>Izz</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getIxy <em>Ixy</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getIxz <em>Ixz</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getIyz <em>Iyz</em>}</li>
 *   <li>{@link dev.penduline.model.Part#getTensorReference <em>Tensor Reference</em>}</li>
 * </ul>
 *
 * @see dev.penduline.model.PendulinePackage#getPart()
 * @model extendedMetaData="name='Part' kind='elementOnly'"
 * @generated
 */
public interface Part extends EObject
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
   * @see dev.penduline.model.PendulinePackage#getPart_Id()
   * @model extendedMetaData="kind='element' name='id'"
   * @generated
   */
  String getId();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getId <em>Id</em>}' attribute.
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
   * Name of the part, as on the drawing or parts list.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Name</em>' attribute.
   * @see #setName(String)
   * @see dev.penduline.model.PendulinePackage#getPart_Name()
   * @model extendedMetaData="kind='element' name='name'"
   * @generated
   */
  String getName();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getName <em>Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Name</em>' attribute.
   * @see #getName()
   * @generated
   */
  void setName(String value);

  /**
   * Returns the value of the '<em><b>Shape</b></em>' attribute.
   * The literals are from the enumeration {@link dev.penduline.model.ShapeKind}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * The shape the part's inertia is computed from. Unsettable so that it is written even when it is the first literal (point); unset reads as point.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Shape</em>' attribute.
   * @see dev.penduline.model.ShapeKind
   * @see #isSetShape()
   * @see #unsetShape()
   * @see #setShape(ShapeKind)
   * @see dev.penduline.model.PendulinePackage#getPart_Shape()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='shape'"
   * @generated
   */
  ShapeKind getShape();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getShape <em>Shape</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Shape</em>' attribute.
   * @see dev.penduline.model.ShapeKind
   * @see #isSetShape()
   * @see #unsetShape()
   * @see #getShape()
   * @generated
   */
  void setShape(ShapeKind value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.Part#getShape <em>Shape</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetShape()
   * @see #getShape()
   * @see #setShape(ShapeKind)
   * @generated
   */
  void unsetShape();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.Part#getShape <em>Shape</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Shape</em>' attribute is set.
   * @see #unsetShape()
   * @see #getShape()
   * @see #setShape(ShapeKind)
   * @generated
   */
  boolean isSetShape();

  /**
   * Returns the value of the '<em><b>Shape Axis</b></em>' attribute.
   * The default value is <code>"z"</code>.
   * The literals are from the enumeration {@link dev.penduline.model.ShapeAxis}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Axis of the part frame along which a rod or cylinder runs, or normal to a ring's plane.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Shape Axis</em>' attribute.
   * @see dev.penduline.model.ShapeAxis
   * @see #setShapeAxis(ShapeAxis)
   * @see dev.penduline.model.PendulinePackage#getPart_ShapeAxis()
   * @model default="z"
   *        extendedMetaData="kind='element' name='shapeAxis'"
   * @generated
   */
  ShapeAxis getShapeAxis();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getShapeAxis <em>Shape Axis</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Shape Axis</em>' attribute.
   * @see dev.penduline.model.ShapeAxis
   * @see #getShapeAxis()
   * @generated
   */
  void setShapeAxis(ShapeAxis value);

  /**
   * Returns the value of the '<em><b>Length</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Length (m): of a rod or cylinder along the shape axis; of a box along the part frame's x.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Length</em>' attribute.
   * @see #setLength(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Length()
   * @model extendedMetaData="kind='element' name='length'"
   * @generated
   */
  double getLength();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getLength <em>Length</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Length</em>' attribute.
   * @see #getLength()
   * @generated
   */
  void setLength(double value);

  /**
   * Returns the value of the '<em><b>Width</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Width of a box along the part frame's y (m).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Width</em>' attribute.
   * @see #setWidth(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Width()
   * @model extendedMetaData="kind='element' name='width'"
   * @generated
   */
  double getWidth();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getWidth <em>Width</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Width</em>' attribute.
   * @see #getWidth()
   * @generated
   */
  void setWidth(double value);

  /**
   * Returns the value of the '<em><b>Height</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Height (thickness) of a box along the part frame's z (m).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Height</em>' attribute.
   * @see #setHeight(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Height()
   * @model extendedMetaData="kind='element' name='height'"
   * @generated
   */
  double getHeight();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getHeight <em>Height</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Height</em>' attribute.
   * @see #getHeight()
   * @generated
   */
  void setHeight(double value);

  /**
   * Returns the value of the '<em><b>Radius</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Radius of a cylinder (outer), sphere or ring (m).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Radius</em>' attribute.
   * @see #setRadius(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Radius()
   * @model extendedMetaData="kind='element' name='radius'"
   * @generated
   */
  double getRadius();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getRadius <em>Radius</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Radius</em>' attribute.
   * @see #getRadius()
   * @generated
   */
  void setRadius(double value);

  /**
   * Returns the value of the '<em><b>Inner Radius</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Inner radius of a hollow cylinder (m), less than the radius.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Inner Radius</em>' attribute.
   * @see #setInnerRadius(double)
   * @see dev.penduline.model.PendulinePackage#getPart_InnerRadius()
   * @model extendedMetaData="kind='element' name='innerRadius'"
   * @generated
   */
  double getInnerRadius();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getInnerRadius <em>Inner Radius</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Inner Radius</em>' attribute.
   * @see #getInnerRadius()
   * @generated
   */
  void setInnerRadius(double value);

  /**
   * Returns the value of the '<em><b>Mass</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Mass of one piece (kg), always positive, also for a cut-out (the cut-out flag subtracts it). Unset when the mass comes from the density.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Mass</em>' attribute.
   * @see #isSetMass()
   * @see #unsetMass()
   * @see #setMass(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Mass()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='mass'"
   * @generated
   */
  double getMass();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getMass <em>Mass</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Mass</em>' attribute.
   * @see #isSetMass()
   * @see #unsetMass()
   * @see #getMass()
   * @generated
   */
  void setMass(double value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.Part#getMass <em>Mass</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetMass()
   * @see #getMass()
   * @see #setMass(double)
   * @generated
   */
  void unsetMass();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.Part#getMass <em>Mass</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Mass</em>' attribute is set.
   * @see #unsetMass()
   * @see #getMass()
   * @see #setMass(double)
   * @generated
   */
  boolean isSetMass();

  /**
   * Returns the value of the '<em><b>Density</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Density of the material (kg/m³); used with the shape's volume when no mass is given.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Density</em>' attribute.
   * @see #isSetDensity()
   * @see #unsetDensity()
   * @see #setDensity(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Density()
   * @model unsettable="true"
   *        extendedMetaData="kind='element' name='density'"
   * @generated
   */
  double getDensity();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getDensity <em>Density</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Density</em>' attribute.
   * @see #isSetDensity()
   * @see #unsetDensity()
   * @see #getDensity()
   * @generated
   */
  void setDensity(double value);

  /**
   * Unsets the value of the '{@link dev.penduline.model.Part#getDensity <em>Density</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isSetDensity()
   * @see #getDensity()
   * @see #setDensity(double)
   * @generated
   */
  void unsetDensity();

  /**
   * Returns whether the value of the '{@link dev.penduline.model.Part#getDensity <em>Density</em>}' attribute is set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return whether the value of the '<em>Density</em>' attribute is set.
   * @see #unsetDensity()
   * @see #getDensity()
   * @see #setDensity(double)
   * @generated
   */
  boolean isSetDensity();

  /**
   * Returns the value of the '<em><b>Centroid X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * x of the part's centroid in the mechanism frame (m).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Centroid X</em>' attribute.
   * @see #setCentroidX(double)
   * @see dev.penduline.model.PendulinePackage#getPart_CentroidX()
   * @model extendedMetaData="kind='element' name='centroidX'"
   * @generated
   */
  double getCentroidX();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getCentroidX <em>Centroid X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Centroid X</em>' attribute.
   * @see #getCentroidX()
   * @generated
   */
  void setCentroidX(double value);

  /**
   * Returns the value of the '<em><b>Centroid Y</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * y of the part's centroid in the mechanism frame (m).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Centroid Y</em>' attribute.
   * @see #setCentroidY(double)
   * @see dev.penduline.model.PendulinePackage#getPart_CentroidY()
   * @model extendedMetaData="kind='element' name='centroidY'"
   * @generated
   */
  double getCentroidY();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getCentroidY <em>Centroid Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Centroid Y</em>' attribute.
   * @see #getCentroidY()
   * @generated
   */
  void setCentroidY(double value);

  /**
   * Returns the value of the '<em><b>Centroid Z</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * z of the part's centroid in the mechanism frame (m).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Centroid Z</em>' attribute.
   * @see #setCentroidZ(double)
   * @see dev.penduline.model.PendulinePackage#getPart_CentroidZ()
   * @model extendedMetaData="kind='element' name='centroidZ'"
   * @generated
   */
  double getCentroidZ();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getCentroidZ <em>Centroid Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Centroid Z</em>' attribute.
   * @see #getCentroidZ()
   * @generated
   */
  void setCentroidZ(double value);

  /**
   * Returns the value of the '<em><b>Rotation X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * First rotation of the part frame, about the mechanism's x axis (rad).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Rotation X</em>' attribute.
   * @see #setRotationX(double)
   * @see dev.penduline.model.PendulinePackage#getPart_RotationX()
   * @model extendedMetaData="kind='element' name='rotationX'"
   * @generated
   */
  double getRotationX();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getRotationX <em>Rotation X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Rotation X</em>' attribute.
   * @see #getRotationX()
   * @generated
   */
  void setRotationX(double value);

  /**
   * Returns the value of the '<em><b>Rotation Y</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Second rotation of the part frame, about the mechanism's y axis (rad).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Rotation Y</em>' attribute.
   * @see #setRotationY(double)
   * @see dev.penduline.model.PendulinePackage#getPart_RotationY()
   * @model extendedMetaData="kind='element' name='rotationY'"
   * @generated
   */
  double getRotationY();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getRotationY <em>Rotation Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Rotation Y</em>' attribute.
   * @see #getRotationY()
   * @generated
   */
  void setRotationY(double value);

  /**
   * Returns the value of the '<em><b>Rotation Z</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Third rotation of the part frame, about the mechanism's z axis (rad).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Rotation Z</em>' attribute.
   * @see #setRotationZ(double)
   * @see dev.penduline.model.PendulinePackage#getPart_RotationZ()
   * @model extendedMetaData="kind='element' name='rotationZ'"
   * @generated
   */
  double getRotationZ();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getRotationZ <em>Rotation Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Rotation Z</em>' attribute.
   * @see #getRotationZ()
   * @generated
   */
  void setRotationZ(double value);

  /**
   * Returns the value of the '<em><b>Cutout</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * True for a hole or pocket: the part's (positive) mass and inertia are subtracted.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Cutout</em>' attribute.
   * @see #setCutout(boolean)
   * @see dev.penduline.model.PendulinePackage#getPart_Cutout()
   * @model extendedMetaData="kind='element' name='cutout'"
   * @generated
   */
  boolean isCutout();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#isCutout <em>Cutout</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Cutout</em>' attribute.
   * @see #isCutout()
   * @generated
   */
  void setCutout(boolean value);

  /**
   * Returns the value of the '<em><b>Quantity</b></em>' attribute.
   * The default value is <code>"1"</code>.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * Number of identical pieces at the same place (≥ 1).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Quantity</em>' attribute.
   * @see #setQuantity(int)
   * @see dev.penduline.model.PendulinePackage#getPart_Quantity()
   * @model default="1"
   *        extendedMetaData="kind='element' name='quantity'"
   * @generated
   */
  int getQuantity();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getQuantity <em>Quantity</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Quantity</em>' attribute.
   * @see #getQuantity()
   * @generated
   */
  void setQuantity(int value);

  /**
   * Returns the value of the '<em><b>Mass Tolerance</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * ± tolerance on the mass of one piece (kg); 0 when not known.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Mass Tolerance</em>' attribute.
   * @see #setMassTolerance(double)
   * @see dev.penduline.model.PendulinePackage#getPart_MassTolerance()
   * @model extendedMetaData="kind='element' name='massTolerance'"
   * @generated
   */
  double getMassTolerance();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getMassTolerance <em>Mass Tolerance</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Mass Tolerance</em>' attribute.
   * @see #getMassTolerance()
   * @generated
   */
  void setMassTolerance(double value);

  /**
   * Returns the value of the '<em><b>Dimension Tolerance</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * ± tolerance on each dimension (m); 0 when not known.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Dimension Tolerance</em>' attribute.
   * @see #setDimensionTolerance(double)
   * @see dev.penduline.model.PendulinePackage#getPart_DimensionTolerance()
   * @model extendedMetaData="kind='element' name='dimensionTolerance'"
   * @generated
   */
  double getDimensionTolerance();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getDimensionTolerance <em>Dimension Tolerance</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Dimension Tolerance</em>' attribute.
   * @see #getDimensionTolerance()
   * @generated
   */
  void setDimensionTolerance(double value);

  /**
   * Returns the value of the '<em><b>Ixx</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * For mass properties: tensor element Ixx = ∫(y²+z²) dm (kg·m²), in the part frame.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Ixx</em>' attribute.
   * @see #setIxx(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Ixx()
   * @model extendedMetaData="kind='element' name='ixx'"
   * @generated
   */
  double getIxx();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getIxx <em>Ixx</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Ixx</em>' attribute.
   * @see #getIxx()
   * @generated
   */
  void setIxx(double value);

  /**
   * Returns the value of the '<em><b>Iyy</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * For mass properties: tensor element Iyy = ∫(x²+z²) dm (kg·m²).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Iyy</em>' attribute.
   * @see #setIyy(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Iyy()
   * @model extendedMetaData="kind='element' name='iyy'"
   * @generated
   */
  double getIyy();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getIyy <em>Iyy</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Iyy</em>' attribute.
   * @see #getIyy()
   * @generated
   */
  void setIyy(double value);

  /**
   * Returns the value of the '<em><b>Izz</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * For mass properties: tensor element Izz = ∫(x²+y²) dm (kg·m²).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Izz</em>' attribute.
   * @see #setIzz(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Izz()
   * @model extendedMetaData="kind='element' name='izz'"
   * @generated
   */
  double getIzz();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getIzz <em>Izz</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Izz</em>' attribute.
   * @see #getIzz()
   * @generated
   */
  void setIzz(double value);

  /**
   * Returns the value of the '<em><b>Ixy</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * For mass properties: tensor element Ixy = −∫x·y dm (kg·m²); CAD reports that print +∫x·y dm must be negated.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Ixy</em>' attribute.
   * @see #setIxy(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Ixy()
   * @model extendedMetaData="kind='element' name='ixy'"
   * @generated
   */
  double getIxy();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getIxy <em>Ixy</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Ixy</em>' attribute.
   * @see #getIxy()
   * @generated
   */
  void setIxy(double value);

  /**
   * Returns the value of the '<em><b>Ixz</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * For mass properties: tensor element Ixz = −∫x·z dm (kg·m²).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Ixz</em>' attribute.
   * @see #setIxz(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Ixz()
   * @model extendedMetaData="kind='element' name='ixz'"
   * @generated
   */
  double getIxz();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getIxz <em>Ixz</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Ixz</em>' attribute.
   * @see #getIxz()
   * @generated
   */
  void setIxz(double value);

  /**
   * Returns the value of the '<em><b>Iyz</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * For mass properties: tensor element Iyz = −∫y·z dm (kg·m²).
   * <!-- end-model-doc -->
   * @return the value of the '<em>Iyz</em>' attribute.
   * @see #setIyz(double)
   * @see dev.penduline.model.PendulinePackage#getPart_Iyz()
   * @model extendedMetaData="kind='element' name='iyz'"
   * @generated
   */
  double getIyz();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getIyz <em>Iyz</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Iyz</em>' attribute.
   * @see #getIyz()
   * @generated
   */
  void setIyz(double value);

  /**
   * Returns the value of the '<em><b>Tensor Reference</b></em>' attribute.
   * The default value is <code>"centroid"</code>.
   * The literals are from the enumeration {@link dev.penduline.model.TensorReference}.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * <!-- begin-model-doc -->
   * For mass properties: the point the tensor is taken about.
   * <!-- end-model-doc -->
   * @return the value of the '<em>Tensor Reference</em>' attribute.
   * @see dev.penduline.model.TensorReference
   * @see #setTensorReference(TensorReference)
   * @see dev.penduline.model.PendulinePackage#getPart_TensorReference()
   * @model default="centroid"
   *        extendedMetaData="kind='element' name='tensorReference'"
   * @generated
   */
  TensorReference getTensorReference();

  /**
   * Sets the value of the '{@link dev.penduline.model.Part#getTensorReference <em>Tensor Reference</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param value the new value of the '<em>Tensor Reference</em>' attribute.
   * @see dev.penduline.model.TensorReference
   * @see #getTensorReference()
   * @generated
   */
  void setTensorReference(TensorReference value);

} // Part
