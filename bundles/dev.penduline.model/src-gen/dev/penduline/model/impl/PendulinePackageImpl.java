/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.AngleUnit;
import dev.penduline.model.DecimalSeparator;
import dev.penduline.model.Delimiter;
import dev.penduline.model.EnergyShare;
import dev.penduline.model.Estimate;
import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.PendulineFactory;
import dev.penduline.model.PendulinePackage;
import dev.penduline.model.SessionFit;
import dev.penduline.model.Setting;
import dev.penduline.model.ShapeAxis;
import dev.penduline.model.ShapeKind;
import dev.penduline.model.TensorReference;
import dev.penduline.model.TermSetScore;
import dev.penduline.model.TestSession;
import dev.penduline.model.TimeUnit;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;

import org.eclipse.emf.ecore.impl.EPackageImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Package</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class PendulinePackageImpl extends EPackageImpl implements PendulinePackage
{
  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass mechanismEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass partEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass frictionHypothesisEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass frictionTermEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass testSessionEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass fitResultEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass estimateEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass sessionFitEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass termSetScoreEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass energyShareEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EClass settingEClass = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EEnum shapeKindEEnum = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EEnum shapeAxisEEnum = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EEnum tensorReferenceEEnum = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EEnum frictionKindEEnum = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EEnum timeUnitEEnum = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EEnum angleUnitEEnum = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EEnum delimiterEEnum = null;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private EEnum decimalSeparatorEEnum = null;

  /**
   * Creates an instance of the model <b>Package</b>, registered with
   * {@link org.eclipse.emf.ecore.EPackage.Registry EPackage.Registry} by the package
   * package URI value.
   * <p>Note: the correct way to create the package is via the static
   * factory method {@link #init init()}, which also performs
   * initialization of the package, or returns the registered package,
   * if one already exists.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see org.eclipse.emf.ecore.EPackage.Registry
   * @see dev.penduline.model.PendulinePackage#eNS_URI
   * @see #init()
   * @generated
   */
  private PendulinePackageImpl()
  {
    super(eNS_URI, PendulineFactory.eINSTANCE);
  }
  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private static boolean isInited = false;

  /**
   * Creates, registers, and initializes the <b>Package</b> for this model, and for any others upon which it depends.
   *
   * <p>This method is used to initialize {@link PendulinePackage#eINSTANCE} when that field is accessed.
   * Clients should not invoke it directly. Instead, they should simply access that field to obtain the package.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #eNS_URI
   * @see #createPackageContents()
   * @see #initializePackageContents()
   * @generated
   */
  public static PendulinePackage init()
  {
    if (isInited) return (PendulinePackage)EPackage.Registry.INSTANCE.getEPackage(PendulinePackage.eNS_URI);

    // Obtain or create and register package
    Object registeredPendulinePackage = EPackage.Registry.INSTANCE.get(eNS_URI);
    PendulinePackageImpl thePendulinePackage = registeredPendulinePackage instanceof PendulinePackageImpl ? (PendulinePackageImpl)registeredPendulinePackage : new PendulinePackageImpl();

    isInited = true;

    // Create package meta-data objects
    thePendulinePackage.createPackageContents();

    // Initialize created meta-data
    thePendulinePackage.initializePackageContents();

    // Mark meta-data to indicate it can't be changed
    thePendulinePackage.freeze();

    // Update the registry and return the package
    EPackage.Registry.INSTANCE.put(PendulinePackage.eNS_URI, thePendulinePackage);
    return thePendulinePackage;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getMechanism()
  {
    return mechanismEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_Name()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_Description()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_Gravity()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(2);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_AxisPointX()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(3);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_AxisPointY()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(4);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_AxisPointZ()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(5);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_AxisDirectionX()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(6);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_AxisDirectionY()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(7);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_AxisDirectionZ()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(8);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_GravityDirectionX()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(9);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_GravityDirectionY()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(10);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_GravityDirectionZ()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(11);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getMechanism_AxisTilt()
  {
    return (EAttribute)mechanismEClass.getEStructuralFeatures().get(12);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getMechanism_Parts()
  {
    return (EReference)mechanismEClass.getEStructuralFeatures().get(13);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getMechanism_FrictionHypotheses()
  {
    return (EReference)mechanismEClass.getEStructuralFeatures().get(14);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getMechanism_Sessions()
  {
    return (EReference)mechanismEClass.getEStructuralFeatures().get(15);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getMechanism_FitResults()
  {
    return (EReference)mechanismEClass.getEStructuralFeatures().get(16);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getPart()
  {
    return partEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Id()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Name()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Shape()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(2);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_ShapeAxis()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(3);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Length()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(4);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Width()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(5);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Height()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(6);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Radius()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(7);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_InnerRadius()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(8);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Mass()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(9);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Density()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(10);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_CentroidX()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(11);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_CentroidY()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(12);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_CentroidZ()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(13);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_RotationX()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(14);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_RotationY()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(15);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_RotationZ()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(16);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Cutout()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(17);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Quantity()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(18);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_MassTolerance()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(19);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_DimensionTolerance()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(20);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Ixx()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(21);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Iyy()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(22);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Izz()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(23);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Ixy()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(24);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Ixz()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(25);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_Iyz()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(26);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getPart_TensorReference()
  {
    return (EAttribute)partEClass.getEStructuralFeatures().get(27);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getFrictionHypothesis()
  {
    return frictionHypothesisEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFrictionHypothesis_Id()
  {
    return (EAttribute)frictionHypothesisEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFrictionHypothesis_Name()
  {
    return (EAttribute)frictionHypothesisEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFrictionHypothesis_Description()
  {
    return (EAttribute)frictionHypothesisEClass.getEStructuralFeatures().get(2);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getFrictionHypothesis_Terms()
  {
    return (EReference)frictionHypothesisEClass.getEStructuralFeatures().get(3);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getFrictionTerm()
  {
    return frictionTermEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFrictionTerm_Id()
  {
    return (EAttribute)frictionTermEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFrictionTerm_Kind()
  {
    return (EAttribute)frictionTermEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFrictionTerm_Value()
  {
    return (EAttribute)frictionTermEClass.getEStructuralFeatures().get(2);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFrictionTerm_LowerBound()
  {
    return (EAttribute)frictionTermEClass.getEStructuralFeatures().get(3);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFrictionTerm_UpperBound()
  {
    return (EAttribute)frictionTermEClass.getEStructuralFeatures().get(4);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFrictionTerm_Fixed()
  {
    return (EAttribute)frictionTermEClass.getEStructuralFeatures().get(5);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getTestSession()
  {
    return testSessionEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_Id()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_Name()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_RecordPath()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(2);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_TimeColumnName()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(3);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_TimeColumnNumber()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(4);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_AngleColumnName()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(5);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_AngleColumnNumber()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(6);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_TimeUnit()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(7);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_AngleUnit()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(8);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_CountsPerRevolution()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(9);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_Delimiter()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(10);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_DecimalSeparator()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(11);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_ContentHash()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(12);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_ReleaseAngle()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(13);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTestSession_Notes()
  {
    return (EAttribute)testSessionEClass.getEStructuralFeatures().get(14);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getFitResult()
  {
    return fitResultEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_Id()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_Name()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_ComputedAt()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(2);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_HypothesisId()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(3);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_SessionIds()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(4);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_TermIds()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(5);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getFitResult_Estimates()
  {
    return (EReference)fitResultEClass.getEStructuralFeatures().get(6);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_CorrelationParameters()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(7);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_Correlations()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(8);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_CalculatedInertia()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(9);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_FittedInertia()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(10);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getFitResult_SessionFits()
  {
    return (EReference)fitResultEClass.getEStructuralFeatures().get(11);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getFitResult_Comparisons()
  {
    return (EReference)fitResultEClass.getEStructuralFeatures().get(12);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getFitResult_DominantLoss()
  {
    return (EAttribute)fitResultEClass.getEStructuralFeatures().get(13);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getFitResult_EnergyShares()
  {
    return (EReference)fitResultEClass.getEStructuralFeatures().get(14);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EReference getFitResult_Settings()
  {
    return (EReference)fitResultEClass.getEStructuralFeatures().get(15);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getEstimate()
  {
    return estimateEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getEstimate_Parameter()
  {
    return (EAttribute)estimateEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getEstimate_Value()
  {
    return (EAttribute)estimateEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getEstimate_StandardError()
  {
    return (EAttribute)estimateEClass.getEStructuralFeatures().get(2);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getEstimate_ResamplingError()
  {
    return (EAttribute)estimateEClass.getEStructuralFeatures().get(3);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getSessionFit()
  {
    return sessionFitEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getSessionFit_SessionId()
  {
    return (EAttribute)sessionFitEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getSessionFit_InitialAngle()
  {
    return (EAttribute)sessionFitEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getSessionFit_ReleaseTime()
  {
    return (EAttribute)sessionFitEClass.getEStructuralFeatures().get(2);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getSessionFit_AngleOffset()
  {
    return (EAttribute)sessionFitEClass.getEStructuralFeatures().get(3);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getSessionFit_RmsResidual()
  {
    return (EAttribute)sessionFitEClass.getEStructuralFeatures().get(4);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getTermSetScore()
  {
    return termSetScoreEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTermSetScore_TermIds()
  {
    return (EAttribute)termSetScoreEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTermSetScore_Aic()
  {
    return (EAttribute)termSetScoreEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTermSetScore_Bic()
  {
    return (EAttribute)termSetScoreEClass.getEStructuralFeatures().get(2);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getTermSetScore_RmsResidual()
  {
    return (EAttribute)termSetScoreEClass.getEStructuralFeatures().get(3);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getEnergyShare()
  {
    return energyShareEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getEnergyShare_TermId()
  {
    return (EAttribute)energyShareEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getEnergyShare_Share()
  {
    return (EAttribute)energyShareEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EClass getSetting()
  {
    return settingEClass;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getSetting_Key()
  {
    return (EAttribute)settingEClass.getEStructuralFeatures().get(0);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EAttribute getSetting_Value()
  {
    return (EAttribute)settingEClass.getEStructuralFeatures().get(1);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EEnum getShapeKind()
  {
    return shapeKindEEnum;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EEnum getShapeAxis()
  {
    return shapeAxisEEnum;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EEnum getTensorReference()
  {
    return tensorReferenceEEnum;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EEnum getFrictionKind()
  {
    return frictionKindEEnum;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EEnum getTimeUnit()
  {
    return timeUnitEEnum;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EEnum getAngleUnit()
  {
    return angleUnitEEnum;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EEnum getDelimiter()
  {
    return delimiterEEnum;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EEnum getDecimalSeparator()
  {
    return decimalSeparatorEEnum;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public PendulineFactory getPendulineFactory()
  {
    return (PendulineFactory)getEFactoryInstance();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private boolean isCreated = false;

  /**
   * Creates the meta-model objects for the package.  This method is
   * guarded to have no affect on any invocation but its first.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public void createPackageContents()
  {
    if (isCreated) return;
    isCreated = true;

    // Create classes and their features
    mechanismEClass = createEClass(MECHANISM);
    createEAttribute(mechanismEClass, MECHANISM__NAME);
    createEAttribute(mechanismEClass, MECHANISM__DESCRIPTION);
    createEAttribute(mechanismEClass, MECHANISM__GRAVITY);
    createEAttribute(mechanismEClass, MECHANISM__AXIS_POINT_X);
    createEAttribute(mechanismEClass, MECHANISM__AXIS_POINT_Y);
    createEAttribute(mechanismEClass, MECHANISM__AXIS_POINT_Z);
    createEAttribute(mechanismEClass, MECHANISM__AXIS_DIRECTION_X);
    createEAttribute(mechanismEClass, MECHANISM__AXIS_DIRECTION_Y);
    createEAttribute(mechanismEClass, MECHANISM__AXIS_DIRECTION_Z);
    createEAttribute(mechanismEClass, MECHANISM__GRAVITY_DIRECTION_X);
    createEAttribute(mechanismEClass, MECHANISM__GRAVITY_DIRECTION_Y);
    createEAttribute(mechanismEClass, MECHANISM__GRAVITY_DIRECTION_Z);
    createEAttribute(mechanismEClass, MECHANISM__AXIS_TILT);
    createEReference(mechanismEClass, MECHANISM__PARTS);
    createEReference(mechanismEClass, MECHANISM__FRICTION_HYPOTHESES);
    createEReference(mechanismEClass, MECHANISM__SESSIONS);
    createEReference(mechanismEClass, MECHANISM__FIT_RESULTS);

    partEClass = createEClass(PART);
    createEAttribute(partEClass, PART__ID);
    createEAttribute(partEClass, PART__NAME);
    createEAttribute(partEClass, PART__SHAPE);
    createEAttribute(partEClass, PART__SHAPE_AXIS);
    createEAttribute(partEClass, PART__LENGTH);
    createEAttribute(partEClass, PART__WIDTH);
    createEAttribute(partEClass, PART__HEIGHT);
    createEAttribute(partEClass, PART__RADIUS);
    createEAttribute(partEClass, PART__INNER_RADIUS);
    createEAttribute(partEClass, PART__MASS);
    createEAttribute(partEClass, PART__DENSITY);
    createEAttribute(partEClass, PART__CENTROID_X);
    createEAttribute(partEClass, PART__CENTROID_Y);
    createEAttribute(partEClass, PART__CENTROID_Z);
    createEAttribute(partEClass, PART__ROTATION_X);
    createEAttribute(partEClass, PART__ROTATION_Y);
    createEAttribute(partEClass, PART__ROTATION_Z);
    createEAttribute(partEClass, PART__CUTOUT);
    createEAttribute(partEClass, PART__QUANTITY);
    createEAttribute(partEClass, PART__MASS_TOLERANCE);
    createEAttribute(partEClass, PART__DIMENSION_TOLERANCE);
    createEAttribute(partEClass, PART__IXX);
    createEAttribute(partEClass, PART__IYY);
    createEAttribute(partEClass, PART__IZZ);
    createEAttribute(partEClass, PART__IXY);
    createEAttribute(partEClass, PART__IXZ);
    createEAttribute(partEClass, PART__IYZ);
    createEAttribute(partEClass, PART__TENSOR_REFERENCE);

    frictionHypothesisEClass = createEClass(FRICTION_HYPOTHESIS);
    createEAttribute(frictionHypothesisEClass, FRICTION_HYPOTHESIS__ID);
    createEAttribute(frictionHypothesisEClass, FRICTION_HYPOTHESIS__NAME);
    createEAttribute(frictionHypothesisEClass, FRICTION_HYPOTHESIS__DESCRIPTION);
    createEReference(frictionHypothesisEClass, FRICTION_HYPOTHESIS__TERMS);

    frictionTermEClass = createEClass(FRICTION_TERM);
    createEAttribute(frictionTermEClass, FRICTION_TERM__ID);
    createEAttribute(frictionTermEClass, FRICTION_TERM__KIND);
    createEAttribute(frictionTermEClass, FRICTION_TERM__VALUE);
    createEAttribute(frictionTermEClass, FRICTION_TERM__LOWER_BOUND);
    createEAttribute(frictionTermEClass, FRICTION_TERM__UPPER_BOUND);
    createEAttribute(frictionTermEClass, FRICTION_TERM__FIXED);

    testSessionEClass = createEClass(TEST_SESSION);
    createEAttribute(testSessionEClass, TEST_SESSION__ID);
    createEAttribute(testSessionEClass, TEST_SESSION__NAME);
    createEAttribute(testSessionEClass, TEST_SESSION__RECORD_PATH);
    createEAttribute(testSessionEClass, TEST_SESSION__TIME_COLUMN_NAME);
    createEAttribute(testSessionEClass, TEST_SESSION__TIME_COLUMN_NUMBER);
    createEAttribute(testSessionEClass, TEST_SESSION__ANGLE_COLUMN_NAME);
    createEAttribute(testSessionEClass, TEST_SESSION__ANGLE_COLUMN_NUMBER);
    createEAttribute(testSessionEClass, TEST_SESSION__TIME_UNIT);
    createEAttribute(testSessionEClass, TEST_SESSION__ANGLE_UNIT);
    createEAttribute(testSessionEClass, TEST_SESSION__COUNTS_PER_REVOLUTION);
    createEAttribute(testSessionEClass, TEST_SESSION__DELIMITER);
    createEAttribute(testSessionEClass, TEST_SESSION__DECIMAL_SEPARATOR);
    createEAttribute(testSessionEClass, TEST_SESSION__CONTENT_HASH);
    createEAttribute(testSessionEClass, TEST_SESSION__RELEASE_ANGLE);
    createEAttribute(testSessionEClass, TEST_SESSION__NOTES);

    fitResultEClass = createEClass(FIT_RESULT);
    createEAttribute(fitResultEClass, FIT_RESULT__ID);
    createEAttribute(fitResultEClass, FIT_RESULT__NAME);
    createEAttribute(fitResultEClass, FIT_RESULT__COMPUTED_AT);
    createEAttribute(fitResultEClass, FIT_RESULT__HYPOTHESIS_ID);
    createEAttribute(fitResultEClass, FIT_RESULT__SESSION_IDS);
    createEAttribute(fitResultEClass, FIT_RESULT__TERM_IDS);
    createEReference(fitResultEClass, FIT_RESULT__ESTIMATES);
    createEAttribute(fitResultEClass, FIT_RESULT__CORRELATION_PARAMETERS);
    createEAttribute(fitResultEClass, FIT_RESULT__CORRELATIONS);
    createEAttribute(fitResultEClass, FIT_RESULT__CALCULATED_INERTIA);
    createEAttribute(fitResultEClass, FIT_RESULT__FITTED_INERTIA);
    createEReference(fitResultEClass, FIT_RESULT__SESSION_FITS);
    createEReference(fitResultEClass, FIT_RESULT__COMPARISONS);
    createEAttribute(fitResultEClass, FIT_RESULT__DOMINANT_LOSS);
    createEReference(fitResultEClass, FIT_RESULT__ENERGY_SHARES);
    createEReference(fitResultEClass, FIT_RESULT__SETTINGS);

    estimateEClass = createEClass(ESTIMATE);
    createEAttribute(estimateEClass, ESTIMATE__PARAMETER);
    createEAttribute(estimateEClass, ESTIMATE__VALUE);
    createEAttribute(estimateEClass, ESTIMATE__STANDARD_ERROR);
    createEAttribute(estimateEClass, ESTIMATE__RESAMPLING_ERROR);

    sessionFitEClass = createEClass(SESSION_FIT);
    createEAttribute(sessionFitEClass, SESSION_FIT__SESSION_ID);
    createEAttribute(sessionFitEClass, SESSION_FIT__INITIAL_ANGLE);
    createEAttribute(sessionFitEClass, SESSION_FIT__RELEASE_TIME);
    createEAttribute(sessionFitEClass, SESSION_FIT__ANGLE_OFFSET);
    createEAttribute(sessionFitEClass, SESSION_FIT__RMS_RESIDUAL);

    termSetScoreEClass = createEClass(TERM_SET_SCORE);
    createEAttribute(termSetScoreEClass, TERM_SET_SCORE__TERM_IDS);
    createEAttribute(termSetScoreEClass, TERM_SET_SCORE__AIC);
    createEAttribute(termSetScoreEClass, TERM_SET_SCORE__BIC);
    createEAttribute(termSetScoreEClass, TERM_SET_SCORE__RMS_RESIDUAL);

    energyShareEClass = createEClass(ENERGY_SHARE);
    createEAttribute(energyShareEClass, ENERGY_SHARE__TERM_ID);
    createEAttribute(energyShareEClass, ENERGY_SHARE__SHARE);

    settingEClass = createEClass(SETTING);
    createEAttribute(settingEClass, SETTING__KEY);
    createEAttribute(settingEClass, SETTING__VALUE);

    // Create enums
    shapeKindEEnum = createEEnum(SHAPE_KIND);
    shapeAxisEEnum = createEEnum(SHAPE_AXIS);
    tensorReferenceEEnum = createEEnum(TENSOR_REFERENCE);
    frictionKindEEnum = createEEnum(FRICTION_KIND);
    timeUnitEEnum = createEEnum(TIME_UNIT);
    angleUnitEEnum = createEEnum(ANGLE_UNIT);
    delimiterEEnum = createEEnum(DELIMITER);
    decimalSeparatorEEnum = createEEnum(DECIMAL_SEPARATOR);
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  private boolean isInitialized = false;

  /**
   * Complete the initialization of the package and its meta-model.  This
   * method is guarded to have no affect on any invocation but its first.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public void initializePackageContents()
  {
    if (isInitialized) return;
    isInitialized = true;

    // Initialize package
    setName(eNAME);
    setNsPrefix(eNS_PREFIX);
    setNsURI(eNS_URI);

    // Create type parameters

    // Set bounds for type parameters

    // Add supertypes to classes

    // Initialize classes, features, and operations; add parameters
    initEClass(mechanismEClass, Mechanism.class, "Mechanism", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getMechanism_Name(), ecorePackage.getEString(), "name", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_Description(), ecorePackage.getEString(), "description", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_Gravity(), ecorePackage.getEDouble(), "gravity", "9.80665", 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_AxisPointX(), ecorePackage.getEDouble(), "axisPointX", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_AxisPointY(), ecorePackage.getEDouble(), "axisPointY", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_AxisPointZ(), ecorePackage.getEDouble(), "axisPointZ", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_AxisDirectionX(), ecorePackage.getEDouble(), "axisDirectionX", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_AxisDirectionY(), ecorePackage.getEDouble(), "axisDirectionY", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_AxisDirectionZ(), ecorePackage.getEDouble(), "axisDirectionZ", "1.0", 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_GravityDirectionX(), ecorePackage.getEDouble(), "gravityDirectionX", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_GravityDirectionY(), ecorePackage.getEDouble(), "gravityDirectionY", "-1.0", 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_GravityDirectionZ(), ecorePackage.getEDouble(), "gravityDirectionZ", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getMechanism_AxisTilt(), ecorePackage.getEDouble(), "axisTilt", null, 0, 1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getMechanism_Parts(), this.getPart(), null, "parts", null, 0, -1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getMechanism_FrictionHypotheses(), this.getFrictionHypothesis(), null, "frictionHypotheses", null, 0, -1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getMechanism_Sessions(), this.getTestSession(), null, "sessions", null, 0, -1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getMechanism_FitResults(), this.getFitResult(), null, "fitResults", null, 0, -1, Mechanism.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(partEClass, Part.class, "Part", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getPart_Id(), ecorePackage.getEString(), "id", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Name(), ecorePackage.getEString(), "name", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Shape(), this.getShapeKind(), "shape", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_ShapeAxis(), this.getShapeAxis(), "shapeAxis", "z", 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Length(), ecorePackage.getEDouble(), "length", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Width(), ecorePackage.getEDouble(), "width", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Height(), ecorePackage.getEDouble(), "height", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Radius(), ecorePackage.getEDouble(), "radius", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_InnerRadius(), ecorePackage.getEDouble(), "innerRadius", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Mass(), ecorePackage.getEDouble(), "mass", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Density(), ecorePackage.getEDouble(), "density", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_CentroidX(), ecorePackage.getEDouble(), "centroidX", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_CentroidY(), ecorePackage.getEDouble(), "centroidY", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_CentroidZ(), ecorePackage.getEDouble(), "centroidZ", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_RotationX(), ecorePackage.getEDouble(), "rotationX", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_RotationY(), ecorePackage.getEDouble(), "rotationY", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_RotationZ(), ecorePackage.getEDouble(), "rotationZ", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Cutout(), ecorePackage.getEBoolean(), "cutout", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Quantity(), ecorePackage.getEInt(), "quantity", "1", 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_MassTolerance(), ecorePackage.getEDouble(), "massTolerance", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_DimensionTolerance(), ecorePackage.getEDouble(), "dimensionTolerance", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Ixx(), ecorePackage.getEDouble(), "ixx", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Iyy(), ecorePackage.getEDouble(), "iyy", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Izz(), ecorePackage.getEDouble(), "izz", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Ixy(), ecorePackage.getEDouble(), "ixy", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Ixz(), ecorePackage.getEDouble(), "ixz", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_Iyz(), ecorePackage.getEDouble(), "iyz", null, 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getPart_TensorReference(), this.getTensorReference(), "tensorReference", "centroid", 0, 1, Part.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(frictionHypothesisEClass, FrictionHypothesis.class, "FrictionHypothesis", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getFrictionHypothesis_Id(), ecorePackage.getEString(), "id", null, 0, 1, FrictionHypothesis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFrictionHypothesis_Name(), ecorePackage.getEString(), "name", null, 0, 1, FrictionHypothesis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFrictionHypothesis_Description(), ecorePackage.getEString(), "description", null, 0, 1, FrictionHypothesis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getFrictionHypothesis_Terms(), this.getFrictionTerm(), null, "terms", null, 0, -1, FrictionHypothesis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(frictionTermEClass, FrictionTerm.class, "FrictionTerm", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getFrictionTerm_Id(), ecorePackage.getEString(), "id", null, 0, 1, FrictionTerm.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFrictionTerm_Kind(), this.getFrictionKind(), "kind", null, 0, 1, FrictionTerm.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFrictionTerm_Value(), ecorePackage.getEDouble(), "value", null, 0, 1, FrictionTerm.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFrictionTerm_LowerBound(), ecorePackage.getEDouble(), "lowerBound", null, 0, 1, FrictionTerm.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFrictionTerm_UpperBound(), ecorePackage.getEDouble(), "upperBound", null, 0, 1, FrictionTerm.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFrictionTerm_Fixed(), ecorePackage.getEBoolean(), "fixed", null, 0, 1, FrictionTerm.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(testSessionEClass, TestSession.class, "TestSession", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getTestSession_Id(), ecorePackage.getEString(), "id", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_Name(), ecorePackage.getEString(), "name", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_RecordPath(), ecorePackage.getEString(), "recordPath", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_TimeColumnName(), ecorePackage.getEString(), "timeColumnName", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_TimeColumnNumber(), ecorePackage.getEInt(), "timeColumnNumber", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_AngleColumnName(), ecorePackage.getEString(), "angleColumnName", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_AngleColumnNumber(), ecorePackage.getEInt(), "angleColumnNumber", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_TimeUnit(), this.getTimeUnit(), "timeUnit", "s", 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_AngleUnit(), this.getAngleUnit(), "angleUnit", "rad", 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_CountsPerRevolution(), ecorePackage.getEInt(), "countsPerRevolution", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_Delimiter(), this.getDelimiter(), "delimiter", "comma", 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_DecimalSeparator(), this.getDecimalSeparator(), "decimalSeparator", "point", 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_ContentHash(), ecorePackage.getEString(), "contentHash", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_ReleaseAngle(), ecorePackage.getEDouble(), "releaseAngle", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTestSession_Notes(), ecorePackage.getEString(), "notes", null, 0, 1, TestSession.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(fitResultEClass, FitResult.class, "FitResult", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getFitResult_Id(), ecorePackage.getEString(), "id", null, 0, 1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_Name(), ecorePackage.getEString(), "name", null, 0, 1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_ComputedAt(), ecorePackage.getEString(), "computedAt", null, 0, 1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_HypothesisId(), ecorePackage.getEString(), "hypothesisId", null, 0, 1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_SessionIds(), ecorePackage.getEString(), "sessionIds", null, 0, -1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_TermIds(), ecorePackage.getEString(), "termIds", null, 0, -1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getFitResult_Estimates(), this.getEstimate(), null, "estimates", null, 0, -1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_CorrelationParameters(), ecorePackage.getEString(), "correlationParameters", null, 0, -1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_Correlations(), ecorePackage.getEDouble(), "correlations", null, 0, -1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, !IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_CalculatedInertia(), ecorePackage.getEDouble(), "calculatedInertia", null, 0, 1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_FittedInertia(), ecorePackage.getEDouble(), "fittedInertia", null, 0, 1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getFitResult_SessionFits(), this.getSessionFit(), null, "sessionFits", null, 0, -1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getFitResult_Comparisons(), this.getTermSetScore(), null, "comparisons", null, 0, -1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getFitResult_DominantLoss(), ecorePackage.getEString(), "dominantLoss", null, 0, 1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getFitResult_EnergyShares(), this.getEnergyShare(), null, "energyShares", null, 0, -1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEReference(getFitResult_Settings(), this.getSetting(), null, "settings", null, 0, -1, FitResult.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(estimateEClass, Estimate.class, "Estimate", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getEstimate_Parameter(), ecorePackage.getEString(), "parameter", null, 0, 1, Estimate.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getEstimate_Value(), ecorePackage.getEDouble(), "value", null, 0, 1, Estimate.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getEstimate_StandardError(), ecorePackage.getEDouble(), "standardError", null, 0, 1, Estimate.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getEstimate_ResamplingError(), ecorePackage.getEDouble(), "resamplingError", null, 0, 1, Estimate.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(sessionFitEClass, SessionFit.class, "SessionFit", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getSessionFit_SessionId(), ecorePackage.getEString(), "sessionId", null, 0, 1, SessionFit.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getSessionFit_InitialAngle(), ecorePackage.getEDouble(), "initialAngle", null, 0, 1, SessionFit.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getSessionFit_ReleaseTime(), ecorePackage.getEDouble(), "releaseTime", null, 0, 1, SessionFit.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getSessionFit_AngleOffset(), ecorePackage.getEDouble(), "angleOffset", null, 0, 1, SessionFit.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getSessionFit_RmsResidual(), ecorePackage.getEDouble(), "rmsResidual", null, 0, 1, SessionFit.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(termSetScoreEClass, TermSetScore.class, "TermSetScore", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getTermSetScore_TermIds(), ecorePackage.getEString(), "termIds", null, 0, -1, TermSetScore.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTermSetScore_Aic(), ecorePackage.getEDouble(), "aic", null, 0, 1, TermSetScore.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTermSetScore_Bic(), ecorePackage.getEDouble(), "bic", null, 0, 1, TermSetScore.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getTermSetScore_RmsResidual(), ecorePackage.getEDouble(), "rmsResidual", null, 0, 1, TermSetScore.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(energyShareEClass, EnergyShare.class, "EnergyShare", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getEnergyShare_TermId(), ecorePackage.getEString(), "termId", null, 0, 1, EnergyShare.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getEnergyShare_Share(), ecorePackage.getEDouble(), "share", null, 0, 1, EnergyShare.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    initEClass(settingEClass, Setting.class, "Setting", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
    initEAttribute(getSetting_Key(), ecorePackage.getEString(), "key", null, 0, 1, Setting.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
    initEAttribute(getSetting_Value(), ecorePackage.getEString(), "value", null, 0, 1, Setting.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

    // Initialize enums and add enum literals
    initEEnum(shapeKindEEnum, ShapeKind.class, "ShapeKind");
    addEEnumLiteral(shapeKindEEnum, ShapeKind.POINT_MASS);
    addEEnumLiteral(shapeKindEEnum, ShapeKind.SLENDER_ROD);
    addEEnumLiteral(shapeKindEEnum, ShapeKind.BOX);
    addEEnumLiteral(shapeKindEEnum, ShapeKind.CYLINDER);
    addEEnumLiteral(shapeKindEEnum, ShapeKind.HOLLOW_CYLINDER);
    addEEnumLiteral(shapeKindEEnum, ShapeKind.SPHERE);
    addEEnumLiteral(shapeKindEEnum, ShapeKind.THIN_RING);
    addEEnumLiteral(shapeKindEEnum, ShapeKind.MASS_PROPERTIES);

    initEEnum(shapeAxisEEnum, ShapeAxis.class, "ShapeAxis");
    addEEnumLiteral(shapeAxisEEnum, ShapeAxis.X);
    addEEnumLiteral(shapeAxisEEnum, ShapeAxis.Y);
    addEEnumLiteral(shapeAxisEEnum, ShapeAxis.Z);

    initEEnum(tensorReferenceEEnum, TensorReference.class, "TensorReference");
    addEEnumLiteral(tensorReferenceEEnum, TensorReference.CENTROID);
    addEEnumLiteral(tensorReferenceEEnum, TensorReference.FRAME_ORIGIN);

    initEEnum(frictionKindEEnum, FrictionKind.class, "FrictionKind");
    addEEnumLiteral(frictionKindEEnum, FrictionKind.VISCOUS);
    addEEnumLiteral(frictionKindEEnum, FrictionKind.COULOMB);
    addEEnumLiteral(frictionKindEEnum, FrictionKind.STICTION);
    addEEnumLiteral(frictionKindEEnum, FrictionKind.DRAG);

    initEEnum(timeUnitEEnum, TimeUnit.class, "TimeUnit");
    addEEnumLiteral(timeUnitEEnum, TimeUnit.SECOND);
    addEEnumLiteral(timeUnitEEnum, TimeUnit.MILLISECOND);
    addEEnumLiteral(timeUnitEEnum, TimeUnit.MICROSECOND);

    initEEnum(angleUnitEEnum, AngleUnit.class, "AngleUnit");
    addEEnumLiteral(angleUnitEEnum, AngleUnit.RADIAN);
    addEEnumLiteral(angleUnitEEnum, AngleUnit.DEGREE);
    addEEnumLiteral(angleUnitEEnum, AngleUnit.COUNT);

    initEEnum(delimiterEEnum, Delimiter.class, "Delimiter");
    addEEnumLiteral(delimiterEEnum, Delimiter.COMMA);
    addEEnumLiteral(delimiterEEnum, Delimiter.SEMICOLON);
    addEEnumLiteral(delimiterEEnum, Delimiter.TAB);
    addEEnumLiteral(delimiterEEnum, Delimiter.WHITESPACE);

    initEEnum(decimalSeparatorEEnum, DecimalSeparator.class, "DecimalSeparator");
    addEEnumLiteral(decimalSeparatorEEnum, DecimalSeparator.POINT);
    addEEnumLiteral(decimalSeparatorEEnum, DecimalSeparator.COMMA);

    // Create resource
    createResource(eNS_URI);

    // Create annotations
    // http:///org/eclipse/emf/ecore/util/ExtendedMetaData
    createExtendedMetaDataAnnotations();
  }

  /**
   * Initializes the annotations for <b>http:///org/eclipse/emf/ecore/util/ExtendedMetaData</b>.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected void createExtendedMetaDataAnnotations()
  {
    String source = "http:///org/eclipse/emf/ecore/util/ExtendedMetaData";
    addAnnotation
      (mechanismEClass,
       source,
       new String[]
       {
         "name", "Mechanism",
         "kind", "elementOnly"
       });
    addAnnotation
      (getMechanism_Name(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "name"
       });
    addAnnotation
      (getMechanism_Description(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "description"
       });
    addAnnotation
      (getMechanism_Gravity(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "gravity"
       });
    addAnnotation
      (getMechanism_AxisPointX(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "axisPointX"
       });
    addAnnotation
      (getMechanism_AxisPointY(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "axisPointY"
       });
    addAnnotation
      (getMechanism_AxisPointZ(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "axisPointZ"
       });
    addAnnotation
      (getMechanism_AxisDirectionX(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "axisDirectionX"
       });
    addAnnotation
      (getMechanism_AxisDirectionY(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "axisDirectionY"
       });
    addAnnotation
      (getMechanism_AxisDirectionZ(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "axisDirectionZ"
       });
    addAnnotation
      (getMechanism_GravityDirectionX(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "gravityDirectionX"
       });
    addAnnotation
      (getMechanism_GravityDirectionY(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "gravityDirectionY"
       });
    addAnnotation
      (getMechanism_GravityDirectionZ(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "gravityDirectionZ"
       });
    addAnnotation
      (getMechanism_AxisTilt(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "axisTilt"
       });
    addAnnotation
      (getMechanism_Parts(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "part"
       });
    addAnnotation
      (getMechanism_FrictionHypotheses(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "frictionHypothesis"
       });
    addAnnotation
      (getMechanism_Sessions(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "session"
       });
    addAnnotation
      (getMechanism_FitResults(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "fitResult"
       });
    addAnnotation
      (partEClass,
       source,
       new String[]
       {
         "name", "Part",
         "kind", "elementOnly"
       });
    addAnnotation
      (getPart_Id(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "id"
       });
    addAnnotation
      (getPart_Name(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "name"
       });
    addAnnotation
      (getPart_Shape(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "shape"
       });
    addAnnotation
      (getPart_ShapeAxis(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "shapeAxis"
       });
    addAnnotation
      (getPart_Length(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "length"
       });
    addAnnotation
      (getPart_Width(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "width"
       });
    addAnnotation
      (getPart_Height(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "height"
       });
    addAnnotation
      (getPart_Radius(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "radius"
       });
    addAnnotation
      (getPart_InnerRadius(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "innerRadius"
       });
    addAnnotation
      (getPart_Mass(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "mass"
       });
    addAnnotation
      (getPart_Density(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "density"
       });
    addAnnotation
      (getPart_CentroidX(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "centroidX"
       });
    addAnnotation
      (getPart_CentroidY(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "centroidY"
       });
    addAnnotation
      (getPart_CentroidZ(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "centroidZ"
       });
    addAnnotation
      (getPart_RotationX(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "rotationX"
       });
    addAnnotation
      (getPart_RotationY(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "rotationY"
       });
    addAnnotation
      (getPart_RotationZ(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "rotationZ"
       });
    addAnnotation
      (getPart_Cutout(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "cutout"
       });
    addAnnotation
      (getPart_Quantity(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "quantity"
       });
    addAnnotation
      (getPart_MassTolerance(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "massTolerance"
       });
    addAnnotation
      (getPart_DimensionTolerance(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "dimensionTolerance"
       });
    addAnnotation
      (getPart_Ixx(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "ixx"
       });
    addAnnotation
      (getPart_Iyy(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "iyy"
       });
    addAnnotation
      (getPart_Izz(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "izz"
       });
    addAnnotation
      (getPart_Ixy(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "ixy"
       });
    addAnnotation
      (getPart_Ixz(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "ixz"
       });
    addAnnotation
      (getPart_Iyz(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "iyz"
       });
    addAnnotation
      (getPart_TensorReference(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "tensorReference"
       });
    addAnnotation
      (frictionHypothesisEClass,
       source,
       new String[]
       {
         "name", "FrictionHypothesis",
         "kind", "elementOnly"
       });
    addAnnotation
      (getFrictionHypothesis_Id(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "id"
       });
    addAnnotation
      (getFrictionHypothesis_Name(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "name"
       });
    addAnnotation
      (getFrictionHypothesis_Description(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "description"
       });
    addAnnotation
      (getFrictionHypothesis_Terms(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "term"
       });
    addAnnotation
      (frictionTermEClass,
       source,
       new String[]
       {
         "name", "FrictionTerm",
         "kind", "elementOnly"
       });
    addAnnotation
      (getFrictionTerm_Id(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "id"
       });
    addAnnotation
      (getFrictionTerm_Kind(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "kind"
       });
    addAnnotation
      (getFrictionTerm_Value(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "value"
       });
    addAnnotation
      (getFrictionTerm_LowerBound(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "lowerBound"
       });
    addAnnotation
      (getFrictionTerm_UpperBound(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "upperBound"
       });
    addAnnotation
      (getFrictionTerm_Fixed(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "fixed"
       });
    addAnnotation
      (testSessionEClass,
       source,
       new String[]
       {
         "name", "TestSession",
         "kind", "elementOnly"
       });
    addAnnotation
      (getTestSession_Id(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "id"
       });
    addAnnotation
      (getTestSession_Name(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "name"
       });
    addAnnotation
      (getTestSession_RecordPath(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "recordPath"
       });
    addAnnotation
      (getTestSession_TimeColumnName(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "timeColumnName"
       });
    addAnnotation
      (getTestSession_TimeColumnNumber(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "timeColumnNumber"
       });
    addAnnotation
      (getTestSession_AngleColumnName(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "angleColumnName"
       });
    addAnnotation
      (getTestSession_AngleColumnNumber(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "angleColumnNumber"
       });
    addAnnotation
      (getTestSession_TimeUnit(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "timeUnit"
       });
    addAnnotation
      (getTestSession_AngleUnit(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "angleUnit"
       });
    addAnnotation
      (getTestSession_CountsPerRevolution(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "countsPerRevolution"
       });
    addAnnotation
      (getTestSession_Delimiter(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "delimiter"
       });
    addAnnotation
      (getTestSession_DecimalSeparator(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "decimalSeparator"
       });
    addAnnotation
      (getTestSession_ContentHash(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "contentHash"
       });
    addAnnotation
      (getTestSession_ReleaseAngle(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "releaseAngle"
       });
    addAnnotation
      (getTestSession_Notes(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "notes"
       });
    addAnnotation
      (fitResultEClass,
       source,
       new String[]
       {
         "name", "FitResult",
         "kind", "elementOnly"
       });
    addAnnotation
      (getFitResult_Id(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "id"
       });
    addAnnotation
      (getFitResult_Name(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "name"
       });
    addAnnotation
      (getFitResult_ComputedAt(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "computedAt"
       });
    addAnnotation
      (getFitResult_HypothesisId(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "hypothesisId"
       });
    addAnnotation
      (getFitResult_SessionIds(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "sessionId"
       });
    addAnnotation
      (getFitResult_TermIds(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "termId"
       });
    addAnnotation
      (getFitResult_Estimates(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "estimate"
       });
    addAnnotation
      (getFitResult_CorrelationParameters(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "correlationParameter"
       });
    addAnnotation
      (getFitResult_Correlations(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "correlation"
       });
    addAnnotation
      (getFitResult_CalculatedInertia(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "calculatedInertia"
       });
    addAnnotation
      (getFitResult_FittedInertia(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "fittedInertia"
       });
    addAnnotation
      (getFitResult_SessionFits(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "sessionFit"
       });
    addAnnotation
      (getFitResult_Comparisons(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "comparison"
       });
    addAnnotation
      (getFitResult_DominantLoss(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "dominantLoss"
       });
    addAnnotation
      (getFitResult_EnergyShares(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "energyShare"
       });
    addAnnotation
      (getFitResult_Settings(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "setting"
       });
    addAnnotation
      (estimateEClass,
       source,
       new String[]
       {
         "name", "Estimate",
         "kind", "elementOnly"
       });
    addAnnotation
      (getEstimate_Parameter(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "parameter"
       });
    addAnnotation
      (getEstimate_Value(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "value"
       });
    addAnnotation
      (getEstimate_StandardError(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "standardError"
       });
    addAnnotation
      (getEstimate_ResamplingError(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "resamplingError"
       });
    addAnnotation
      (sessionFitEClass,
       source,
       new String[]
       {
         "name", "SessionFit",
         "kind", "elementOnly"
       });
    addAnnotation
      (getSessionFit_SessionId(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "sessionId"
       });
    addAnnotation
      (getSessionFit_InitialAngle(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "initialAngle"
       });
    addAnnotation
      (getSessionFit_ReleaseTime(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "releaseTime"
       });
    addAnnotation
      (getSessionFit_AngleOffset(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "angleOffset"
       });
    addAnnotation
      (getSessionFit_RmsResidual(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "rmsResidual"
       });
    addAnnotation
      (termSetScoreEClass,
       source,
       new String[]
       {
         "name", "TermSetScore",
         "kind", "elementOnly"
       });
    addAnnotation
      (getTermSetScore_TermIds(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "termId"
       });
    addAnnotation
      (getTermSetScore_Aic(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "aic"
       });
    addAnnotation
      (getTermSetScore_Bic(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "bic"
       });
    addAnnotation
      (getTermSetScore_RmsResidual(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "rmsResidual"
       });
    addAnnotation
      (energyShareEClass,
       source,
       new String[]
       {
         "name", "EnergyShare",
         "kind", "elementOnly"
       });
    addAnnotation
      (getEnergyShare_TermId(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "termId"
       });
    addAnnotation
      (getEnergyShare_Share(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "share"
       });
    addAnnotation
      (settingEClass,
       source,
       new String[]
       {
         "name", "Setting",
         "kind", "elementOnly"
       });
    addAnnotation
      (getSetting_Key(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "key"
       });
    addAnnotation
      (getSetting_Value(),
       source,
       new String[]
       {
         "kind", "element",
         "name", "value"
       });
  }

} //PendulinePackageImpl
