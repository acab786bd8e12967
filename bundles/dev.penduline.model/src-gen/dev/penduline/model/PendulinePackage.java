/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;

/**
 * <!-- begin-user-doc -->
 * The <b>Package</b> for the model.
 * It contains accessors for the meta objects to represent
 * <ul>
 *   <li>each class,</li>
 *   <li>each feature of each class,</li>
 *   <li>each operation of each class,</li>
 *   <li>each enum,</li>
 *   <li>and each data type</li>
 * </ul>
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The mechanism file of Penduline: one pivoted mechanism (its parts, pivot axis and gravity), the friction hypotheses to test, the swing-test sessions that point at raw record files (never copying them), and the stored results of friction fits. Units are SI throughout (kg, m, s, rad, N, N·m); conversion happens only at import and display. Every value is saved as its own XML element so that one changed value is one changed line in a diff.
 * <!-- end-model-doc -->
 * @see dev.penduline.model.PendulineFactory
 * @model kind="package"
 * @generated
 */
public interface PendulinePackage extends EPackage
{
  /**
   * The package name.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  String eNAME = "model";

  /**
   * The package namespace URI.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  String eNS_URI = "urn:dev.penduline:mechanism:1";

  /**
   * The package namespace name.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  String eNS_PREFIX = "penduline";

  /**
   * The singleton instance of the package.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  PendulinePackage eINSTANCE = dev.penduline.model.impl.PendulinePackageImpl.init();

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.MechanismImpl <em>Mechanism</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.MechanismImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getMechanism()
   * @generated
   */
  int MECHANISM = 0;

  /**
   * The feature id for the '<em><b>Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__NAME = 0;

  /**
   * The feature id for the '<em><b>Description</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__DESCRIPTION = 1;

  /**
   * The feature id for the '<em><b>Gravity</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__GRAVITY = 2;

  /**
   * The feature id for the '<em><b>Axis Point X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__AXIS_POINT_X = 3;

  /**
   * The feature id for the '<em><b>Axis Point Y</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__AXIS_POINT_Y = 4;

  /**
   * The feature id for the '<em><b>Axis Point Z</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__AXIS_POINT_Z = 5;

  /**
   * The feature id for the '<em><b>Axis Direction X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__AXIS_DIRECTION_X = 6;

  /**
   * The feature id for the '<em><b>Axis Direction Y</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__AXIS_DIRECTION_Y = 7;

  /**
   * The feature id for the '<em><b>Axis Direction Z</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__AXIS_DIRECTION_Z = 8;

  /**
   * The feature id for the '<em><b>Gravity Direction X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__GRAVITY_DIRECTION_X = 9;

  /**
   * The feature id for the '<em><b>Gravity Direction Y</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__GRAVITY_DIRECTION_Y = 10;

  /**
   * The feature id for the '<em><b>Gravity Direction Z</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__GRAVITY_DIRECTION_Z = 11;

  /**
   * The feature id for the '<em><b>Axis Tilt</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__AXIS_TILT = 12;

  /**
   * The feature id for the '<em><b>Parts</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__PARTS = 13;

  /**
   * The feature id for the '<em><b>Friction Hypotheses</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__FRICTION_HYPOTHESES = 14;

  /**
   * The feature id for the '<em><b>Sessions</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__SESSIONS = 15;

  /**
   * The feature id for the '<em><b>Fit Results</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM__FIT_RESULTS = 16;

  /**
   * The number of structural features of the '<em>Mechanism</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM_FEATURE_COUNT = 17;

  /**
   * The number of operations of the '<em>Mechanism</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int MECHANISM_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.PartImpl <em>Part</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.PartImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getPart()
   * @generated
   */
  int PART = 1;

  /**
   * The feature id for the '<em><b>Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__ID = 0;

  /**
   * The feature id for the '<em><b>Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__NAME = 1;

  /**
   * The feature id for the '<em><b>Shape</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__SHAPE = 2;

  /**
   * The feature id for the '<em><b>Shape Axis</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__SHAPE_AXIS = 3;

  /**
   * The feature id for the '<em><b>Length</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__LENGTH = 4;

  /**
   * The feature id for the '<em><b>Width</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__WIDTH = 5;

  /**
   * The feature id for the '<em><b>Height</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__HEIGHT = 6;

  /**
   * The feature id for the '<em><b>Radius</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__RADIUS = 7;

  /**
   * The feature id for the '<em><b>Inner Radius</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__INNER_RADIUS = 8;

  /**
   * The feature id for the '<em><b>Mass</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__MASS = 9;

  /**
   * The feature id for the '<em><b>Density</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__DENSITY = 10;

  /**
   * The feature id for the '<em><b>Centroid X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__CENTROID_X = 11;

  /**
   * The feature id for the '<em><b>Centroid Y</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__CENTROID_Y = 12;

  /**
   * The feature id for the '<em><b>Centroid Z</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__CENTROID_Z = 13;

  /**
   * The feature id for the '<em><b>Rotation X</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__ROTATION_X = 14;

  /**
   * The feature id for the '<em><b>Rotation Y</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__ROTATION_Y = 15;

  /**
   * The feature id for the '<em><b>Rotation Z</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__ROTATION_Z = 16;

  /**
   * The feature id for the '<em><b>Cutout</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__CUTOUT = 17;

  /**
   * The feature id for the '<em><b>Quantity</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__QUANTITY = 18;

  /**
   * The feature id for the '<em><b>Mass Tolerance</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__MASS_TOLERANCE = 19;

  /**
   * The feature id for the '<em><b>Dimension Tolerance</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__DIMENSION_TOLERANCE = 20;

  /**
   * The feature id for the '<em><b>Ixx</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__IXX = 21;

  /**
   * The feature id for the '<em><b>Iyy</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__IYY = 22;

  /**
   * The feature id for the '<em><b>Izz</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__IZZ = 23;

  /**
   * The feature id for the '<em><b>Ixy</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__IXY = 24;

  /**
   * The feature id for the '<em><b>Ixz</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__IXZ = 25;

  /**
   * The feature id for the '<em><b>Iyz</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__IYZ = 26;

  /**
   * The feature id for the '<em><b>Tensor Reference</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART__TENSOR_REFERENCE = 27;

  /**
   * The number of structural features of the '<em>Part</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART_FEATURE_COUNT = 28;

  /**
   * The number of operations of the '<em>Part</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int PART_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.FrictionHypothesisImpl <em>Friction Hypothesis</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.FrictionHypothesisImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getFrictionHypothesis()
   * @generated
   */
  int FRICTION_HYPOTHESIS = 2;

  /**
   * The feature id for the '<em><b>Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_HYPOTHESIS__ID = 0;

  /**
   * The feature id for the '<em><b>Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_HYPOTHESIS__NAME = 1;

  /**
   * The feature id for the '<em><b>Description</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_HYPOTHESIS__DESCRIPTION = 2;

  /**
   * The feature id for the '<em><b>Terms</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_HYPOTHESIS__TERMS = 3;

  /**
   * The number of structural features of the '<em>Friction Hypothesis</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_HYPOTHESIS_FEATURE_COUNT = 4;

  /**
   * The number of operations of the '<em>Friction Hypothesis</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_HYPOTHESIS_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.FrictionTermImpl <em>Friction Term</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.FrictionTermImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getFrictionTerm()
   * @generated
   */
  int FRICTION_TERM = 3;

  /**
   * The feature id for the '<em><b>Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_TERM__ID = 0;

  /**
   * The feature id for the '<em><b>Kind</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_TERM__KIND = 1;

  /**
   * The feature id for the '<em><b>Value</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_TERM__VALUE = 2;

  /**
   * The feature id for the '<em><b>Lower Bound</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_TERM__LOWER_BOUND = 3;

  /**
   * The feature id for the '<em><b>Upper Bound</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_TERM__UPPER_BOUND = 4;

  /**
   * The feature id for the '<em><b>Fixed</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_TERM__FIXED = 5;

  /**
   * The number of structural features of the '<em>Friction Term</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_TERM_FEATURE_COUNT = 6;

  /**
   * The number of operations of the '<em>Friction Term</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FRICTION_TERM_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.TestSessionImpl <em>Test Session</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.TestSessionImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getTestSession()
   * @generated
   */
  int TEST_SESSION = 4;

  /**
   * The feature id for the '<em><b>Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__ID = 0;

  /**
   * The feature id for the '<em><b>Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__NAME = 1;

  /**
   * The feature id for the '<em><b>Record Path</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__RECORD_PATH = 2;

  /**
   * The feature id for the '<em><b>Time Column Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__TIME_COLUMN_NAME = 3;

  /**
   * The feature id for the '<em><b>Time Column Number</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__TIME_COLUMN_NUMBER = 4;

  /**
   * The feature id for the '<em><b>Angle Column Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__ANGLE_COLUMN_NAME = 5;

  /**
   * The feature id for the '<em><b>Angle Column Number</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__ANGLE_COLUMN_NUMBER = 6;

  /**
   * The feature id for the '<em><b>Time Unit</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__TIME_UNIT = 7;

  /**
   * The feature id for the '<em><b>Angle Unit</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__ANGLE_UNIT = 8;

  /**
   * The feature id for the '<em><b>Counts Per Revolution</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__COUNTS_PER_REVOLUTION = 9;

  /**
   * The feature id for the '<em><b>Delimiter</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__DELIMITER = 10;

  /**
   * The feature id for the '<em><b>Decimal Separator</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__DECIMAL_SEPARATOR = 11;

  /**
   * The feature id for the '<em><b>Content Hash</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__CONTENT_HASH = 12;

  /**
   * The feature id for the '<em><b>Release Angle</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__RELEASE_ANGLE = 13;

  /**
   * The feature id for the '<em><b>Notes</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION__NOTES = 14;

  /**
   * The number of structural features of the '<em>Test Session</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION_FEATURE_COUNT = 15;

  /**
   * The number of operations of the '<em>Test Session</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TEST_SESSION_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.FitResultImpl <em>Fit Result</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.FitResultImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getFitResult()
   * @generated
   */
  int FIT_RESULT = 5;

  /**
   * The feature id for the '<em><b>Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__ID = 0;

  /**
   * The feature id for the '<em><b>Name</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__NAME = 1;

  /**
   * The feature id for the '<em><b>Computed At</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__COMPUTED_AT = 2;

  /**
   * The feature id for the '<em><b>Hypothesis Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__HYPOTHESIS_ID = 3;

  /**
   * The feature id for the '<em><b>Session Ids</b></em>' attribute list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__SESSION_IDS = 4;

  /**
   * The feature id for the '<em><b>Term Ids</b></em>' attribute list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__TERM_IDS = 5;

  /**
   * The feature id for the '<em><b>Estimates</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__ESTIMATES = 6;

  /**
   * The feature id for the '<em><b>Correlation Parameters</b></em>' attribute list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__CORRELATION_PARAMETERS = 7;

  /**
   * The feature id for the '<em><b>Correlations</b></em>' attribute list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__CORRELATIONS = 8;

  /**
   * The feature id for the '<em><b>Calculated Inertia</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__CALCULATED_INERTIA = 9;

  /**
   * The feature id for the '<em><b>Fitted Inertia</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__FITTED_INERTIA = 10;

  /**
   * The feature id for the '<em><b>Session Fits</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__SESSION_FITS = 11;

  /**
   * The feature id for the '<em><b>Comparisons</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__COMPARISONS = 12;

  /**
   * The feature id for the '<em><b>Dominant Loss</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__DOMINANT_LOSS = 13;

  /**
   * The feature id for the '<em><b>Energy Shares</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__ENERGY_SHARES = 14;

  /**
   * The feature id for the '<em><b>Settings</b></em>' containment reference list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT__SETTINGS = 15;

  /**
   * The number of structural features of the '<em>Fit Result</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT_FEATURE_COUNT = 16;

  /**
   * The number of operations of the '<em>Fit Result</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int FIT_RESULT_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.EstimateImpl <em>Estimate</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.EstimateImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getEstimate()
   * @generated
   */
  int ESTIMATE = 6;

  /**
   * The feature id for the '<em><b>Parameter</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ESTIMATE__PARAMETER = 0;

  /**
   * The feature id for the '<em><b>Value</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ESTIMATE__VALUE = 1;

  /**
   * The feature id for the '<em><b>Standard Error</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ESTIMATE__STANDARD_ERROR = 2;

  /**
   * The feature id for the '<em><b>Resampling Error</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ESTIMATE__RESAMPLING_ERROR = 3;

  /**
   * The number of structural features of the '<em>Estimate</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ESTIMATE_FEATURE_COUNT = 4;

  /**
   * The number of operations of the '<em>Estimate</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ESTIMATE_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.SessionFitImpl <em>Session Fit</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.SessionFitImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getSessionFit()
   * @generated
   */
  int SESSION_FIT = 7;

  /**
   * The feature id for the '<em><b>Session Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SESSION_FIT__SESSION_ID = 0;

  /**
   * The feature id for the '<em><b>Initial Angle</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SESSION_FIT__INITIAL_ANGLE = 1;

  /**
   * The feature id for the '<em><b>Release Time</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SESSION_FIT__RELEASE_TIME = 2;

  /**
   * The feature id for the '<em><b>Angle Offset</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SESSION_FIT__ANGLE_OFFSET = 3;

  /**
   * The feature id for the '<em><b>Rms Residual</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SESSION_FIT__RMS_RESIDUAL = 4;

  /**
   * The number of structural features of the '<em>Session Fit</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SESSION_FIT_FEATURE_COUNT = 5;

  /**
   * The number of operations of the '<em>Session Fit</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SESSION_FIT_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.TermSetScoreImpl <em>Term Set Score</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.TermSetScoreImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getTermSetScore()
   * @generated
   */
  int TERM_SET_SCORE = 8;

  /**
   * The feature id for the '<em><b>Term Ids</b></em>' attribute list.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TERM_SET_SCORE__TERM_IDS = 0;

  /**
   * The feature id for the '<em><b>Aic</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TERM_SET_SCORE__AIC = 1;

  /**
   * The feature id for the '<em><b>Bic</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TERM_SET_SCORE__BIC = 2;

  /**
   * The feature id for the '<em><b>Rms Residual</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TERM_SET_SCORE__RMS_RESIDUAL = 3;

  /**
   * The number of structural features of the '<em>Term Set Score</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TERM_SET_SCORE_FEATURE_COUNT = 4;

  /**
   * The number of operations of the '<em>Term Set Score</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int TERM_SET_SCORE_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.EnergyShareImpl <em>Energy Share</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.EnergyShareImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getEnergyShare()
   * @generated
   */
  int ENERGY_SHARE = 9;

  /**
   * The feature id for the '<em><b>Term Id</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ENERGY_SHARE__TERM_ID = 0;

  /**
   * The feature id for the '<em><b>Share</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ENERGY_SHARE__SHARE = 1;

  /**
   * The number of structural features of the '<em>Energy Share</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ENERGY_SHARE_FEATURE_COUNT = 2;

  /**
   * The number of operations of the '<em>Energy Share</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int ENERGY_SHARE_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.impl.SettingImpl <em>Setting</em>}' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.impl.SettingImpl
   * @see dev.penduline.model.impl.PendulinePackageImpl#getSetting()
   * @generated
   */
  int SETTING = 10;

  /**
   * The feature id for the '<em><b>Key</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SETTING__KEY = 0;

  /**
   * The feature id for the '<em><b>Value</b></em>' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SETTING__VALUE = 1;

  /**
   * The number of structural features of the '<em>Setting</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SETTING_FEATURE_COUNT = 2;

  /**
   * The number of operations of the '<em>Setting</em>' class.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  int SETTING_OPERATION_COUNT = 0;

  /**
   * The meta object id for the '{@link dev.penduline.model.ShapeKind <em>Shape Kind</em>}' enum.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.ShapeKind
   * @see dev.penduline.model.impl.PendulinePackageImpl#getShapeKind()
   * @generated
   */
  int SHAPE_KIND = 11;

  /**
   * The meta object id for the '{@link dev.penduline.model.ShapeAxis <em>Shape Axis</em>}' enum.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.ShapeAxis
   * @see dev.penduline.model.impl.PendulinePackageImpl#getShapeAxis()
   * @generated
   */
  int SHAPE_AXIS = 12;

  /**
   * The meta object id for the '{@link dev.penduline.model.TensorReference <em>Tensor Reference</em>}' enum.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.TensorReference
   * @see dev.penduline.model.impl.PendulinePackageImpl#getTensorReference()
   * @generated
   */
  int TENSOR_REFERENCE = 13;

  /**
   * The meta object id for the '{@link dev.penduline.model.FrictionKind <em>Friction Kind</em>}' enum.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.FrictionKind
   * @see dev.penduline.model.impl.PendulinePackageImpl#getFrictionKind()
   * @generated
   */
  int FRICTION_KIND = 14;

  /**
   * The meta object id for the '{@link dev.penduline.model.TimeUnit <em>Time Unit</em>}' enum.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.TimeUnit
   * @see dev.penduline.model.impl.PendulinePackageImpl#getTimeUnit()
   * @generated
   */
  int TIME_UNIT = 15;

  /**
   * The meta object id for the '{@link dev.penduline.model.AngleUnit <em>Angle Unit</em>}' enum.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.AngleUnit
   * @see dev.penduline.model.impl.PendulinePackageImpl#getAngleUnit()
   * @generated
   */
  int ANGLE_UNIT = 16;

  /**
   * The meta object id for the '{@link dev.penduline.model.Delimiter <em>Delimiter</em>}' enum.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.Delimiter
   * @see dev.penduline.model.impl.PendulinePackageImpl#getDelimiter()
   * @generated
   */
  int DELIMITER = 17;

  /**
   * The meta object id for the '{@link dev.penduline.model.DecimalSeparator <em>Decimal Separator</em>}' enum.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see dev.penduline.model.DecimalSeparator
   * @see dev.penduline.model.impl.PendulinePackageImpl#getDecimalSeparator()
   * @generated
   */
  int DECIMAL_SEPARATOR = 18;


  /**
   * Returns the meta object for class '{@link dev.penduline.model.Mechanism <em>Mechanism</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Mechanism</em>'.
   * @see dev.penduline.model.Mechanism
   * @generated
   */
  EClass getMechanism();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getName <em>Name</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Name</em>'.
   * @see dev.penduline.model.Mechanism#getName()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_Name();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getDescription <em>Description</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Description</em>'.
   * @see dev.penduline.model.Mechanism#getDescription()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_Description();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getGravity <em>Gravity</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Gravity</em>'.
   * @see dev.penduline.model.Mechanism#getGravity()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_Gravity();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getAxisPointX <em>Axis Point X</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Axis Point X</em>'.
   * @see dev.penduline.model.Mechanism#getAxisPointX()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_AxisPointX();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getAxisPointY <em>Axis Point Y</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Axis Point Y</em>'.
   * @see dev.penduline.model.Mechanism#getAxisPointY()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_AxisPointY();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getAxisPointZ <em>Axis Point Z</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Axis Point Z</em>'.
   * @see dev.penduline.model.Mechanism#getAxisPointZ()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_AxisPointZ();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getAxisDirectionX <em>Axis Direction X</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Axis Direction X</em>'.
   * @see dev.penduline.model.Mechanism#getAxisDirectionX()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_AxisDirectionX();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getAxisDirectionY <em>Axis Direction Y</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Axis Direction Y</em>'.
   * @see dev.penduline.model.Mechanism#getAxisDirectionY()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_AxisDirectionY();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getAxisDirectionZ <em>Axis Direction Z</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Axis Direction Z</em>'.
   * @see dev.penduline.model.Mechanism#getAxisDirectionZ()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_AxisDirectionZ();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getGravityDirectionX <em>Gravity Direction X</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Gravity Direction X</em>'.
   * @see dev.penduline.model.Mechanism#getGravityDirectionX()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_GravityDirectionX();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getGravityDirectionY <em>Gravity Direction Y</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Gravity Direction Y</em>'.
   * @see dev.penduline.model.Mechanism#getGravityDirectionY()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_GravityDirectionY();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getGravityDirectionZ <em>Gravity Direction Z</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Gravity Direction Z</em>'.
   * @see dev.penduline.model.Mechanism#getGravityDirectionZ()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_GravityDirectionZ();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Mechanism#getAxisTilt <em>Axis Tilt</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Axis Tilt</em>'.
   * @see dev.penduline.model.Mechanism#getAxisTilt()
   * @see #getMechanism()
   * @generated
   */
  EAttribute getMechanism_AxisTilt();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.Mechanism#getParts <em>Parts</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Parts</em>'.
   * @see dev.penduline.model.Mechanism#getParts()
   * @see #getMechanism()
   * @generated
   */
  EReference getMechanism_Parts();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.Mechanism#getFrictionHypotheses <em>Friction Hypotheses</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Friction Hypotheses</em>'.
   * @see dev.penduline.model.Mechanism#getFrictionHypotheses()
   * @see #getMechanism()
   * @generated
   */
  EReference getMechanism_FrictionHypotheses();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.Mechanism#getSessions <em>Sessions</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Sessions</em>'.
   * @see dev.penduline.model.Mechanism#getSessions()
   * @see #getMechanism()
   * @generated
   */
  EReference getMechanism_Sessions();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.Mechanism#getFitResults <em>Fit Results</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Fit Results</em>'.
   * @see dev.penduline.model.Mechanism#getFitResults()
   * @see #getMechanism()
   * @generated
   */
  EReference getMechanism_FitResults();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.Part <em>Part</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Part</em>'.
   * @see dev.penduline.model.Part
   * @generated
   */
  EClass getPart();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getId <em>Id</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Id</em>'.
   * @see dev.penduline.model.Part#getId()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Id();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getName <em>Name</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Name</em>'.
   * @see dev.penduline.model.Part#getName()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Name();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getShape <em>Shape</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Shape</em>'.
   * @see dev.penduline.model.Part#getShape()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Shape();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getShapeAxis <em>Shape Axis</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Shape Axis</em>'.
   * @see dev.penduline.model.Part#getShapeAxis()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_ShapeAxis();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getLength <em>Length</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Length</em>'.
   * @see dev.penduline.model.Part#getLength()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Length();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getWidth <em>Width</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Width</em>'.
   * @see dev.penduline.model.Part#getWidth()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Width();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getHeight <em>Height</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Height</em>'.
   * @see dev.penduline.model.Part#getHeight()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Height();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getRadius <em>Radius</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Radius</em>'.
   * @see dev.penduline.model.Part#getRadius()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Radius();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getInnerRadius <em>Inner Radius</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Inner Radius</em>'.
   * @see dev.penduline.model.Part#getInnerRadius()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_InnerRadius();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getMass <em>Mass</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Mass</em>'.
   * @see dev.penduline.model.Part#getMass()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Mass();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getDensity <em>Density</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Density</em>'.
   * @see dev.penduline.model.Part#getDensity()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Density();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getCentroidX <em>Centroid X</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Centroid X</em>'.
   * @see dev.penduline.model.Part#getCentroidX()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_CentroidX();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getCentroidY <em>Centroid Y</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Centroid Y</em>'.
   * @see dev.penduline.model.Part#getCentroidY()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_CentroidY();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getCentroidZ <em>Centroid Z</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Centroid Z</em>'.
   * @see dev.penduline.model.Part#getCentroidZ()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_CentroidZ();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getRotationX <em>Rotation X</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Rotation X</em>'.
   * @see dev.penduline.model.Part#getRotationX()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_RotationX();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getRotationY <em>Rotation Y</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Rotation Y</em>'.
   * @see dev.penduline.model.Part#getRotationY()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_RotationY();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getRotationZ <em>Rotation Z</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Rotation Z</em>'.
   * @see dev.penduline.model.Part#getRotationZ()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_RotationZ();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#isCutout <em>Cutout</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Cutout</em>'.
   * @see dev.penduline.model.Part#isCutout()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Cutout();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getQuantity <em>Quantity</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Quantity</em>'.
   * @see dev.penduline.model.Part#getQuantity()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Quantity();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getMassTolerance <em>Mass Tolerance</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Mass Tolerance</em>'.
   * @see dev.penduline.model.Part#getMassTolerance()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_MassTolerance();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getDimensionTolerance <em>Dimension Tolerance</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Dimension Tolerance</em>'.
   * @see dev.penduline.model.Part#getDimensionTolerance()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_DimensionTolerance();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getIxx <em>Ixx</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Ixx</em>'.
   * @see dev.penduline.model.Part#getIxx()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Ixx();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getIyy <em>Iyy</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Iyy</em>'.
   * @see dev.penduline.model.Part#getIyy()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Iyy();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getIzz <em>Izz</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Izz</em>'.
   * @see dev.penduline.model.Part#getIzz()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Izz();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getIxy <em>Ixy</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Ixy</em>'.
   * @see dev.penduline.model.Part#getIxy()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Ixy();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getIxz <em>Ixz</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Ixz</em>'.
   * @see dev.penduline.model.Part#getIxz()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Ixz();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getIyz <em>Iyz</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Iyz</em>'.
   * @see dev.penduline.model.Part#getIyz()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_Iyz();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Part#getTensorReference <em>Tensor Reference</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Tensor Reference</em>'.
   * @see dev.penduline.model.Part#getTensorReference()
   * @see #getPart()
   * @generated
   */
  EAttribute getPart_TensorReference();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.FrictionHypothesis <em>Friction Hypothesis</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Friction Hypothesis</em>'.
   * @see dev.penduline.model.FrictionHypothesis
   * @generated
   */
  EClass getFrictionHypothesis();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FrictionHypothesis#getId <em>Id</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Id</em>'.
   * @see dev.penduline.model.FrictionHypothesis#getId()
   * @see #getFrictionHypothesis()
   * @generated
   */
  EAttribute getFrictionHypothesis_Id();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FrictionHypothesis#getName <em>Name</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Name</em>'.
   * @see dev.penduline.model.FrictionHypothesis#getName()
   * @see #getFrictionHypothesis()
   * @generated
   */
  EAttribute getFrictionHypothesis_Name();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FrictionHypothesis#getDescription <em>Description</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Description</em>'.
   * @see dev.penduline.model.FrictionHypothesis#getDescription()
   * @see #getFrictionHypothesis()
   * @generated
   */
  EAttribute getFrictionHypothesis_Description();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.FrictionHypothesis#getTerms <em>Terms</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Terms</em>'.
   * @see dev.penduline.model.FrictionHypothesis#getTerms()
   * @see #getFrictionHypothesis()
   * @generated
   */
  EReference getFrictionHypothesis_Terms();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.FrictionTerm <em>Friction Term</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Friction Term</em>'.
   * @see dev.penduline.model.FrictionTerm
   * @generated
   */
  EClass getFrictionTerm();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FrictionTerm#getId <em>Id</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Id</em>'.
   * @see dev.penduline.model.FrictionTerm#getId()
   * @see #getFrictionTerm()
   * @generated
   */
  EAttribute getFrictionTerm_Id();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FrictionTerm#getKind <em>Kind</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Kind</em>'.
   * @see dev.penduline.model.FrictionTerm#getKind()
   * @see #getFrictionTerm()
   * @generated
   */
  EAttribute getFrictionTerm_Kind();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FrictionTerm#getValue <em>Value</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Value</em>'.
   * @see dev.penduline.model.FrictionTerm#getValue()
   * @see #getFrictionTerm()
   * @generated
   */
  EAttribute getFrictionTerm_Value();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FrictionTerm#getLowerBound <em>Lower Bound</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Lower Bound</em>'.
   * @see dev.penduline.model.FrictionTerm#getLowerBound()
   * @see #getFrictionTerm()
   * @generated
   */
  EAttribute getFrictionTerm_LowerBound();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FrictionTerm#getUpperBound <em>Upper Bound</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Upper Bound</em>'.
   * @see dev.penduline.model.FrictionTerm#getUpperBound()
   * @see #getFrictionTerm()
   * @generated
   */
  EAttribute getFrictionTerm_UpperBound();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FrictionTerm#isFixed <em>Fixed</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Fixed</em>'.
   * @see dev.penduline.model.FrictionTerm#isFixed()
   * @see #getFrictionTerm()
   * @generated
   */
  EAttribute getFrictionTerm_Fixed();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.TestSession <em>Test Session</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Test Session</em>'.
   * @see dev.penduline.model.TestSession
   * @generated
   */
  EClass getTestSession();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getId <em>Id</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Id</em>'.
   * @see dev.penduline.model.TestSession#getId()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_Id();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getName <em>Name</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Name</em>'.
   * @see dev.penduline.model.TestSession#getName()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_Name();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getRecordPath <em>Record Path</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Record Path</em>'.
   * @see dev.penduline.model.TestSession#getRecordPath()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_RecordPath();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getTimeColumnName <em>Time Column Name</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Time Column Name</em>'.
   * @see dev.penduline.model.TestSession#getTimeColumnName()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_TimeColumnName();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getTimeColumnNumber <em>Time Column Number</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Time Column Number</em>'.
   * @see dev.penduline.model.TestSession#getTimeColumnNumber()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_TimeColumnNumber();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getAngleColumnName <em>Angle Column Name</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Angle Column Name</em>'.
   * @see dev.penduline.model.TestSession#getAngleColumnName()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_AngleColumnName();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getAngleColumnNumber <em>Angle Column Number</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Angle Column Number</em>'.
   * @see dev.penduline.model.TestSession#getAngleColumnNumber()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_AngleColumnNumber();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getTimeUnit <em>Time Unit</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Time Unit</em>'.
   * @see dev.penduline.model.TestSession#getTimeUnit()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_TimeUnit();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getAngleUnit <em>Angle Unit</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Angle Unit</em>'.
   * @see dev.penduline.model.TestSession#getAngleUnit()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_AngleUnit();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getCountsPerRevolution <em>Counts Per Revolution</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Counts Per Revolution</em>'.
   * @see dev.penduline.model.TestSession#getCountsPerRevolution()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_CountsPerRevolution();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getDelimiter <em>Delimiter</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Delimiter</em>'.
   * @see dev.penduline.model.TestSession#getDelimiter()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_Delimiter();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getDecimalSeparator <em>Decimal Separator</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Decimal Separator</em>'.
   * @see dev.penduline.model.TestSession#getDecimalSeparator()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_DecimalSeparator();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getContentHash <em>Content Hash</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Content Hash</em>'.
   * @see dev.penduline.model.TestSession#getContentHash()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_ContentHash();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getReleaseAngle <em>Release Angle</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Release Angle</em>'.
   * @see dev.penduline.model.TestSession#getReleaseAngle()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_ReleaseAngle();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TestSession#getNotes <em>Notes</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Notes</em>'.
   * @see dev.penduline.model.TestSession#getNotes()
   * @see #getTestSession()
   * @generated
   */
  EAttribute getTestSession_Notes();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.FitResult <em>Fit Result</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Fit Result</em>'.
   * @see dev.penduline.model.FitResult
   * @generated
   */
  EClass getFitResult();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FitResult#getId <em>Id</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Id</em>'.
   * @see dev.penduline.model.FitResult#getId()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_Id();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FitResult#getName <em>Name</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Name</em>'.
   * @see dev.penduline.model.FitResult#getName()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_Name();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FitResult#getComputedAt <em>Computed At</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Computed At</em>'.
   * @see dev.penduline.model.FitResult#getComputedAt()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_ComputedAt();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FitResult#getHypothesisId <em>Hypothesis Id</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Hypothesis Id</em>'.
   * @see dev.penduline.model.FitResult#getHypothesisId()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_HypothesisId();

  /**
   * Returns the meta object for the attribute list '{@link dev.penduline.model.FitResult#getSessionIds <em>Session Ids</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute list '<em>Session Ids</em>'.
   * @see dev.penduline.model.FitResult#getSessionIds()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_SessionIds();

  /**
   * Returns the meta object for the attribute list '{@link dev.penduline.model.FitResult#getTermIds <em>Term Ids</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute list '<em>Term Ids</em>'.
   * @see dev.penduline.model.FitResult#getTermIds()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_TermIds();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.FitResult#getEstimates <em>Estimates</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Estimates</em>'.
   * @see dev.penduline.model.FitResult#getEstimates()
   * @see #getFitResult()
   * @generated
   */
  EReference getFitResult_Estimates();

  /**
   * Returns the meta object for the attribute list '{@link dev.penduline.model.FitResult#getCorrelationParameters <em>Correlation Parameters</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute list '<em>Correlation Parameters</em>'.
   * @see dev.penduline.model.FitResult#getCorrelationParameters()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_CorrelationParameters();

  /**
   * Returns the meta object for the attribute list '{@link dev.penduline.model.FitResult#getCorrelations <em>Correlations</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute list '<em>Correlations</em>'.
   * @see dev.penduline.model.FitResult#getCorrelations()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_Correlations();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FitResult#getCalculatedInertia <em>Calculated Inertia</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Calculated Inertia</em>'.
   * @see dev.penduline.model.FitResult#getCalculatedInertia()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_CalculatedInertia();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FitResult#getFittedInertia <em>Fitted Inertia</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Fitted Inertia</em>'.
   * @see dev.penduline.model.FitResult#getFittedInertia()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_FittedInertia();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.FitResult#getSessionFits <em>Session Fits</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Session Fits</em>'.
   * @see dev.penduline.model.FitResult#getSessionFits()
   * @see #getFitResult()
   * @generated
   */
  EReference getFitResult_SessionFits();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.FitResult#getComparisons <em>Comparisons</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Comparisons</em>'.
   * @see dev.penduline.model.FitResult#getComparisons()
   * @see #getFitResult()
   * @generated
   */
  EReference getFitResult_Comparisons();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.FitResult#getDominantLoss <em>Dominant Loss</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Dominant Loss</em>'.
   * @see dev.penduline.model.FitResult#getDominantLoss()
   * @see #getFitResult()
   * @generated
   */
  EAttribute getFitResult_DominantLoss();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.FitResult#getEnergyShares <em>Energy Shares</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Energy Shares</em>'.
   * @see dev.penduline.model.FitResult#getEnergyShares()
   * @see #getFitResult()
   * @generated
   */
  EReference getFitResult_EnergyShares();

  /**
   * Returns the meta object for the containment reference list '{@link dev.penduline.model.FitResult#getSettings <em>Settings</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the containment reference list '<em>Settings</em>'.
   * @see dev.penduline.model.FitResult#getSettings()
   * @see #getFitResult()
   * @generated
   */
  EReference getFitResult_Settings();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.Estimate <em>Estimate</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Estimate</em>'.
   * @see dev.penduline.model.Estimate
   * @generated
   */
  EClass getEstimate();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Estimate#getParameter <em>Parameter</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Parameter</em>'.
   * @see dev.penduline.model.Estimate#getParameter()
   * @see #getEstimate()
   * @generated
   */
  EAttribute getEstimate_Parameter();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Estimate#getValue <em>Value</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Value</em>'.
   * @see dev.penduline.model.Estimate#getValue()
   * @see #getEstimate()
   * @generated
   */
  EAttribute getEstimate_Value();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Estimate#getStandardError <em>Standard Error</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Standard Error</em>'.
   * @see dev.penduline.model.Estimate#getStandardError()
   * @see #getEstimate()
   * @generated
   */
  EAttribute getEstimate_StandardError();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Estimate#getResamplingError <em>Resampling Error</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Resampling Error</em>'.
   * @see dev.penduline.model.Estimate#getResamplingError()
   * @see #getEstimate()
   * @generated
   */
  EAttribute getEstimate_ResamplingError();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.SessionFit <em>Session Fit</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Session Fit</em>'.
   * @see dev.penduline.model.SessionFit
   * @generated
   */
  EClass getSessionFit();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.SessionFit#getSessionId <em>Session Id</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Session Id</em>'.
   * @see dev.penduline.model.SessionFit#getSessionId()
   * @see #getSessionFit()
   * @generated
   */
  EAttribute getSessionFit_SessionId();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.SessionFit#getInitialAngle <em>Initial Angle</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Initial Angle</em>'.
   * @see dev.penduline.model.SessionFit#getInitialAngle()
   * @see #getSessionFit()
   * @generated
   */
  EAttribute getSessionFit_InitialAngle();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.SessionFit#getReleaseTime <em>Release Time</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Release Time</em>'.
   * @see dev.penduline.model.SessionFit#getReleaseTime()
   * @see #getSessionFit()
   * @generated
   */
  EAttribute getSessionFit_ReleaseTime();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.SessionFit#getAngleOffset <em>Angle Offset</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Angle Offset</em>'.
   * @see dev.penduline.model.SessionFit#getAngleOffset()
   * @see #getSessionFit()
   * @generated
   */
  EAttribute getSessionFit_AngleOffset();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.SessionFit#getRmsResidual <em>Rms Residual</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Rms Residual</em>'.
   * @see dev.penduline.model.SessionFit#getRmsResidual()
   * @see #getSessionFit()
   * @generated
   */
  EAttribute getSessionFit_RmsResidual();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.TermSetScore <em>Term Set Score</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Term Set Score</em>'.
   * @see dev.penduline.model.TermSetScore
   * @generated
   */
  EClass getTermSetScore();

  /**
   * Returns the meta object for the attribute list '{@link dev.penduline.model.TermSetScore#getTermIds <em>Term Ids</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute list '<em>Term Ids</em>'.
   * @see dev.penduline.model.TermSetScore#getTermIds()
   * @see #getTermSetScore()
   * @generated
   */
  EAttribute getTermSetScore_TermIds();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TermSetScore#getAic <em>Aic</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Aic</em>'.
   * @see dev.penduline.model.TermSetScore#getAic()
   * @see #getTermSetScore()
   * @generated
   */
  EAttribute getTermSetScore_Aic();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TermSetScore#getBic <em>Bic</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Bic</em>'.
   * @see dev.penduline.model.TermSetScore#getBic()
   * @see #getTermSetScore()
   * @generated
   */
  EAttribute getTermSetScore_Bic();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.TermSetScore#getRmsResidual <em>Rms Residual</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Rms Residual</em>'.
   * @see dev.penduline.model.TermSetScore#getRmsResidual()
   * @see #getTermSetScore()
   * @generated
   */
  EAttribute getTermSetScore_RmsResidual();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.EnergyShare <em>Energy Share</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Energy Share</em>'.
   * @see dev.penduline.model.EnergyShare
   * @generated
   */
  EClass getEnergyShare();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.EnergyShare#getTermId <em>Term Id</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Term Id</em>'.
   * @see dev.penduline.model.EnergyShare#getTermId()
   * @see #getEnergyShare()
   * @generated
   */
  EAttribute getEnergyShare_TermId();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.EnergyShare#getShare <em>Share</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Share</em>'.
   * @see dev.penduline.model.EnergyShare#getShare()
   * @see #getEnergyShare()
   * @generated
   */
  EAttribute getEnergyShare_Share();

  /**
   * Returns the meta object for class '{@link dev.penduline.model.Setting <em>Setting</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for class '<em>Setting</em>'.
   * @see dev.penduline.model.Setting
   * @generated
   */
  EClass getSetting();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Setting#getKey <em>Key</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Key</em>'.
   * @see dev.penduline.model.Setting#getKey()
   * @see #getSetting()
   * @generated
   */
  EAttribute getSetting_Key();

  /**
   * Returns the meta object for the attribute '{@link dev.penduline.model.Setting#getValue <em>Value</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for the attribute '<em>Value</em>'.
   * @see dev.penduline.model.Setting#getValue()
   * @see #getSetting()
   * @generated
   */
  EAttribute getSetting_Value();

  /**
   * Returns the meta object for enum '{@link dev.penduline.model.ShapeKind <em>Shape Kind</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for enum '<em>Shape Kind</em>'.
   * @see dev.penduline.model.ShapeKind
   * @generated
   */
  EEnum getShapeKind();

  /**
   * Returns the meta object for enum '{@link dev.penduline.model.ShapeAxis <em>Shape Axis</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for enum '<em>Shape Axis</em>'.
   * @see dev.penduline.model.ShapeAxis
   * @generated
   */
  EEnum getShapeAxis();

  /**
   * Returns the meta object for enum '{@link dev.penduline.model.TensorReference <em>Tensor Reference</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for enum '<em>Tensor Reference</em>'.
   * @see dev.penduline.model.TensorReference
   * @generated
   */
  EEnum getTensorReference();

  /**
   * Returns the meta object for enum '{@link dev.penduline.model.FrictionKind <em>Friction Kind</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for enum '<em>Friction Kind</em>'.
   * @see dev.penduline.model.FrictionKind
   * @generated
   */
  EEnum getFrictionKind();

  /**
   * Returns the meta object for enum '{@link dev.penduline.model.TimeUnit <em>Time Unit</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for enum '<em>Time Unit</em>'.
   * @see dev.penduline.model.TimeUnit
   * @generated
   */
  EEnum getTimeUnit();

  /**
   * Returns the meta object for enum '{@link dev.penduline.model.AngleUnit <em>Angle Unit</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for enum '<em>Angle Unit</em>'.
   * @see dev.penduline.model.AngleUnit
   * @generated
   */
  EEnum getAngleUnit();

  /**
   * Returns the meta object for enum '{@link dev.penduline.model.Delimiter <em>Delimiter</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for enum '<em>Delimiter</em>'.
   * @see dev.penduline.model.Delimiter
   * @generated
   */
  EEnum getDelimiter();

  /**
   * Returns the meta object for enum '{@link dev.penduline.model.DecimalSeparator <em>Decimal Separator</em>}'.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the meta object for enum '<em>Decimal Separator</em>'.
   * @see dev.penduline.model.DecimalSeparator
   * @generated
   */
  EEnum getDecimalSeparator();

  /**
   * Returns the factory that creates the instances of the model.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @return the factory that creates the instances of the model.
   * @generated
   */
  PendulineFactory getPendulineFactory();

  /**
   * <!-- begin-user-doc -->
   * Defines literals for the meta objects that represent
   * <ul>
   *   <li>each class,</li>
   *   <li>each feature of each class,</li>
   *   <li>each operation of each class,</li>
   *   <li>each enum,</li>
   *   <li>and each data type</li>
   * </ul>
   * <!-- end-user-doc -->
   * @generated
   */
  interface Literals
  {
    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.MechanismImpl <em>Mechanism</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.MechanismImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getMechanism()
     * @generated
     */
    EClass MECHANISM = eINSTANCE.getMechanism();

    /**
     * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__NAME = eINSTANCE.getMechanism_Name();

    /**
     * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__DESCRIPTION = eINSTANCE.getMechanism_Description();

    /**
     * The meta object literal for the '<em><b>Gravity</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__GRAVITY = eINSTANCE.getMechanism_Gravity();

    /**
     * The meta object literal for the '<em><b>Axis Point X</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__AXIS_POINT_X = eINSTANCE.getMechanism_AxisPointX();

    /**
     * The meta object literal for the '<em><b>Axis Point Y</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__AXIS_POINT_Y = eINSTANCE.getMechanism_AxisPointY();

    /**
     * The meta object literal for the '<em><b>Axis Point Z</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__AXIS_POINT_Z = eINSTANCE.getMechanism_AxisPointZ();

    /**
     * The meta object literal for the '<em><b>Axis Direction X</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__AXIS_DIRECTION_X = eINSTANCE.getMechanism_AxisDirectionX();

    /**
     * The meta object literal for the '<em><b>Axis Direction Y</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__AXIS_DIRECTION_Y = eINSTANCE.getMechanism_AxisDirectionY();

    /**
     * The meta object literal for the '<em><b>Axis Direction Z</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__AXIS_DIRECTION_Z = eINSTANCE.getMechanism_AxisDirectionZ();

    /**
     * The meta object literal for the '<em><b>Gravity Direction X</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__GRAVITY_DIRECTION_X = eINSTANCE.getMechanism_GravityDirectionX();

    /**
     * The meta object literal for the '<em><b>Gravity Direction Y</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__GRAVITY_DIRECTION_Y = eINSTANCE.getMechanism_GravityDirectionY();

    /**
     * The meta object literal for the '<em><b>Gravity Direction Z</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__GRAVITY_DIRECTION_Z = eINSTANCE.getMechanism_GravityDirectionZ();

    /**
     * The meta object literal for the '<em><b>Axis Tilt</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute MECHANISM__AXIS_TILT = eINSTANCE.getMechanism_AxisTilt();

    /**
     * The meta object literal for the '<em><b>Parts</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference MECHANISM__PARTS = eINSTANCE.getMechanism_Parts();

    /**
     * The meta object literal for the '<em><b>Friction Hypotheses</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference MECHANISM__FRICTION_HYPOTHESES = eINSTANCE.getMechanism_FrictionHypotheses();

    /**
     * The meta object literal for the '<em><b>Sessions</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference MECHANISM__SESSIONS = eINSTANCE.getMechanism_Sessions();

    /**
     * The meta object literal for the '<em><b>Fit Results</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference MECHANISM__FIT_RESULTS = eINSTANCE.getMechanism_FitResults();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.PartImpl <em>Part</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.PartImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getPart()
     * @generated
     */
    EClass PART = eINSTANCE.getPart();

    /**
     * The meta object literal for the '<em><b>Id</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__ID = eINSTANCE.getPart_Id();

    /**
     * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__NAME = eINSTANCE.getPart_Name();

    /**
     * The meta object literal for the '<em><b>Shape</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__SHAPE = eINSTANCE.getPart_Shape();

    /**
     * The meta object literal for the '<em><b>Shape Axis</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__SHAPE_AXIS = eINSTANCE.getPart_ShapeAxis();

    /**
     * The meta object literal for the '<em><b>Length</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__LENGTH = eINSTANCE.getPart_Length();

    /**
     * The meta object literal for the '<em><b>Width</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__WIDTH = eINSTANCE.getPart_Width();

    /**
     * The meta object literal for the '<em><b>Height</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__HEIGHT = eINSTANCE.getPart_Height();

    /**
     * The meta object literal for the '<em><b>Radius</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__RADIUS = eINSTANCE.getPart_Radius();

    /**
     * The meta object literal for the '<em><b>Inner Radius</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__INNER_RADIUS = eINSTANCE.getPart_InnerRadius();

    /**
     * The meta object literal for the '<em><b>Mass</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__MASS = eINSTANCE.getPart_Mass();

    /**
     * The meta object literal for the '<em><b>Density</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__DENSITY = eINSTANCE.getPart_Density();

    /**
     * The meta object literal for the '<em><b>Centroid X</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__CENTROID_X = eINSTANCE.getPart_CentroidX();

    /**
     * The meta object literal for the '<em><b>Centroid Y</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__CENTROID_Y = eINSTANCE.getPart_CentroidY();

    /**
     * The meta object literal for the '<em><b>Centroid Z</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__CENTROID_Z = eINSTANCE.getPart_CentroidZ();

    /**
     * The meta object literal for the '<em><b>Rotation X</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__ROTATION_X = eINSTANCE.getPart_RotationX();

    /**
     * The meta object literal for the '<em><b>Rotation Y</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__ROTATION_Y = eINSTANCE.getPart_RotationY();

    /**
     * The meta object literal for the '<em><b>Rotation Z</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__ROTATION_Z = eINSTANCE.getPart_RotationZ();

    /**
     * The meta object literal for the '<em><b>Cutout</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__CUTOUT = eINSTANCE.getPart_Cutout();

    /**
     * The meta object literal for the '<em><b>Quantity</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__QUANTITY = eINSTANCE.getPart_Quantity();

    /**
     * The meta object literal for the '<em><b>Mass Tolerance</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__MASS_TOLERANCE = eINSTANCE.getPart_MassTolerance();

    /**
     * The meta object literal for the '<em><b>Dimension Tolerance</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__DIMENSION_TOLERANCE = eINSTANCE.getPart_DimensionTolerance();

    /**
     * The meta object literal for the '<em><b>Ixx</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__IXX = eINSTANCE.getPart_Ixx();

    /**
     * The meta object literal for the '<em><b>Iyy</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__IYY = eINSTANCE.getPart_Iyy();

    /**
     * The meta object literal for the '<em><b>Izz</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__IZZ = eINSTANCE.getPart_Izz();

    /**
     * The meta object literal for the '<em><b>Ixy</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__IXY = eINSTANCE.getPart_Ixy();

    /**
     * The meta object literal for the '<em><b>Ixz</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__IXZ = eINSTANCE.getPart_Ixz();

    /**
     * The meta object literal for the '<em><b>Iyz</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__IYZ = eINSTANCE.getPart_Iyz();

    /**
     * The meta object literal for the '<em><b>Tensor Reference</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute PART__TENSOR_REFERENCE = eINSTANCE.getPart_TensorReference();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.FrictionHypothesisImpl <em>Friction Hypothesis</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.FrictionHypothesisImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getFrictionHypothesis()
     * @generated
     */
    EClass FRICTION_HYPOTHESIS = eINSTANCE.getFrictionHypothesis();

    /**
     * The meta object literal for the '<em><b>Id</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FRICTION_HYPOTHESIS__ID = eINSTANCE.getFrictionHypothesis_Id();

    /**
     * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FRICTION_HYPOTHESIS__NAME = eINSTANCE.getFrictionHypothesis_Name();

    /**
     * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FRICTION_HYPOTHESIS__DESCRIPTION = eINSTANCE.getFrictionHypothesis_Description();

    /**
     * The meta object literal for the '<em><b>Terms</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference FRICTION_HYPOTHESIS__TERMS = eINSTANCE.getFrictionHypothesis_Terms();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.FrictionTermImpl <em>Friction Term</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.FrictionTermImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getFrictionTerm()
     * @generated
     */
    EClass FRICTION_TERM = eINSTANCE.getFrictionTerm();

    /**
     * The meta object literal for the '<em><b>Id</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FRICTION_TERM__ID = eINSTANCE.getFrictionTerm_Id();

    /**
     * The meta object literal for the '<em><b>Kind</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FRICTION_TERM__KIND = eINSTANCE.getFrictionTerm_Kind();

    /**
     * The meta object literal for the '<em><b>Value</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FRICTION_TERM__VALUE = eINSTANCE.getFrictionTerm_Value();

    /**
     * The meta object literal for the '<em><b>Lower Bound</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FRICTION_TERM__LOWER_BOUND = eINSTANCE.getFrictionTerm_LowerBound();

    /**
     * The meta object literal for the '<em><b>Upper Bound</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FRICTION_TERM__UPPER_BOUND = eINSTANCE.getFrictionTerm_UpperBound();

    /**
     * The meta object literal for the '<em><b>Fixed</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FRICTION_TERM__FIXED = eINSTANCE.getFrictionTerm_Fixed();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.TestSessionImpl <em>Test Session</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.TestSessionImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getTestSession()
     * @generated
     */
    EClass TEST_SESSION = eINSTANCE.getTestSession();

    /**
     * The meta object literal for the '<em><b>Id</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__ID = eINSTANCE.getTestSession_Id();

    /**
     * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__NAME = eINSTANCE.getTestSession_Name();

    /**
     * The meta object literal for the '<em><b>Record Path</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__RECORD_PATH = eINSTANCE.getTestSession_RecordPath();

    /**
     * The meta object literal for the '<em><b>Time Column Name</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__TIME_COLUMN_NAME = eINSTANCE.getTestSession_TimeColumnName();

    /**
     * The meta object literal for the '<em><b>Time Column Number</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__TIME_COLUMN_NUMBER = eINSTANCE.getTestSession_TimeColumnNumber();

    /**
     * The meta object literal for the '<em><b>Angle Column Name</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__ANGLE_COLUMN_NAME = eINSTANCE.getTestSession_AngleColumnName();

    /**
     * The meta object literal for the '<em><b>Angle Column Number</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__ANGLE_COLUMN_NUMBER = eINSTANCE.getTestSession_AngleColumnNumber();

    /**
     * The meta object literal for the '<em><b>Time Unit</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__TIME_UNIT = eINSTANCE.getTestSession_TimeUnit();

    /**
     * The meta object literal for the '<em><b>Angle Unit</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__ANGLE_UNIT = eINSTANCE.getTestSession_AngleUnit();

    /**
     * The meta object literal for the '<em><b>Counts Per Revolution</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__COUNTS_PER_REVOLUTION = eINSTANCE.getTestSession_CountsPerRevolution();

    /**
     * The meta object literal for the '<em><b>Delimiter</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__DELIMITER = eINSTANCE.getTestSession_Delimiter();

    /**
     * The meta object literal for the '<em><b>Decimal Separator</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__DECIMAL_SEPARATOR = eINSTANCE.getTestSession_DecimalSeparator();

    /**
     * The meta object literal for the '<em><b>Content Hash</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__CONTENT_HASH = eINSTANCE.getTestSession_ContentHash();

    /**
     * The meta object literal for the '<em><b>Release Angle</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__RELEASE_ANGLE = eINSTANCE.getTestSession_ReleaseAngle();

    /**
     * The meta object literal for the '<em><b>Notes</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TEST_SESSION__NOTES = eINSTANCE.getTestSession_Notes();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.FitResultImpl <em>Fit Result</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.FitResultImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getFitResult()
     * @generated
     */
    EClass FIT_RESULT = eINSTANCE.getFitResult();

    /**
     * The meta object literal for the '<em><b>Id</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__ID = eINSTANCE.getFitResult_Id();

    /**
     * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__NAME = eINSTANCE.getFitResult_Name();

    /**
     * The meta object literal for the '<em><b>Computed At</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__COMPUTED_AT = eINSTANCE.getFitResult_ComputedAt();

    /**
     * The meta object literal for the '<em><b>Hypothesis Id</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__HYPOTHESIS_ID = eINSTANCE.getFitResult_HypothesisId();

    /**
     * The meta object literal for the '<em><b>Session Ids</b></em>' attribute list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__SESSION_IDS = eINSTANCE.getFitResult_SessionIds();

    /**
     * The meta object literal for the '<em><b>Term Ids</b></em>' attribute list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__TERM_IDS = eINSTANCE.getFitResult_TermIds();

    /**
     * The meta object literal for the '<em><b>Estimates</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference FIT_RESULT__ESTIMATES = eINSTANCE.getFitResult_Estimates();

    /**
     * The meta object literal for the '<em><b>Correlation Parameters</b></em>' attribute list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__CORRELATION_PARAMETERS = eINSTANCE.getFitResult_CorrelationParameters();

    /**
     * The meta object literal for the '<em><b>Correlations</b></em>' attribute list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__CORRELATIONS = eINSTANCE.getFitResult_Correlations();

    /**
     * The meta object literal for the '<em><b>Calculated Inertia</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__CALCULATED_INERTIA = eINSTANCE.getFitResult_CalculatedInertia();

    /**
     * The meta object literal for the '<em><b>Fitted Inertia</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__FITTED_INERTIA = eINSTANCE.getFitResult_FittedInertia();

    /**
     * The meta object literal for the '<em><b>Session Fits</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference FIT_RESULT__SESSION_FITS = eINSTANCE.getFitResult_SessionFits();

    /**
     * The meta object literal for the '<em><b>Comparisons</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference FIT_RESULT__COMPARISONS = eINSTANCE.getFitResult_Comparisons();

    /**
     * The meta object literal for the '<em><b>Dominant Loss</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute FIT_RESULT__DOMINANT_LOSS = eINSTANCE.getFitResult_DominantLoss();

    /**
     * The meta object literal for the '<em><b>Energy Shares</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference FIT_RESULT__ENERGY_SHARES = eINSTANCE.getFitResult_EnergyShares();

    /**
     * The meta object literal for the '<em><b>Settings</b></em>' containment reference list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EReference FIT_RESULT__SETTINGS = eINSTANCE.getFitResult_Settings();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.EstimateImpl <em>Estimate</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.EstimateImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getEstimate()
     * @generated
     */
    EClass ESTIMATE = eINSTANCE.getEstimate();

    /**
     * The meta object literal for the '<em><b>Parameter</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute ESTIMATE__PARAMETER = eINSTANCE.getEstimate_Parameter();

    /**
     * The meta object literal for the '<em><b>Value</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute ESTIMATE__VALUE = eINSTANCE.getEstimate_Value();

    /**
     * The meta object literal for the '<em><b>Standard Error</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute ESTIMATE__STANDARD_ERROR = eINSTANCE.getEstimate_StandardError();

    /**
     * The meta object literal for the '<em><b>Resampling Error</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute ESTIMATE__RESAMPLING_ERROR = eINSTANCE.getEstimate_ResamplingError();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.SessionFitImpl <em>Session Fit</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.SessionFitImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getSessionFit()
     * @generated
     */
    EClass SESSION_FIT = eINSTANCE.getSessionFit();

    /**
     * The meta object literal for the '<em><b>Session Id</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute SESSION_FIT__SESSION_ID = eINSTANCE.getSessionFit_SessionId();

    /**
     * The meta object literal for the '<em><b>Initial Angle</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute SESSION_FIT__INITIAL_ANGLE = eINSTANCE.getSessionFit_InitialAngle();

    /**
     * The meta object literal for the '<em><b>Release Time</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute SESSION_FIT__RELEASE_TIME = eINSTANCE.getSessionFit_ReleaseTime();

    /**
     * The meta object literal for the '<em><b>Angle Offset</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute SESSION_FIT__ANGLE_OFFSET = eINSTANCE.getSessionFit_AngleOffset();

    /**
     * The meta object literal for the '<em><b>Rms Residual</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute SESSION_FIT__RMS_RESIDUAL = eINSTANCE.getSessionFit_RmsResidual();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.TermSetScoreImpl <em>Term Set Score</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.TermSetScoreImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getTermSetScore()
     * @generated
     */
    EClass TERM_SET_SCORE = eINSTANCE.getTermSetScore();

    /**
     * The meta object literal for the '<em><b>Term Ids</b></em>' attribute list feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TERM_SET_SCORE__TERM_IDS = eINSTANCE.getTermSetScore_TermIds();

    /**
     * The meta object literal for the '<em><b>Aic</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TERM_SET_SCORE__AIC = eINSTANCE.getTermSetScore_Aic();

    /**
     * The meta object literal for the '<em><b>Bic</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TERM_SET_SCORE__BIC = eINSTANCE.getTermSetScore_Bic();

    /**
     * The meta object literal for the '<em><b>Rms Residual</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute TERM_SET_SCORE__RMS_RESIDUAL = eINSTANCE.getTermSetScore_RmsResidual();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.EnergyShareImpl <em>Energy Share</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.EnergyShareImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getEnergyShare()
     * @generated
     */
    EClass ENERGY_SHARE = eINSTANCE.getEnergyShare();

    /**
     * The meta object literal for the '<em><b>Term Id</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute ENERGY_SHARE__TERM_ID = eINSTANCE.getEnergyShare_TermId();

    /**
     * The meta object literal for the '<em><b>Share</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute ENERGY_SHARE__SHARE = eINSTANCE.getEnergyShare_Share();

    /**
     * The meta object literal for the '{@link dev.penduline.model.impl.SettingImpl <em>Setting</em>}' class.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.impl.SettingImpl
     * @see dev.penduline.model.impl.PendulinePackageImpl#getSetting()
     * @generated
     */
    EClass SETTING = eINSTANCE.getSetting();

    /**
     * The meta object literal for the '<em><b>Key</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute SETTING__KEY = eINSTANCE.getSetting_Key();

    /**
     * The meta object literal for the '<em><b>Value</b></em>' attribute feature.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @generated
     */
    EAttribute SETTING__VALUE = eINSTANCE.getSetting_Value();

    /**
     * The meta object literal for the '{@link dev.penduline.model.ShapeKind <em>Shape Kind</em>}' enum.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.ShapeKind
     * @see dev.penduline.model.impl.PendulinePackageImpl#getShapeKind()
     * @generated
     */
    EEnum SHAPE_KIND = eINSTANCE.getShapeKind();

    /**
     * The meta object literal for the '{@link dev.penduline.model.ShapeAxis <em>Shape Axis</em>}' enum.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.ShapeAxis
     * @see dev.penduline.model.impl.PendulinePackageImpl#getShapeAxis()
     * @generated
     */
    EEnum SHAPE_AXIS = eINSTANCE.getShapeAxis();

    /**
     * The meta object literal for the '{@link dev.penduline.model.TensorReference <em>Tensor Reference</em>}' enum.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.TensorReference
     * @see dev.penduline.model.impl.PendulinePackageImpl#getTensorReference()
     * @generated
     */
    EEnum TENSOR_REFERENCE = eINSTANCE.getTensorReference();

    /**
     * The meta object literal for the '{@link dev.penduline.model.FrictionKind <em>Friction Kind</em>}' enum.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.FrictionKind
     * @see dev.penduline.model.impl.PendulinePackageImpl#getFrictionKind()
     * @generated
     */
    EEnum FRICTION_KIND = eINSTANCE.getFrictionKind();

    /**
     * The meta object literal for the '{@link dev.penduline.model.TimeUnit <em>Time Unit</em>}' enum.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.TimeUnit
     * @see dev.penduline.model.impl.PendulinePackageImpl#getTimeUnit()
     * @generated
     */
    EEnum TIME_UNIT = eINSTANCE.getTimeUnit();

    /**
     * The meta object literal for the '{@link dev.penduline.model.AngleUnit <em>Angle Unit</em>}' enum.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.AngleUnit
     * @see dev.penduline.model.impl.PendulinePackageImpl#getAngleUnit()
     * @generated
     */
    EEnum ANGLE_UNIT = eINSTANCE.getAngleUnit();

    /**
     * The meta object literal for the '{@link dev.penduline.model.Delimiter <em>Delimiter</em>}' enum.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.Delimiter
     * @see dev.penduline.model.impl.PendulinePackageImpl#getDelimiter()
     * @generated
     */
    EEnum DELIMITER = eINSTANCE.getDelimiter();

    /**
     * The meta object literal for the '{@link dev.penduline.model.DecimalSeparator <em>Decimal Separator</em>}' enum.
     * <!-- begin-user-doc -->
     * <!-- end-user-doc -->
     * @see dev.penduline.model.DecimalSeparator
     * @see dev.penduline.model.impl.PendulinePackageImpl#getDecimalSeparator()
     * @generated
     */
    EEnum DECIMAL_SEPARATOR = eINSTANCE.getDecimalSeparator();

  }

} //PendulinePackage
