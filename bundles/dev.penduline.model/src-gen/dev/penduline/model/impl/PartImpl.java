/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.Part;
import dev.penduline.model.PendulinePackage;
import dev.penduline.model.ShapeAxis;
import dev.penduline.model.ShapeKind;
import dev.penduline.model.TensorReference;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Part</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getId <em>Id</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getName <em>Name</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getShape <em>Shape</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getShapeAxis <em>Shape Axis</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getLength <em>Length</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getWidth <em>Width</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getHeight <em>Height</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getRadius <em>Radius</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getInnerRadius <em>Inner Radius</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getMass <em>Mass</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getDensity <em>Density</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getCentroidX <em>Centroid X</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getCentroidY <em>Centroid Y</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getCentroidZ <em>Centroid Z</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getRotationX <em>Rotation X</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getRotationY <em>Rotation Y</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getRotationZ <em>Rotation Z</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#isCutout <em>Cutout</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getQuantity <em>Quantity</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getMassTolerance <em>Mass Tolerance</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getDimensionTolerance <em>Dimension Tolerance</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getIxx <em>Ixx</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getIyy <em>Iyy</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getIzz <em>Izz</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getIxy <em>Ixy</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getIxz <em>Ixz</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getIyz <em>Iyz</em>}</li>
 *   <li>{@link dev.penduline.model.impl.PartImpl#getTensorReference <em>Tensor Reference</em>}</li>
 * </ul>
 *
 * @generated
 */
public class PartImpl extends MinimalEObjectImpl.Container implements Part
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
   * The default value of the '{@link #getName() <em>Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getName()
   * @generated
   * @ordered
   */
  protected static final String NAME_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getName()
   * @generated
   * @ordered
   */
  protected String name = NAME_EDEFAULT;

  /**
   * The default value of the '{@link #getShape() <em>Shape</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getShape()
   * @generated
   * @ordered
   */
  protected static final ShapeKind SHAPE_EDEFAULT = ShapeKind.POINT_MASS;

  /**
   * The cached value of the '{@link #getShape() <em>Shape</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getShape()
   * @generated
   * @ordered
   */
  protected ShapeKind shape = SHAPE_EDEFAULT;

  /**
   * This is true if the Shape attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean shapeESet;

  /**
   * The default value of the '{@link #getShapeAxis() <em>Shape Axis</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getShapeAxis()
   * @generated
   * @ordered
   */
  protected static final ShapeAxis SHAPE_AXIS_EDEFAULT = ShapeAxis.Z;

  /**
   * The cached value of the '{@link #getShapeAxis() <em>Shape Axis</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getShapeAxis()
   * @generated
   * @ordered
   */
  protected ShapeAxis shapeAxis = SHAPE_AXIS_EDEFAULT;

  /**
   * The default value of the '{@link #getLength() <em>Length</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getLength()
   * @generated
   * @ordered
   */
  protected static final double LENGTH_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getLength() <em>Length</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getLength()
   * @generated
   * @ordered
   */
  protected double length = LENGTH_EDEFAULT;

  /**
   * The default value of the '{@link #getWidth() <em>Width</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getWidth()
   * @generated
   * @ordered
   */
  protected static final double WIDTH_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getWidth() <em>Width</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getWidth()
   * @generated
   * @ordered
   */
  protected double width = WIDTH_EDEFAULT;

  /**
   * The default value of the '{@link #getHeight() <em>Height</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getHeight()
   * @generated
   * @ordered
   */
  protected static final double HEIGHT_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getHeight() <em>Height</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getHeight()
   * @generated
   * @ordered
   */
  protected double height = HEIGHT_EDEFAULT;

  /**
   * The default value of the '{@link #getRadius() <em>Radius</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRadius()
   * @generated
   * @ordered
   */
  protected static final double RADIUS_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getRadius() <em>Radius</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRadius()
   * @generated
   * @ordered
   */
  protected double radius = RADIUS_EDEFAULT;

  /**
   * The default value of the '{@link #getInnerRadius() <em>Inner Radius</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getInnerRadius()
   * @generated
   * @ordered
   */
  protected static final double INNER_RADIUS_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getInnerRadius() <em>Inner Radius</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getInnerRadius()
   * @generated
   * @ordered
   */
  protected double innerRadius = INNER_RADIUS_EDEFAULT;

  /**
   * The default value of the '{@link #getMass() <em>Mass</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getMass()
   * @generated
   * @ordered
   */
  protected static final double MASS_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getMass() <em>Mass</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getMass()
   * @generated
   * @ordered
   */
  protected double mass = MASS_EDEFAULT;

  /**
   * This is true if the Mass attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean massESet;

  /**
   * The default value of the '{@link #getDensity() <em>Density</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDensity()
   * @generated
   * @ordered
   */
  protected static final double DENSITY_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getDensity() <em>Density</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDensity()
   * @generated
   * @ordered
   */
  protected double density = DENSITY_EDEFAULT;

  /**
   * This is true if the Density attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean densityESet;

  /**
   * The default value of the '{@link #getCentroidX() <em>Centroid X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCentroidX()
   * @generated
   * @ordered
   */
  protected static final double CENTROID_X_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getCentroidX() <em>Centroid X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCentroidX()
   * @generated
   * @ordered
   */
  protected double centroidX = CENTROID_X_EDEFAULT;

  /**
   * The default value of the '{@link #getCentroidY() <em>Centroid Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCentroidY()
   * @generated
   * @ordered
   */
  protected static final double CENTROID_Y_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getCentroidY() <em>Centroid Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCentroidY()
   * @generated
   * @ordered
   */
  protected double centroidY = CENTROID_Y_EDEFAULT;

  /**
   * The default value of the '{@link #getCentroidZ() <em>Centroid Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCentroidZ()
   * @generated
   * @ordered
   */
  protected static final double CENTROID_Z_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getCentroidZ() <em>Centroid Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCentroidZ()
   * @generated
   * @ordered
   */
  protected double centroidZ = CENTROID_Z_EDEFAULT;

  /**
   * The default value of the '{@link #getRotationX() <em>Rotation X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRotationX()
   * @generated
   * @ordered
   */
  protected static final double ROTATION_X_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getRotationX() <em>Rotation X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRotationX()
   * @generated
   * @ordered
   */
  protected double rotationX = ROTATION_X_EDEFAULT;

  /**
   * The default value of the '{@link #getRotationY() <em>Rotation Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRotationY()
   * @generated
   * @ordered
   */
  protected static final double ROTATION_Y_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getRotationY() <em>Rotation Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRotationY()
   * @generated
   * @ordered
   */
  protected double rotationY = ROTATION_Y_EDEFAULT;

  /**
   * The default value of the '{@link #getRotationZ() <em>Rotation Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRotationZ()
   * @generated
   * @ordered
   */
  protected static final double ROTATION_Z_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getRotationZ() <em>Rotation Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRotationZ()
   * @generated
   * @ordered
   */
  protected double rotationZ = ROTATION_Z_EDEFAULT;

  /**
   * The default value of the '{@link #isCutout() <em>Cutout</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isCutout()
   * @generated
   * @ordered
   */
  protected static final boolean CUTOUT_EDEFAULT = false;

  /**
   * The cached value of the '{@link #isCutout() <em>Cutout</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #isCutout()
   * @generated
   * @ordered
   */
  protected boolean cutout = CUTOUT_EDEFAULT;

  /**
   * The default value of the '{@link #getQuantity() <em>Quantity</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getQuantity()
   * @generated
   * @ordered
   */
  protected static final int QUANTITY_EDEFAULT = 1;

  /**
   * The cached value of the '{@link #getQuantity() <em>Quantity</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getQuantity()
   * @generated
   * @ordered
   */
  protected int quantity = QUANTITY_EDEFAULT;

  /**
   * The default value of the '{@link #getMassTolerance() <em>Mass Tolerance</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getMassTolerance()
   * @generated
   * @ordered
   */
  protected static final double MASS_TOLERANCE_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getMassTolerance() <em>Mass Tolerance</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getMassTolerance()
   * @generated
   * @ordered
   */
  protected double massTolerance = MASS_TOLERANCE_EDEFAULT;

  /**
   * The default value of the '{@link #getDimensionTolerance() <em>Dimension Tolerance</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDimensionTolerance()
   * @generated
   * @ordered
   */
  protected static final double DIMENSION_TOLERANCE_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getDimensionTolerance() <em>Dimension Tolerance</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDimensionTolerance()
   * @generated
   * @ordered
   */
  protected double dimensionTolerance = DIMENSION_TOLERANCE_EDEFAULT;

  /**
   * The default value of the '{@link #getIxx() <em>Ixx</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIxx()
   * @generated
   * @ordered
   */
  protected static final double IXX_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getIxx() <em>Ixx</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIxx()
   * @generated
   * @ordered
   */
  protected double ixx = IXX_EDEFAULT;

  /**
   * The default value of the '{@link #getIyy() <em>Iyy</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIyy()
   * @generated
   * @ordered
   */
  protected static final double IYY_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getIyy() <em>Iyy</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIyy()
   * @generated
   * @ordered
   */
  protected double iyy = IYY_EDEFAULT;

  /**
   * The default value of the '{@link #getIzz() <em>Izz</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIzz()
   * @generated
   * @ordered
   */
  protected static final double IZZ_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getIzz() <em>Izz</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIzz()
   * @generated
   * @ordered
   */
  protected double izz = IZZ_EDEFAULT;

  /**
   * The default value of the '{@link #getIxy() <em>Ixy</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIxy()
   * @generated
   * @ordered
   */
  protected static final double IXY_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getIxy() <em>Ixy</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIxy()
   * @generated
   * @ordered
   */
  protected double ixy = IXY_EDEFAULT;

  /**
   * The default value of the '{@link #getIxz() <em>Ixz</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIxz()
   * @generated
   * @ordered
   */
  protected static final double IXZ_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getIxz() <em>Ixz</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIxz()
   * @generated
   * @ordered
   */
  protected double ixz = IXZ_EDEFAULT;

  /**
   * The default value of the '{@link #getIyz() <em>Iyz</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIyz()
   * @generated
   * @ordered
   */
  protected static final double IYZ_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getIyz() <em>Iyz</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getIyz()
   * @generated
   * @ordered
   */
  protected double iyz = IYZ_EDEFAULT;

  /**
   * The default value of the '{@link #getTensorReference() <em>Tensor Reference</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTensorReference()
   * @generated
   * @ordered
   */
  protected static final TensorReference TENSOR_REFERENCE_EDEFAULT = TensorReference.CENTROID;

  /**
   * The cached value of the '{@link #getTensorReference() <em>Tensor Reference</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTensorReference()
   * @generated
   * @ordered
   */
  protected TensorReference tensorReference = TENSOR_REFERENCE_EDEFAULT;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected PartImpl()
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
    return PendulinePackage.Literals.PART;
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
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__ID, oldId, id));
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
  public void setName(String newName)
  {
    String oldName = name;
    name = newName;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__NAME, oldName, name));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public ShapeKind getShape()
  {
    return shape;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setShape(ShapeKind newShape)
  {
    ShapeKind oldShape = shape;
    shape = newShape == null ? SHAPE_EDEFAULT : newShape;
    boolean oldShapeESet = shapeESet;
    shapeESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__SHAPE, oldShape, shape, !oldShapeESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetShape()
  {
    ShapeKind oldShape = shape;
    boolean oldShapeESet = shapeESet;
    shape = SHAPE_EDEFAULT;
    shapeESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.PART__SHAPE, oldShape, SHAPE_EDEFAULT, oldShapeESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetShape()
  {
    return shapeESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public ShapeAxis getShapeAxis()
  {
    return shapeAxis;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setShapeAxis(ShapeAxis newShapeAxis)
  {
    ShapeAxis oldShapeAxis = shapeAxis;
    shapeAxis = newShapeAxis == null ? SHAPE_AXIS_EDEFAULT : newShapeAxis;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__SHAPE_AXIS, oldShapeAxis, shapeAxis));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getLength()
  {
    return length;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setLength(double newLength)
  {
    double oldLength = length;
    length = newLength;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__LENGTH, oldLength, length));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getWidth()
  {
    return width;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setWidth(double newWidth)
  {
    double oldWidth = width;
    width = newWidth;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__WIDTH, oldWidth, width));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getHeight()
  {
    return height;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setHeight(double newHeight)
  {
    double oldHeight = height;
    height = newHeight;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__HEIGHT, oldHeight, height));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getRadius()
  {
    return radius;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setRadius(double newRadius)
  {
    double oldRadius = radius;
    radius = newRadius;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__RADIUS, oldRadius, radius));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getInnerRadius()
  {
    return innerRadius;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setInnerRadius(double newInnerRadius)
  {
    double oldInnerRadius = innerRadius;
    innerRadius = newInnerRadius;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__INNER_RADIUS, oldInnerRadius, innerRadius));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getMass()
  {
    return mass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setMass(double newMass)
  {
    double oldMass = mass;
    mass = newMass;
    boolean oldMassESet = massESet;
    massESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__MASS, oldMass, mass, !oldMassESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetMass()
  {
    double oldMass = mass;
    boolean oldMassESet = massESet;
    mass = MASS_EDEFAULT;
    massESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.PART__MASS, oldMass, MASS_EDEFAULT, oldMassESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetMass()
  {
    return massESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getDensity()
  {
    return density;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setDensity(double newDensity)
  {
    double oldDensity = density;
    density = newDensity;
    boolean oldDensityESet = densityESet;
    densityESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__DENSITY, oldDensity, density, !oldDensityESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetDensity()
  {
    double oldDensity = density;
    boolean oldDensityESet = densityESet;
    density = DENSITY_EDEFAULT;
    densityESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.PART__DENSITY, oldDensity, DENSITY_EDEFAULT, oldDensityESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetDensity()
  {
    return densityESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getCentroidX()
  {
    return centroidX;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setCentroidX(double newCentroidX)
  {
    double oldCentroidX = centroidX;
    centroidX = newCentroidX;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__CENTROID_X, oldCentroidX, centroidX));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getCentroidY()
  {
    return centroidY;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setCentroidY(double newCentroidY)
  {
    double oldCentroidY = centroidY;
    centroidY = newCentroidY;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__CENTROID_Y, oldCentroidY, centroidY));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getCentroidZ()
  {
    return centroidZ;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setCentroidZ(double newCentroidZ)
  {
    double oldCentroidZ = centroidZ;
    centroidZ = newCentroidZ;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__CENTROID_Z, oldCentroidZ, centroidZ));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getRotationX()
  {
    return rotationX;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setRotationX(double newRotationX)
  {
    double oldRotationX = rotationX;
    rotationX = newRotationX;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__ROTATION_X, oldRotationX, rotationX));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getRotationY()
  {
    return rotationY;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setRotationY(double newRotationY)
  {
    double oldRotationY = rotationY;
    rotationY = newRotationY;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__ROTATION_Y, oldRotationY, rotationY));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getRotationZ()
  {
    return rotationZ;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setRotationZ(double newRotationZ)
  {
    double oldRotationZ = rotationZ;
    rotationZ = newRotationZ;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__ROTATION_Z, oldRotationZ, rotationZ));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isCutout()
  {
    return cutout;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setCutout(boolean newCutout)
  {
    boolean oldCutout = cutout;
    cutout = newCutout;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__CUTOUT, oldCutout, cutout));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public int getQuantity()
  {
    return quantity;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setQuantity(int newQuantity)
  {
    int oldQuantity = quantity;
    quantity = newQuantity;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__QUANTITY, oldQuantity, quantity));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getMassTolerance()
  {
    return massTolerance;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setMassTolerance(double newMassTolerance)
  {
    double oldMassTolerance = massTolerance;
    massTolerance = newMassTolerance;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__MASS_TOLERANCE, oldMassTolerance, massTolerance));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getDimensionTolerance()
  {
    return dimensionTolerance;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setDimensionTolerance(double newDimensionTolerance)
  {
    double oldDimensionTolerance = dimensionTolerance;
    dimensionTolerance = newDimensionTolerance;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__DIMENSION_TOLERANCE, oldDimensionTolerance, dimensionTolerance));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getIxx()
  {
    return ixx;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setIxx(double newIxx)
  {
    double oldIxx = ixx;
    ixx = newIxx;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__IXX, oldIxx, ixx));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getIyy()
  {
    return iyy;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setIyy(double newIyy)
  {
    double oldIyy = iyy;
    iyy = newIyy;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__IYY, oldIyy, iyy));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getIzz()
  {
    return izz;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setIzz(double newIzz)
  {
    double oldIzz = izz;
    izz = newIzz;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__IZZ, oldIzz, izz));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getIxy()
  {
    return ixy;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setIxy(double newIxy)
  {
    double oldIxy = ixy;
    ixy = newIxy;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__IXY, oldIxy, ixy));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getIxz()
  {
    return ixz;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setIxz(double newIxz)
  {
    double oldIxz = ixz;
    ixz = newIxz;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__IXZ, oldIxz, ixz));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getIyz()
  {
    return iyz;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setIyz(double newIyz)
  {
    double oldIyz = iyz;
    iyz = newIyz;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__IYZ, oldIyz, iyz));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public TensorReference getTensorReference()
  {
    return tensorReference;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setTensorReference(TensorReference newTensorReference)
  {
    TensorReference oldTensorReference = tensorReference;
    tensorReference = newTensorReference == null ? TENSOR_REFERENCE_EDEFAULT : newTensorReference;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.PART__TENSOR_REFERENCE, oldTensorReference, tensorReference));
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
      case PendulinePackage.PART__ID:
        return getId();
      case PendulinePackage.PART__NAME:
        return getName();
      case PendulinePackage.PART__SHAPE:
        return getShape();
      case PendulinePackage.PART__SHAPE_AXIS:
        return getShapeAxis();
      case PendulinePackage.PART__LENGTH:
        return getLength();
      case PendulinePackage.PART__WIDTH:
        return getWidth();
      case PendulinePackage.PART__HEIGHT:
        return getHeight();
      case PendulinePackage.PART__RADIUS:
        return getRadius();
      case PendulinePackage.PART__INNER_RADIUS:
        return getInnerRadius();
      case PendulinePackage.PART__MASS:
        return getMass();
      case PendulinePackage.PART__DENSITY:
        return getDensity();
      case PendulinePackage.PART__CENTROID_X:
        return getCentroidX();
      case PendulinePackage.PART__CENTROID_Y:
        return getCentroidY();
      case PendulinePackage.PART__CENTROID_Z:
        return getCentroidZ();
      case PendulinePackage.PART__ROTATION_X:
        return getRotationX();
      case PendulinePackage.PART__ROTATION_Y:
        return getRotationY();
      case PendulinePackage.PART__ROTATION_Z:
        return getRotationZ();
      case PendulinePackage.PART__CUTOUT:
        return isCutout();
      case PendulinePackage.PART__QUANTITY:
        return getQuantity();
      case PendulinePackage.PART__MASS_TOLERANCE:
        return getMassTolerance();
      case PendulinePackage.PART__DIMENSION_TOLERANCE:
        return getDimensionTolerance();
      case PendulinePackage.PART__IXX:
        return getIxx();
      case PendulinePackage.PART__IYY:
        return getIyy();
      case PendulinePackage.PART__IZZ:
        return getIzz();
      case PendulinePackage.PART__IXY:
        return getIxy();
      case PendulinePackage.PART__IXZ:
        return getIxz();
      case PendulinePackage.PART__IYZ:
        return getIyz();
      case PendulinePackage.PART__TENSOR_REFERENCE:
        return getTensorReference();
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
      case PendulinePackage.PART__ID:
        setId((String)newValue);
        return;
      case PendulinePackage.PART__NAME:
        setName((String)newValue);
        return;
      case PendulinePackage.PART__SHAPE:
        setShape((ShapeKind)newValue);
        return;
      case PendulinePackage.PART__SHAPE_AXIS:
        setShapeAxis((ShapeAxis)newValue);
        return;
      case PendulinePackage.PART__LENGTH:
        setLength((Double)newValue);
        return;
      case PendulinePackage.PART__WIDTH:
        setWidth((Double)newValue);
        return;
      case PendulinePackage.PART__HEIGHT:
        setHeight((Double)newValue);
        return;
      case PendulinePackage.PART__RADIUS:
        setRadius((Double)newValue);
        return;
      case PendulinePackage.PART__INNER_RADIUS:
        setInnerRadius((Double)newValue);
        return;
      case PendulinePackage.PART__MASS:
        setMass((Double)newValue);
        return;
      case PendulinePackage.PART__DENSITY:
        setDensity((Double)newValue);
        return;
      case PendulinePackage.PART__CENTROID_X:
        setCentroidX((Double)newValue);
        return;
      case PendulinePackage.PART__CENTROID_Y:
        setCentroidY((Double)newValue);
        return;
      case PendulinePackage.PART__CENTROID_Z:
        setCentroidZ((Double)newValue);
        return;
      case PendulinePackage.PART__ROTATION_X:
        setRotationX((Double)newValue);
        return;
      case PendulinePackage.PART__ROTATION_Y:
        setRotationY((Double)newValue);
        return;
      case PendulinePackage.PART__ROTATION_Z:
        setRotationZ((Double)newValue);
        return;
      case PendulinePackage.PART__CUTOUT:
        setCutout((Boolean)newValue);
        return;
      case PendulinePackage.PART__QUANTITY:
        setQuantity((Integer)newValue);
        return;
      case PendulinePackage.PART__MASS_TOLERANCE:
        setMassTolerance((Double)newValue);
        return;
      case PendulinePackage.PART__DIMENSION_TOLERANCE:
        setDimensionTolerance((Double)newValue);
        return;
      case PendulinePackage.PART__IXX:
        setIxx((Double)newValue);
        return;
      case PendulinePackage.PART__IYY:
        setIyy((Double)newValue);
        return;
      case PendulinePackage.PART__IZZ:
        setIzz((Double)newValue);
        return;
      case PendulinePackage.PART__IXY:
        setIxy((Double)newValue);
        return;
      case PendulinePackage.PART__IXZ:
        setIxz((Double)newValue);
        return;
      case PendulinePackage.PART__IYZ:
        setIyz((Double)newValue);
        return;
      case PendulinePackage.PART__TENSOR_REFERENCE:
        setTensorReference((TensorReference)newValue);
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
      case PendulinePackage.PART__ID:
        setId(ID_EDEFAULT);
        return;
      case PendulinePackage.PART__NAME:
        setName(NAME_EDEFAULT);
        return;
      case PendulinePackage.PART__SHAPE:
        unsetShape();
        return;
      case PendulinePackage.PART__SHAPE_AXIS:
        setShapeAxis(SHAPE_AXIS_EDEFAULT);
        return;
      case PendulinePackage.PART__LENGTH:
        setLength(LENGTH_EDEFAULT);
        return;
      case PendulinePackage.PART__WIDTH:
        setWidth(WIDTH_EDEFAULT);
        return;
      case PendulinePackage.PART__HEIGHT:
        setHeight(HEIGHT_EDEFAULT);
        return;
      case PendulinePackage.PART__RADIUS:
        setRadius(RADIUS_EDEFAULT);
        return;
      case PendulinePackage.PART__INNER_RADIUS:
        setInnerRadius(INNER_RADIUS_EDEFAULT);
        return;
      case PendulinePackage.PART__MASS:
        unsetMass();
        return;
      case PendulinePackage.PART__DENSITY:
        unsetDensity();
        return;
      case PendulinePackage.PART__CENTROID_X:
        setCentroidX(CENTROID_X_EDEFAULT);
        return;
      case PendulinePackage.PART__CENTROID_Y:
        setCentroidY(CENTROID_Y_EDEFAULT);
        return;
      case PendulinePackage.PART__CENTROID_Z:
        setCentroidZ(CENTROID_Z_EDEFAULT);
        return;
      case PendulinePackage.PART__ROTATION_X:
        setRotationX(ROTATION_X_EDEFAULT);
        return;
      case PendulinePackage.PART__ROTATION_Y:
        setRotationY(ROTATION_Y_EDEFAULT);
        return;
      case PendulinePackage.PART__ROTATION_Z:
        setRotationZ(ROTATION_Z_EDEFAULT);
        return;
      case PendulinePackage.PART__CUTOUT:
        setCutout(CUTOUT_EDEFAULT);
        return;
      case PendulinePackage.PART__QUANTITY:
        setQuantity(QUANTITY_EDEFAULT);
        return;
      case PendulinePackage.PART__MASS_TOLERANCE:
        setMassTolerance(MASS_TOLERANCE_EDEFAULT);
        return;
      case PendulinePackage.PART__DIMENSION_TOLERANCE:
        setDimensionTolerance(DIMENSION_TOLERANCE_EDEFAULT);
        return;
      case PendulinePackage.PART__IXX:
        setIxx(IXX_EDEFAULT);
        return;
      case PendulinePackage.PART__IYY:
        setIyy(IYY_EDEFAULT);
        return;
      case PendulinePackage.PART__IZZ:
        setIzz(IZZ_EDEFAULT);
        return;
      case PendulinePackage.PART__IXY:
        setIxy(IXY_EDEFAULT);
        return;
      case PendulinePackage.PART__IXZ:
        setIxz(IXZ_EDEFAULT);
        return;
      case PendulinePackage.PART__IYZ:
        setIyz(IYZ_EDEFAULT);
        return;
      case PendulinePackage.PART__TENSOR_REFERENCE:
        setTensorReference(TENSOR_REFERENCE_EDEFAULT);
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
      case PendulinePackage.PART__ID:
        return ID_EDEFAULT == null ? id != null : !ID_EDEFAULT.equals(id);
      case PendulinePackage.PART__NAME:
        return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
      case PendulinePackage.PART__SHAPE:
        return isSetShape();
      case PendulinePackage.PART__SHAPE_AXIS:
        return shapeAxis != SHAPE_AXIS_EDEFAULT;
      case PendulinePackage.PART__LENGTH:
        return length != LENGTH_EDEFAULT;
      case PendulinePackage.PART__WIDTH:
        return width != WIDTH_EDEFAULT;
      case PendulinePackage.PART__HEIGHT:
        return height != HEIGHT_EDEFAULT;
      case PendulinePackage.PART__RADIUS:
        return radius != RADIUS_EDEFAULT;
      case PendulinePackage.PART__INNER_RADIUS:
        return innerRadius != INNER_RADIUS_EDEFAULT;
      case PendulinePackage.PART__MASS:
        return isSetMass();
      case PendulinePackage.PART__DENSITY:
        return isSetDensity();
      case PendulinePackage.PART__CENTROID_X:
        return centroidX != CENTROID_X_EDEFAULT;
      case PendulinePackage.PART__CENTROID_Y:
        return centroidY != CENTROID_Y_EDEFAULT;
      case PendulinePackage.PART__CENTROID_Z:
        return centroidZ != CENTROID_Z_EDEFAULT;
      case PendulinePackage.PART__ROTATION_X:
        return rotationX != ROTATION_X_EDEFAULT;
      case PendulinePackage.PART__ROTATION_Y:
        return rotationY != ROTATION_Y_EDEFAULT;
      case PendulinePackage.PART__ROTATION_Z:
        return rotationZ != ROTATION_Z_EDEFAULT;
      case PendulinePackage.PART__CUTOUT:
        return cutout != CUTOUT_EDEFAULT;
      case PendulinePackage.PART__QUANTITY:
        return quantity != QUANTITY_EDEFAULT;
      case PendulinePackage.PART__MASS_TOLERANCE:
        return massTolerance != MASS_TOLERANCE_EDEFAULT;
      case PendulinePackage.PART__DIMENSION_TOLERANCE:
        return dimensionTolerance != DIMENSION_TOLERANCE_EDEFAULT;
      case PendulinePackage.PART__IXX:
        return ixx != IXX_EDEFAULT;
      case PendulinePackage.PART__IYY:
        return iyy != IYY_EDEFAULT;
      case PendulinePackage.PART__IZZ:
        return izz != IZZ_EDEFAULT;
      case PendulinePackage.PART__IXY:
        return ixy != IXY_EDEFAULT;
      case PendulinePackage.PART__IXZ:
        return ixz != IXZ_EDEFAULT;
      case PendulinePackage.PART__IYZ:
        return iyz != IYZ_EDEFAULT;
      case PendulinePackage.PART__TENSOR_REFERENCE:
        return tensorReference != TENSOR_REFERENCE_EDEFAULT;
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
    result.append(", name: ");
    result.append(name);
    result.append(", shape: ");
    if (shapeESet) result.append(shape); else result.append("<unset>");
    result.append(", shapeAxis: ");
    result.append(shapeAxis);
    result.append(", length: ");
    result.append(length);
    result.append(", width: ");
    result.append(width);
    result.append(", height: ");
    result.append(height);
    result.append(", radius: ");
    result.append(radius);
    result.append(", innerRadius: ");
    result.append(innerRadius);
    result.append(", mass: ");
    if (massESet) result.append(mass); else result.append("<unset>");
    result.append(", density: ");
    if (densityESet) result.append(density); else result.append("<unset>");
    result.append(", centroidX: ");
    result.append(centroidX);
    result.append(", centroidY: ");
    result.append(centroidY);
    result.append(", centroidZ: ");
    result.append(centroidZ);
    result.append(", rotationX: ");
    result.append(rotationX);
    result.append(", rotationY: ");
    result.append(rotationY);
    result.append(", rotationZ: ");
    result.append(rotationZ);
    result.append(", cutout: ");
    result.append(cutout);
    result.append(", quantity: ");
    result.append(quantity);
    result.append(", massTolerance: ");
    result.append(massTolerance);
    result.append(", dimensionTolerance: ");
    result.append(dimensionTolerance);
    result.append(", ixx: ");
    result.append(ixx);
    result.append(", iyy: ");
    result.append(iyy);
    result.append(", izz: ");
    result.append(izz);
    result.append(", ixy: ");
    result.append(ixy);
    result.append(", ixz: ");
    result.append(ixz);
    result.append(", iyz: ");
    result.append(iyz);
    result.append(", tensorReference: ");
    result.append(tensorReference);
    result.append(')');
    return result.toString();
  }

} //PartImpl
