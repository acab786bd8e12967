/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.*;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EPackage;

import org.eclipse.emf.ecore.impl.EFactoryImpl;

import org.eclipse.emf.ecore.plugin.EcorePlugin;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Factory</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class PendulineFactoryImpl extends EFactoryImpl implements PendulineFactory
{
  /**
   * Creates the default factory implementation.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public static PendulineFactory init()
  {
    try
    {
      PendulineFactory thePendulineFactory = (PendulineFactory)EPackage.Registry.INSTANCE.getEFactory(PendulinePackage.eNS_URI);
      if (thePendulineFactory != null)
      {
        return thePendulineFactory;
      }
    }
    catch (Exception exception)
    {
      EcorePlugin.INSTANCE.log(exception);
    }
    return new PendulineFactoryImpl();
  }

  /**
   * Creates an instance of the factory.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public PendulineFactoryImpl()
  {
    super();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EObject create(EClass eClass)
  {
    switch (eClass.getClassifierID())
    {
      case PendulinePackage.MECHANISM: return createMechanism();
      case PendulinePackage.PART: return createPart();
      case PendulinePackage.FRICTION_HYPOTHESIS: return createFrictionHypothesis();
      case PendulinePackage.FRICTION_TERM: return createFrictionTerm();
      case PendulinePackage.TEST_SESSION: return createTestSession();
      case PendulinePackage.FIT_RESULT: return createFitResult();
      case PendulinePackage.ESTIMATE: return createEstimate();
      case PendulinePackage.SESSION_FIT: return createSessionFit();
      case PendulinePackage.TERM_SET_SCORE: return createTermSetScore();
      case PendulinePackage.ENERGY_SHARE: return createEnergyShare();
      case PendulinePackage.SETTING: return createSetting();
      default:
        throw new IllegalArgumentException("The class '" + eClass.getName() + "' is not a valid classifier");
    }
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public Object createFromString(EDataType eDataType, String initialValue)
  {
    switch (eDataType.getClassifierID())
    {
      case PendulinePackage.SHAPE_KIND:
        return createShapeKindFromString(eDataType, initialValue);
      case PendulinePackage.SHAPE_AXIS:
        return createShapeAxisFromString(eDataType, initialValue);
      case PendulinePackage.TENSOR_REFERENCE:
        return createTensorReferenceFromString(eDataType, initialValue);
      case PendulinePackage.FRICTION_KIND:
        return createFrictionKindFromString(eDataType, initialValue);
      case PendulinePackage.TIME_UNIT:
        return createTimeUnitFromString(eDataType, initialValue);
      case PendulinePackage.ANGLE_UNIT:
        return createAngleUnitFromString(eDataType, initialValue);
      case PendulinePackage.DELIMITER:
        return createDelimiterFromString(eDataType, initialValue);
      case PendulinePackage.DECIMAL_SEPARATOR:
        return createDecimalSeparatorFromString(eDataType, initialValue);
      default:
        throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier");
    }
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String convertToString(EDataType eDataType, Object instanceValue)
  {
    switch (eDataType.getClassifierID())
    {
      case PendulinePackage.SHAPE_KIND:
        return convertShapeKindToString(eDataType, instanceValue);
      case PendulinePackage.SHAPE_AXIS:
        return convertShapeAxisToString(eDataType, instanceValue);
      case PendulinePackage.TENSOR_REFERENCE:
        return convertTensorReferenceToString(eDataType, instanceValue);
      case PendulinePackage.FRICTION_KIND:
        return convertFrictionKindToString(eDataType, instanceValue);
      case PendulinePackage.TIME_UNIT:
        return convertTimeUnitToString(eDataType, instanceValue);
      case PendulinePackage.ANGLE_UNIT:
        return convertAngleUnitToString(eDataType, instanceValue);
      case PendulinePackage.DELIMITER:
        return convertDelimiterToString(eDataType, instanceValue);
      case PendulinePackage.DECIMAL_SEPARATOR:
        return convertDecimalSeparatorToString(eDataType, instanceValue);
      default:
        throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier");
    }
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public Mechanism createMechanism()
  {
    MechanismImpl mechanism = new MechanismImpl();
    return mechanism;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public Part createPart()
  {
    PartImpl part = new PartImpl();
    return part;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public FrictionHypothesis createFrictionHypothesis()
  {
    FrictionHypothesisImpl frictionHypothesis = new FrictionHypothesisImpl();
    return frictionHypothesis;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public FrictionTerm createFrictionTerm()
  {
    FrictionTermImpl frictionTerm = new FrictionTermImpl();
    return frictionTerm;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public TestSession createTestSession()
  {
    TestSessionImpl testSession = new TestSessionImpl();
    return testSession;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public FitResult createFitResult()
  {
    FitResultImpl fitResult = new FitResultImpl();
    return fitResult;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public Estimate createEstimate()
  {
    EstimateImpl estimate = new EstimateImpl();
    return estimate;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public SessionFit createSessionFit()
  {
    SessionFitImpl sessionFit = new SessionFitImpl();
    return sessionFit;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public TermSetScore createTermSetScore()
  {
    TermSetScoreImpl termSetScore = new TermSetScoreImpl();
    return termSetScore;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public EnergyShare createEnergyShare()
  {
    EnergyShareImpl energyShare = new EnergyShareImpl();
    return energyShare;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public Setting createSetting()
  {
    SettingImpl setting = new SettingImpl();
    return setting;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public ShapeKind createShapeKindFromString(EDataType eDataType, String initialValue)
  {
    ShapeKind result = ShapeKind.get(initialValue);
    if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
    return result;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public String convertShapeKindToString(EDataType eDataType, Object instanceValue)
  {
    return instanceValue == null ? null : instanceValue.toString();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public ShapeAxis createShapeAxisFromString(EDataType eDataType, String initialValue)
  {
    ShapeAxis result = ShapeAxis.get(initialValue);
    if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
    return result;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public String convertShapeAxisToString(EDataType eDataType, Object instanceValue)
  {
    return instanceValue == null ? null : instanceValue.toString();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public TensorReference createTensorReferenceFromString(EDataType eDataType, String initialValue)
  {
    TensorReference result = TensorReference.get(initialValue);
    if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
    return result;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public String convertTensorReferenceToString(EDataType eDataType, Object instanceValue)
  {
    return instanceValue == null ? null : instanceValue.toString();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public FrictionKind createFrictionKindFromString(EDataType eDataType, String initialValue)
  {
    FrictionKind result = FrictionKind.get(initialValue);
    if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
    return result;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public String convertFrictionKindToString(EDataType eDataType, Object instanceValue)
  {
    return instanceValue == null ? null : instanceValue.toString();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public TimeUnit createTimeUnitFromString(EDataType eDataType, String initialValue)
  {
    TimeUnit result = TimeUnit.get(initialValue);
    if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
    return result;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public String convertTimeUnitToString(EDataType eDataType, Object instanceValue)
  {
    return instanceValue == null ? null : instanceValue.toString();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public AngleUnit createAngleUnitFromString(EDataType eDataType, String initialValue)
  {
    AngleUnit result = AngleUnit.get(initialValue);
    if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
    return result;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public String convertAngleUnitToString(EDataType eDataType, Object instanceValue)
  {
    return instanceValue == null ? null : instanceValue.toString();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public Delimiter createDelimiterFromString(EDataType eDataType, String initialValue)
  {
    Delimiter result = Delimiter.get(initialValue);
    if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
    return result;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public String convertDelimiterToString(EDataType eDataType, Object instanceValue)
  {
    return instanceValue == null ? null : instanceValue.toString();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public DecimalSeparator createDecimalSeparatorFromString(EDataType eDataType, String initialValue)
  {
    DecimalSeparator result = DecimalSeparator.get(initialValue);
    if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
    return result;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public String convertDecimalSeparatorToString(EDataType eDataType, Object instanceValue)
  {
    return instanceValue == null ? null : instanceValue.toString();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public PendulinePackage getPendulinePackage()
  {
    return (PendulinePackage)getEPackage();
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @deprecated
   * @generated
   */
  @Deprecated
  public static PendulinePackage getPackage()
  {
    return PendulinePackage.eINSTANCE;
  }

} //PendulineFactoryImpl
