/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.ecore.EFactory;

/**
 * <!-- begin-user-doc -->
 * The <b>Factory</b> for the model.
 * It provides a create method for each non-abstract class of the model.
 * <!-- end-user-doc -->
 * @see dev.penduline.model.PendulinePackage
 * @generated
 */
public interface PendulineFactory extends EFactory
{
  /**
   * The singleton instance of the factory.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  PendulineFactory eINSTANCE = dev.penduline.model.impl.PendulineFactoryImpl.init();

  /**
   * Returns a new object of class '<em>Mechanism</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Mechanism</em>'.
   * @generated
   */
  Mechanism createMechanism();

  /**
   * Returns a new object of class '<em>Part</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Part</em>'.
   * @generated
   */
  Part createPart();

  /**
   * Returns a new object of class '<em>Friction Hypothesis</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Friction Hypothesis</em>'.
   * @generated
   */
  FrictionHypothesis createFrictionHypothesis();

  /**
   * Returns a new object of class '<em>Friction Term</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Friction Term</em>'.
   * @generated
   */
  FrictionTerm createFrictionTerm();

  /**
   * Returns a new object of class '<em>Test Session</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Test Session</em>'.
   * @generated
   */
  TestSession createTestSession();

  /**
   * Returns a new object of class '<em>Fit Result</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Fit Result</em>'.
   * @generated
   */
  FitResult createFitResult();

  /**
   * Returns a new object of class '<em>Estimate</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Estimate</em>'.
   * @generated
   */
  Estimate createEstimate();

  /**
   * Returns a new object of class '<em>Session Fit</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Session Fit</em>'.
   * @generated
   */
  SessionFit createSessionFit();

  /**
   * Returns a new object of class '<em>Term Set Score</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Term Set Score</em>'.
   * @generated
   */
  TermSetScore createTermSetScore();

  /**
   * Returns a new object of class '<em>Energy Share</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Energy Share</em>'.
   * @generated
   */
  EnergyShare createEnergyShare();

  /**
   * Returns a new object of class '<em>Setting</em>'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return a new object of class '<em>Setting</em>'.
   * @generated
   */
  Setting createSetting();

  /**
   * Returns the package supported by this factory.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the package supported by this factory.
   * @generated
   */
  PendulinePackage getPendulinePackage();

} //PendulineFactory
