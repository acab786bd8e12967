/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.PendulinePackage;
import dev.penduline.model.TestSession;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Mechanism</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getName <em>Name</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getDescription <em>Description</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getGravity <em>Gravity</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getAxisPointX <em>Axis Point X</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getAxisPointY <em>Axis Point Y</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getAxisPointZ <em>Axis Point Z</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getAxisDirectionX <em>Axis Direction X</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getAxisDirectionY <em>Axis Direction Y</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getAxisDirectionZ <em>Axis Direction Z</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getGravityDirectionX <em>Gravity Direction X</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getGravityDirectionY <em>Gravity Direction Y</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getGravityDirectionZ <em>Gravity Direction Z</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getAxisTilt <em>Axis Tilt</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getParts <em>Parts</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getFrictionHypotheses <em>Friction Hypotheses</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getSessions <em>Sessions</em>}</li>
 *   <li>{@link dev.penduline.model.impl.MechanismImpl#getFitResults <em>Fit Results</em>}</li>
 * </ul>
 *
 * @generated
 */
public class MechanismImpl extends MinimalEObjectImpl.Container implements Mechanism
{
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
   * The default value of the '{@link #getDescription() <em>Description</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDescription()
   * @generated
   * @ordered
   */
  protected static final String DESCRIPTION_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getDescription() <em>Description</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDescription()
   * @generated
   * @ordered
   */
  protected String description = DESCRIPTION_EDEFAULT;

  /**
   * The default value of the '{@link #getGravity() <em>Gravity</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getGravity()
   * @generated
   * @ordered
   */
  protected static final double GRAVITY_EDEFAULT = 9.80665;

  /**
   * The cached value of the '{@link #getGravity() <em>Gravity</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getGravity()
   * @generated
   * @ordered
   */
  protected double gravity = GRAVITY_EDEFAULT;

  /**
   * The default value of the '{@link #getAxisPointX() <em>Axis Point X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisPointX()
   * @generated
   * @ordered
   */
  protected static final double AXIS_POINT_X_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getAxisPointX() <em>Axis Point X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisPointX()
   * @generated
   * @ordered
   */
  protected double axisPointX = AXIS_POINT_X_EDEFAULT;

  /**
   * The default value of the '{@link #getAxisPointY() <em>Axis Point Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisPointY()
   * @generated
   * @ordered
   */
  protected static final double AXIS_POINT_Y_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getAxisPointY() <em>Axis Point Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisPointY()
   * @generated
   * @ordered
   */
  protected double axisPointY = AXIS_POINT_Y_EDEFAULT;

  /**
   * The default value of the '{@link #getAxisPointZ() <em>Axis Point Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisPointZ()
   * @generated
   * @ordered
   */
  protected static final double AXIS_POINT_Z_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getAxisPointZ() <em>Axis Point Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisPointZ()
   * @generated
   * @ordered
   */
  protected double axisPointZ = AXIS_POINT_Z_EDEFAULT;

  /**
   * The default value of the '{@link #getAxisDirectionX() <em>Axis Direction X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisDirectionX()
   * @generated
   * @ordered
   */
  protected static final double AXIS_DIRECTION_X_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getAxisDirectionX() <em>Axis Direction X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisDirectionX()
   * @generated
   * @ordered
   */
  protected double axisDirectionX = AXIS_DIRECTION_X_EDEFAULT;

  /**
   * The default value of the '{@link #getAxisDirectionY() <em>Axis Direction Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisDirectionY()
   * @generated
   * @ordered
   */
  protected static final double AXIS_DIRECTION_Y_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getAxisDirectionY() <em>Axis Direction Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisDirectionY()
   * @generated
   * @ordered
   */
  protected double axisDirectionY = AXIS_DIRECTION_Y_EDEFAULT;

  /**
   * The default value of the '{@link #getAxisDirectionZ() <em>Axis Direction Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisDirectionZ()
   * @generated
   * @ordered
   */
  protected static final double AXIS_DIRECTION_Z_EDEFAULT = 1.0;

  /**
   * The cached value of the '{@link #getAxisDirectionZ() <em>Axis Direction Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisDirectionZ()
   * @generated
   * @ordered
   */
  protected double axisDirectionZ = AXIS_DIRECTION_Z_EDEFAULT;

  /**
   * The default value of the '{@link #getGravityDirectionX() <em>Gravity Direction X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getGravityDirectionX()
   * @generated
   * @ordered
   */
  protected static final double GRAVITY_DIRECTION_X_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getGravityDirectionX() <em>Gravity Direction X</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getGravityDirectionX()
   * @generated
   * @ordered
   */
  protected double gravityDirectionX = GRAVITY_DIRECTION_X_EDEFAULT;

  /**
   * The default value of the '{@link #getGravityDirectionY() <em>Gravity Direction Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getGravityDirectionY()
   * @generated
   * @ordered
   */
  protected static final double GRAVITY_DIRECTION_Y_EDEFAULT = -1.0;

  /**
   * The cached value of the '{@link #getGravityDirectionY() <em>Gravity Direction Y</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getGravityDirectionY()
   * @generated
   * @ordered
   */
  protected double gravityDirectionY = GRAVITY_DIRECTION_Y_EDEFAULT;

  /**
   * The default value of the '{@link #getGravityDirectionZ() <em>Gravity Direction Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getGravityDirectionZ()
   * @generated
   * @ordered
   */
  protected static final double GRAVITY_DIRECTION_Z_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getGravityDirectionZ() <em>Gravity Direction Z</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getGravityDirectionZ()
   * @generated
   * @ordered
   */
  protected double gravityDirectionZ = GRAVITY_DIRECTION_Z_EDEFAULT;

  /**
   * The default value of the '{@link #getAxisTilt() <em>Axis Tilt</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisTilt()
   * @generated
   * @ordered
   */
  protected static final double AXIS_TILT_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getAxisTilt() <em>Axis Tilt</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAxisTilt()
   * @generated
   * @ordered
   */
  protected double axisTilt = AXIS_TILT_EDEFAULT;

  /**
   * The cached value of the '{@link #getParts() <em>Parts</em>}' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getParts()
   * @generated
   * @ordered
   */
  protected EList<Part> parts;

  /**
   * The cached value of the '{@link #getFrictionHypotheses() <em>Friction Hypotheses</em>}' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getFrictionHypotheses()
   * @generated
   * @ordered
   */
  protected EList<FrictionHypothesis> frictionHypotheses;

  /**
   * The cached value of the '{@link #getSessions() <em>Sessions</em>}' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getSessions()
   * @generated
   * @ordered
   */
  protected EList<TestSession> sessions;

  /**
   * The cached value of the '{@link #getFitResults() <em>Fit Results</em>}' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getFitResults()
   * @generated
   * @ordered
   */
  protected EList<FitResult> fitResults;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected MechanismImpl()
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
    return PendulinePackage.Literals.MECHANISM;
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
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__NAME, oldName, name));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getDescription()
  {
    return description;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setDescription(String newDescription)
  {
    String oldDescription = description;
    description = newDescription;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__DESCRIPTION, oldDescription, description));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getGravity()
  {
    return gravity;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setGravity(double newGravity)
  {
    double oldGravity = gravity;
    gravity = newGravity;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__GRAVITY, oldGravity, gravity));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getAxisPointX()
  {
    return axisPointX;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAxisPointX(double newAxisPointX)
  {
    double oldAxisPointX = axisPointX;
    axisPointX = newAxisPointX;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__AXIS_POINT_X, oldAxisPointX, axisPointX));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getAxisPointY()
  {
    return axisPointY;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAxisPointY(double newAxisPointY)
  {
    double oldAxisPointY = axisPointY;
    axisPointY = newAxisPointY;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__AXIS_POINT_Y, oldAxisPointY, axisPointY));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getAxisPointZ()
  {
    return axisPointZ;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAxisPointZ(double newAxisPointZ)
  {
    double oldAxisPointZ = axisPointZ;
    axisPointZ = newAxisPointZ;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__AXIS_POINT_Z, oldAxisPointZ, axisPointZ));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getAxisDirectionX()
  {
    return axisDirectionX;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAxisDirectionX(double newAxisDirectionX)
  {
    double oldAxisDirectionX = axisDirectionX;
    axisDirectionX = newAxisDirectionX;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__AXIS_DIRECTION_X, oldAxisDirectionX, axisDirectionX));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getAxisDirectionY()
  {
    return axisDirectionY;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAxisDirectionY(double newAxisDirectionY)
  {
    double oldAxisDirectionY = axisDirectionY;
    axisDirectionY = newAxisDirectionY;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__AXIS_DIRECTION_Y, oldAxisDirectionY, axisDirectionY));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getAxisDirectionZ()
  {
    return axisDirectionZ;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAxisDirectionZ(double newAxisDirectionZ)
  {
    double oldAxisDirectionZ = axisDirectionZ;
    axisDirectionZ = newAxisDirectionZ;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__AXIS_DIRECTION_Z, oldAxisDirectionZ, axisDirectionZ));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getGravityDirectionX()
  {
    return gravityDirectionX;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setGravityDirectionX(double newGravityDirectionX)
  {
    double oldGravityDirectionX = gravityDirectionX;
    gravityDirectionX = newGravityDirectionX;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__GRAVITY_DIRECTION_X, oldGravityDirectionX, gravityDirectionX));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getGravityDirectionY()
  {
    return gravityDirectionY;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setGravityDirectionY(double newGravityDirectionY)
  {
    double oldGravityDirectionY = gravityDirectionY;
    gravityDirectionY = newGravityDirectionY;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Y, oldGravityDirectionY, gravityDirectionY));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getGravityDirectionZ()
  {
    return gravityDirectionZ;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setGravityDirectionZ(double newGravityDirectionZ)
  {
    double oldGravityDirectionZ = gravityDirectionZ;
    gravityDirectionZ = newGravityDirectionZ;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Z, oldGravityDirectionZ, gravityDirectionZ));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getAxisTilt()
  {
    return axisTilt;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAxisTilt(double newAxisTilt)
  {
    double oldAxisTilt = axisTilt;
    axisTilt = newAxisTilt;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.MECHANISM__AXIS_TILT, oldAxisTilt, axisTilt));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<Part> getParts()
  {
    if (parts == null)
    {
      parts = new EObjectContainmentEList<Part>(Part.class, this, PendulinePackage.MECHANISM__PARTS);
    }
    return parts;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<FrictionHypothesis> getFrictionHypotheses()
  {
    if (frictionHypotheses == null)
    {
      frictionHypotheses = new EObjectContainmentEList<FrictionHypothesis>(FrictionHypothesis.class, this, PendulinePackage.MECHANISM__FRICTION_HYPOTHESES);
    }
    return frictionHypotheses;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<TestSession> getSessions()
  {
    if (sessions == null)
    {
      sessions = new EObjectContainmentEList<TestSession>(TestSession.class, this, PendulinePackage.MECHANISM__SESSIONS);
    }
    return sessions;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EList<FitResult> getFitResults()
  {
    if (fitResults == null)
    {
      fitResults = new EObjectContainmentEList<FitResult>(FitResult.class, this, PendulinePackage.MECHANISM__FIT_RESULTS);
    }
    return fitResults;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs)
  {
    switch (featureID)
    {
      case PendulinePackage.MECHANISM__PARTS:
        return ((InternalEList<?>)getParts()).basicRemove(otherEnd, msgs);
      case PendulinePackage.MECHANISM__FRICTION_HYPOTHESES:
        return ((InternalEList<?>)getFrictionHypotheses()).basicRemove(otherEnd, msgs);
      case PendulinePackage.MECHANISM__SESSIONS:
        return ((InternalEList<?>)getSessions()).basicRemove(otherEnd, msgs);
      case PendulinePackage.MECHANISM__FIT_RESULTS:
        return ((InternalEList<?>)getFitResults()).basicRemove(otherEnd, msgs);
    }
    return super.eInverseRemove(otherEnd, featureID, msgs);
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
      case PendulinePackage.MECHANISM__NAME:
        return getName();
      case PendulinePackage.MECHANISM__DESCRIPTION:
        return getDescription();
      case PendulinePackage.MECHANISM__GRAVITY:
        return getGravity();
      case PendulinePackage.MECHANISM__AXIS_POINT_X:
        return getAxisPointX();
      case PendulinePackage.MECHANISM__AXIS_POINT_Y:
        return getAxisPointY();
      case PendulinePackage.MECHANISM__AXIS_POINT_Z:
        return getAxisPointZ();
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_X:
        return getAxisDirectionX();
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_Y:
        return getAxisDirectionY();
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_Z:
        return getAxisDirectionZ();
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_X:
        return getGravityDirectionX();
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Y:
        return getGravityDirectionY();
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Z:
        return getGravityDirectionZ();
      case PendulinePackage.MECHANISM__AXIS_TILT:
        return getAxisTilt();
      case PendulinePackage.MECHANISM__PARTS:
        return getParts();
      case PendulinePackage.MECHANISM__FRICTION_HYPOTHESES:
        return getFrictionHypotheses();
      case PendulinePackage.MECHANISM__SESSIONS:
        return getSessions();
      case PendulinePackage.MECHANISM__FIT_RESULTS:
        return getFitResults();
    }
    return super.eGet(featureID, resolve, coreType);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @SuppressWarnings("unchecked")
  @Override
  public void eSet(int featureID, Object newValue)
  {
    switch (featureID)
    {
      case PendulinePackage.MECHANISM__NAME:
        setName((String)newValue);
        return;
      case PendulinePackage.MECHANISM__DESCRIPTION:
        setDescription((String)newValue);
        return;
      case PendulinePackage.MECHANISM__GRAVITY:
        setGravity((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__AXIS_POINT_X:
        setAxisPointX((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__AXIS_POINT_Y:
        setAxisPointY((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__AXIS_POINT_Z:
        setAxisPointZ((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_X:
        setAxisDirectionX((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_Y:
        setAxisDirectionY((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_Z:
        setAxisDirectionZ((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_X:
        setGravityDirectionX((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Y:
        setGravityDirectionY((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Z:
        setGravityDirectionZ((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__AXIS_TILT:
        setAxisTilt((Double)newValue);
        return;
      case PendulinePackage.MECHANISM__PARTS:
        getParts().clear();
        getParts().addAll((Collection<? extends Part>)newValue);
        return;
      case PendulinePackage.MECHANISM__FRICTION_HYPOTHESES:
        getFrictionHypotheses().clear();
        getFrictionHypotheses().addAll((Collection<? extends FrictionHypothesis>)newValue);
        return;
      case PendulinePackage.MECHANISM__SESSIONS:
        getSessions().clear();
        getSessions().addAll((Collection<? extends TestSession>)newValue);
        return;
      case PendulinePackage.MECHANISM__FIT_RESULTS:
        getFitResults().clear();
        getFitResults().addAll((Collection<? extends FitResult>)newValue);
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
      case PendulinePackage.MECHANISM__NAME:
        setName(NAME_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__DESCRIPTION:
        setDescription(DESCRIPTION_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__GRAVITY:
        setGravity(GRAVITY_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__AXIS_POINT_X:
        setAxisPointX(AXIS_POINT_X_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__AXIS_POINT_Y:
        setAxisPointY(AXIS_POINT_Y_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__AXIS_POINT_Z:
        setAxisPointZ(AXIS_POINT_Z_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_X:
        setAxisDirectionX(AXIS_DIRECTION_X_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_Y:
        setAxisDirectionY(AXIS_DIRECTION_Y_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_Z:
        setAxisDirectionZ(AXIS_DIRECTION_Z_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_X:
        setGravityDirectionX(GRAVITY_DIRECTION_X_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Y:
        setGravityDirectionY(GRAVITY_DIRECTION_Y_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Z:
        setGravityDirectionZ(GRAVITY_DIRECTION_Z_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__AXIS_TILT:
        setAxisTilt(AXIS_TILT_EDEFAULT);
        return;
      case PendulinePackage.MECHANISM__PARTS:
        getParts().clear();
        return;
      case PendulinePackage.MECHANISM__FRICTION_HYPOTHESES:
        getFrictionHypotheses().clear();
        return;
      case PendulinePackage.MECHANISM__SESSIONS:
        getSessions().clear();
        return;
      case PendulinePackage.MECHANISM__FIT_RESULTS:
        getFitResults().clear();
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
      case PendulinePackage.MECHANISM__NAME:
        return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
      case PendulinePackage.MECHANISM__DESCRIPTION:
        return DESCRIPTION_EDEFAULT == null ? description != null : !DESCRIPTION_EDEFAULT.equals(description);
      case PendulinePackage.MECHANISM__GRAVITY:
        return gravity != GRAVITY_EDEFAULT;
      case PendulinePackage.MECHANISM__AXIS_POINT_X:
        return axisPointX != AXIS_POINT_X_EDEFAULT;
      case PendulinePackage.MECHANISM__AXIS_POINT_Y:
        return axisPointY != AXIS_POINT_Y_EDEFAULT;
      case PendulinePackage.MECHANISM__AXIS_POINT_Z:
        return axisPointZ != AXIS_POINT_Z_EDEFAULT;
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_X:
        return axisDirectionX != AXIS_DIRECTION_X_EDEFAULT;
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_Y:
        return axisDirectionY != AXIS_DIRECTION_Y_EDEFAULT;
      case PendulinePackage.MECHANISM__AXIS_DIRECTION_Z:
        return axisDirectionZ != AXIS_DIRECTION_Z_EDEFAULT;
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_X:
        return gravityDirectionX != GRAVITY_DIRECTION_X_EDEFAULT;
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Y:
        return gravityDirectionY != GRAVITY_DIRECTION_Y_EDEFAULT;
      case PendulinePackage.MECHANISM__GRAVITY_DIRECTION_Z:
        return gravityDirectionZ != GRAVITY_DIRECTION_Z_EDEFAULT;
      case PendulinePackage.MECHANISM__AXIS_TILT:
        return axisTilt != AXIS_TILT_EDEFAULT;
      case PendulinePackage.MECHANISM__PARTS:
        return parts != null && !parts.isEmpty();
      case PendulinePackage.MECHANISM__FRICTION_HYPOTHESES:
        return frictionHypotheses != null && !frictionHypotheses.isEmpty();
      case PendulinePackage.MECHANISM__SESSIONS:
        return sessions != null && !sessions.isEmpty();
      case PendulinePackage.MECHANISM__FIT_RESULTS:
        return fitResults != null && !fitResults.isEmpty();
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
    result.append(" (name: ");
    result.append(name);
    result.append(", description: ");
    result.append(description);
    result.append(", gravity: ");
    result.append(gravity);
    result.append(", axisPointX: ");
    result.append(axisPointX);
    result.append(", axisPointY: ");
    result.append(axisPointY);
    result.append(", axisPointZ: ");
    result.append(axisPointZ);
    result.append(", axisDirectionX: ");
    result.append(axisDirectionX);
    result.append(", axisDirectionY: ");
    result.append(axisDirectionY);
    result.append(", axisDirectionZ: ");
    result.append(axisDirectionZ);
    result.append(", gravityDirectionX: ");
    result.append(gravityDirectionX);
    result.append(", gravityDirectionY: ");
    result.append(gravityDirectionY);
    result.append(", gravityDirectionZ: ");
    result.append(gravityDirectionZ);
    result.append(", axisTilt: ");
    result.append(axisTilt);
    result.append(')');
    return result.toString();
  }

} //MechanismImpl
