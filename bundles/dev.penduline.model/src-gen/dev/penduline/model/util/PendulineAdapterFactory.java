/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.util;

import dev.penduline.model.*;

import org.eclipse.emf.common.notify.Adapter;
import org.eclipse.emf.common.notify.Notifier;

import org.eclipse.emf.common.notify.impl.AdapterFactoryImpl;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * The <b>Adapter Factory</b> for the model.
 * It provides an adapter <code>createXXX</code> method for each class of the model.
 * <!-- end-user-doc -->
 * @see dev.penduline.model.PendulinePackage
 * @generated
 */
public class PendulineAdapterFactory extends AdapterFactoryImpl
{
  /**
   * The cached model package.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected static PendulinePackage modelPackage;

  /**
   * Creates an instance of the adapter factory.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  public PendulineAdapterFactory()
  {
    if (modelPackage == null)
    {
      modelPackage = PendulinePackage.eINSTANCE;
    }
  }

  /**
   * Returns whether this factory is applicable for the type of the object.
   * <!-- begin-user-doc -->
   * This implementation returns <code>true</code> if the object is either the model's package or is an instance object of the model.
   * <!-- end-user-doc -->
   * @return whether this factory is applicable for the type of the object.
   * @generated
   */
  @Override
  public boolean isFactoryForType(Object object)
  {
    if (object == modelPackage)
    {
      return true;
    }
    if (object instanceof EObject)
    {
      return ((EObject)object).eClass().getEPackage() == modelPackage;
    }
    return false;
  }

  /**
   * The switch that delegates to the <code>createXXX</code> methods.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected PendulineSwitch<Adapter> modelSwitch =
    new PendulineSwitch<Adapter>()
    {
      @Override
      public Adapter caseMechanism(Mechanism object)
      {
        return createMechanismAdapter();
      }
      @Override
      public Adapter casePart(Part object)
      {
        return createPartAdapter();
      }
      @Override
      public Adapter caseFrictionHypothesis(FrictionHypothesis object)
      {
        return createFrictionHypothesisAdapter();
      }
      @Override
      public Adapter caseFrictionTerm(FrictionTerm object)
      {
        return createFrictionTermAdapter();
      }
      @Override
      public Adapter caseTestSession(TestSession object)
      {
        return createTestSessionAdapter();
      }
      @Override
      public Adapter caseFitResult(FitResult object)
      {
        return createFitResultAdapter();
      }
      @Override
      public Adapter caseEstimate(Estimate object)
      {
        return createEstimateAdapter();
      }
      @Override
      public Adapter caseSessionFit(SessionFit object)
      {
        return createSessionFitAdapter();
      }
      @Override
      public Adapter caseTermSetScore(TermSetScore object)
      {
        return createTermSetScoreAdapter();
      }
      @Override
      public Adapter caseEnergyShare(EnergyShare object)
      {
        return createEnergyShareAdapter();
      }
      @Override
      public Adapter caseSetting(Setting object)
      {
        return createSettingAdapter();
      }
      @Override
      public Adapter defaultCase(EObject object)
      {
        return createEObjectAdapter();
      }
    };

  /**
   * Creates an adapter for the <code>target</code>.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @param target the object to adapt.
   * @return the adapter for the <code>target</code>.
   * @generated
   */
  @Override
  public Adapter createAdapter(Notifier target)
  {
    return modelSwitch.doSwitch((EObject)target);
  }


  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.Mechanism <em>Mechanism</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.Mechanism
   * @generated
   */
  public Adapter createMechanismAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.Part <em>Part</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.Part
   * @generated
   */
  public Adapter createPartAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.FrictionHypothesis <em>Friction Hypothesis</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.FrictionHypothesis
   * @generated
   */
  public Adapter createFrictionHypothesisAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.FrictionTerm <em>Friction Term</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.FrictionTerm
   * @generated
   */
  public Adapter createFrictionTermAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.TestSession <em>Test Session</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.TestSession
   * @generated
   */
  public Adapter createTestSessionAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.FitResult <em>Fit Result</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.FitResult
   * @generated
   */
  public Adapter createFitResultAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.Estimate <em>Estimate</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.Estimate
   * @generated
   */
  public Adapter createEstimateAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.SessionFit <em>Session Fit</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.SessionFit
   * @generated
   */
  public Adapter createSessionFitAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.TermSetScore <em>Term Set Score</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.TermSetScore
   * @generated
   */
  public Adapter createTermSetScoreAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.EnergyShare <em>Energy Share</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.EnergyShare
   * @generated
   */
  public Adapter createEnergyShareAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for an object of class '{@link dev.penduline.model.Setting <em>Setting</em>}'.
   * <!-- begin-user-doc -->
   * This default implementation returns null so that we can easily ignore cases;
   * it's useful to ignore a case when inheritance will catch all the cases anyway.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @see dev.penduline.model.Setting
   * @generated
   */
  public Adapter createSettingAdapter()
  {
    return null;
  }

  /**
   * Creates a new adapter for the default case.
   * <!-- begin-user-doc -->
   * This default implementation returns null.
   * <!-- end-user-doc -->
   * @return the new adapter.
   * @generated
   */
  public Adapter createEObjectAdapter()
  {
    return null;
  }

} //PendulineAdapterFactory
