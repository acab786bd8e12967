/**
 * Penduline: the mechanism file model.
 * SPDX-License-Identifier: EPL-2.0
 * Generated from model/mechanism.ecore by releng/scripts/regenerate-model.sh: do not edit.
 */
package dev.penduline.model.impl;

import dev.penduline.model.AngleUnit;
import dev.penduline.model.DecimalSeparator;
import dev.penduline.model.Delimiter;
import dev.penduline.model.PendulinePackage;
import dev.penduline.model.TestSession;
import dev.penduline.model.TimeUnit;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Test Session</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getId <em>Id</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getName <em>Name</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getRecordPath <em>Record Path</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getTimeColumnName <em>Time Column Name</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getTimeColumnNumber <em>Time Column Number</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getAngleColumnName <em>Angle Column Name</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getAngleColumnNumber <em>Angle Column Number</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getTimeUnit <em>Time Unit</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getAngleUnit <em>Angle Unit</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getCountsPerRevolution <em>Counts Per Revolution</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getDelimiter <em>Delimiter</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getDecimalSeparator <em>Decimal Separator</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getContentHash <em>Content Hash</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getReleaseAngle <em>Release Angle</em>}</li>
 *   <li>{@link dev.penduline.model.impl.TestSessionImpl#getNotes <em>Notes</em>}</li>
 * </ul>
 *
 * @generated
 */
public class TestSessionImpl extends MinimalEObjectImpl.Container implements TestSession
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
   * The default value of the '{@link #getRecordPath() <em>Record Path</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRecordPath()
   * @generated
   * @ordered
   */
  protected static final String RECORD_PATH_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getRecordPath() <em>Record Path</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getRecordPath()
   * @generated
   * @ordered
   */
  protected String recordPath = RECORD_PATH_EDEFAULT;

  /**
   * The default value of the '{@link #getTimeColumnName() <em>Time Column Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTimeColumnName()
   * @generated
   * @ordered
   */
  protected static final String TIME_COLUMN_NAME_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getTimeColumnName() <em>Time Column Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTimeColumnName()
   * @generated
   * @ordered
   */
  protected String timeColumnName = TIME_COLUMN_NAME_EDEFAULT;

  /**
   * The default value of the '{@link #getTimeColumnNumber() <em>Time Column Number</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTimeColumnNumber()
   * @generated
   * @ordered
   */
  protected static final int TIME_COLUMN_NUMBER_EDEFAULT = 0;

  /**
   * The cached value of the '{@link #getTimeColumnNumber() <em>Time Column Number</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTimeColumnNumber()
   * @generated
   * @ordered
   */
  protected int timeColumnNumber = TIME_COLUMN_NUMBER_EDEFAULT;

  /**
   * This is true if the Time Column Number attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean timeColumnNumberESet;

  /**
   * The default value of the '{@link #getAngleColumnName() <em>Angle Column Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAngleColumnName()
   * @generated
   * @ordered
   */
  protected static final String ANGLE_COLUMN_NAME_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getAngleColumnName() <em>Angle Column Name</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAngleColumnName()
   * @generated
   * @ordered
   */
  protected String angleColumnName = ANGLE_COLUMN_NAME_EDEFAULT;

  /**
   * The default value of the '{@link #getAngleColumnNumber() <em>Angle Column Number</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAngleColumnNumber()
   * @generated
   * @ordered
   */
  protected static final int ANGLE_COLUMN_NUMBER_EDEFAULT = 0;

  /**
   * The cached value of the '{@link #getAngleColumnNumber() <em>Angle Column Number</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAngleColumnNumber()
   * @generated
   * @ordered
   */
  protected int angleColumnNumber = ANGLE_COLUMN_NUMBER_EDEFAULT;

  /**
   * This is true if the Angle Column Number attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean angleColumnNumberESet;

  /**
   * The default value of the '{@link #getTimeUnit() <em>Time Unit</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTimeUnit()
   * @generated
   * @ordered
   */
  protected static final TimeUnit TIME_UNIT_EDEFAULT = TimeUnit.SECOND;

  /**
   * The cached value of the '{@link #getTimeUnit() <em>Time Unit</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getTimeUnit()
   * @generated
   * @ordered
   */
  protected TimeUnit timeUnit = TIME_UNIT_EDEFAULT;

  /**
   * The default value of the '{@link #getAngleUnit() <em>Angle Unit</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAngleUnit()
   * @generated
   * @ordered
   */
  protected static final AngleUnit ANGLE_UNIT_EDEFAULT = AngleUnit.RADIAN;

  /**
   * The cached value of the '{@link #getAngleUnit() <em>Angle Unit</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getAngleUnit()
   * @generated
   * @ordered
   */
  protected AngleUnit angleUnit = ANGLE_UNIT_EDEFAULT;

  /**
   * The default value of the '{@link #getCountsPerRevolution() <em>Counts Per Revolution</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCountsPerRevolution()
   * @generated
   * @ordered
   */
  protected static final int COUNTS_PER_REVOLUTION_EDEFAULT = 0;

  /**
   * The cached value of the '{@link #getCountsPerRevolution() <em>Counts Per Revolution</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getCountsPerRevolution()
   * @generated
   * @ordered
   */
  protected int countsPerRevolution = COUNTS_PER_REVOLUTION_EDEFAULT;

  /**
   * This is true if the Counts Per Revolution attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean countsPerRevolutionESet;

  /**
   * The default value of the '{@link #getDelimiter() <em>Delimiter</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDelimiter()
   * @generated
   * @ordered
   */
  protected static final Delimiter DELIMITER_EDEFAULT = Delimiter.COMMA;

  /**
   * The cached value of the '{@link #getDelimiter() <em>Delimiter</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDelimiter()
   * @generated
   * @ordered
   */
  protected Delimiter delimiter = DELIMITER_EDEFAULT;

  /**
   * The default value of the '{@link #getDecimalSeparator() <em>Decimal Separator</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDecimalSeparator()
   * @generated
   * @ordered
   */
  protected static final DecimalSeparator DECIMAL_SEPARATOR_EDEFAULT = DecimalSeparator.POINT;

  /**
   * The cached value of the '{@link #getDecimalSeparator() <em>Decimal Separator</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getDecimalSeparator()
   * @generated
   * @ordered
   */
  protected DecimalSeparator decimalSeparator = DECIMAL_SEPARATOR_EDEFAULT;

  /**
   * The default value of the '{@link #getContentHash() <em>Content Hash</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getContentHash()
   * @generated
   * @ordered
   */
  protected static final String CONTENT_HASH_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getContentHash() <em>Content Hash</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getContentHash()
   * @generated
   * @ordered
   */
  protected String contentHash = CONTENT_HASH_EDEFAULT;

  /**
   * The default value of the '{@link #getReleaseAngle() <em>Release Angle</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getReleaseAngle()
   * @generated
   * @ordered
   */
  protected static final double RELEASE_ANGLE_EDEFAULT = 0.0;

  /**
   * The cached value of the '{@link #getReleaseAngle() <em>Release Angle</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getReleaseAngle()
   * @generated
   * @ordered
   */
  protected double releaseAngle = RELEASE_ANGLE_EDEFAULT;

  /**
   * This is true if the Release Angle attribute has been set.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   * @ordered
   */
  protected boolean releaseAngleESet;

  /**
   * The default value of the '{@link #getNotes() <em>Notes</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getNotes()
   * @generated
   * @ordered
   */
  protected static final String NOTES_EDEFAULT = null;

  /**
   * The cached value of the '{@link #getNotes() <em>Notes</em>}' attribute.
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @see #getNotes()
   * @generated
   * @ordered
   */
  protected String notes = NOTES_EDEFAULT;

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  protected TestSessionImpl()
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
    return PendulinePackage.Literals.TEST_SESSION;
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
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__ID, oldId, id));
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
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__NAME, oldName, name));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getRecordPath()
  {
    return recordPath;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setRecordPath(String newRecordPath)
  {
    String oldRecordPath = recordPath;
    recordPath = newRecordPath;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__RECORD_PATH, oldRecordPath, recordPath));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getTimeColumnName()
  {
    return timeColumnName;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setTimeColumnName(String newTimeColumnName)
  {
    String oldTimeColumnName = timeColumnName;
    timeColumnName = newTimeColumnName;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__TIME_COLUMN_NAME, oldTimeColumnName, timeColumnName));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public int getTimeColumnNumber()
  {
    return timeColumnNumber;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setTimeColumnNumber(int newTimeColumnNumber)
  {
    int oldTimeColumnNumber = timeColumnNumber;
    timeColumnNumber = newTimeColumnNumber;
    boolean oldTimeColumnNumberESet = timeColumnNumberESet;
    timeColumnNumberESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__TIME_COLUMN_NUMBER, oldTimeColumnNumber, timeColumnNumber, !oldTimeColumnNumberESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetTimeColumnNumber()
  {
    int oldTimeColumnNumber = timeColumnNumber;
    boolean oldTimeColumnNumberESet = timeColumnNumberESet;
    timeColumnNumber = TIME_COLUMN_NUMBER_EDEFAULT;
    timeColumnNumberESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.TEST_SESSION__TIME_COLUMN_NUMBER, oldTimeColumnNumber, TIME_COLUMN_NUMBER_EDEFAULT, oldTimeColumnNumberESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetTimeColumnNumber()
  {
    return timeColumnNumberESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getAngleColumnName()
  {
    return angleColumnName;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAngleColumnName(String newAngleColumnName)
  {
    String oldAngleColumnName = angleColumnName;
    angleColumnName = newAngleColumnName;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NAME, oldAngleColumnName, angleColumnName));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public int getAngleColumnNumber()
  {
    return angleColumnNumber;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAngleColumnNumber(int newAngleColumnNumber)
  {
    int oldAngleColumnNumber = angleColumnNumber;
    angleColumnNumber = newAngleColumnNumber;
    boolean oldAngleColumnNumberESet = angleColumnNumberESet;
    angleColumnNumberESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NUMBER, oldAngleColumnNumber, angleColumnNumber, !oldAngleColumnNumberESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetAngleColumnNumber()
  {
    int oldAngleColumnNumber = angleColumnNumber;
    boolean oldAngleColumnNumberESet = angleColumnNumberESet;
    angleColumnNumber = ANGLE_COLUMN_NUMBER_EDEFAULT;
    angleColumnNumberESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NUMBER, oldAngleColumnNumber, ANGLE_COLUMN_NUMBER_EDEFAULT, oldAngleColumnNumberESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetAngleColumnNumber()
  {
    return angleColumnNumberESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public TimeUnit getTimeUnit()
  {
    return timeUnit;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setTimeUnit(TimeUnit newTimeUnit)
  {
    TimeUnit oldTimeUnit = timeUnit;
    timeUnit = newTimeUnit == null ? TIME_UNIT_EDEFAULT : newTimeUnit;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__TIME_UNIT, oldTimeUnit, timeUnit));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public AngleUnit getAngleUnit()
  {
    return angleUnit;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setAngleUnit(AngleUnit newAngleUnit)
  {
    AngleUnit oldAngleUnit = angleUnit;
    angleUnit = newAngleUnit == null ? ANGLE_UNIT_EDEFAULT : newAngleUnit;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__ANGLE_UNIT, oldAngleUnit, angleUnit));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public int getCountsPerRevolution()
  {
    return countsPerRevolution;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setCountsPerRevolution(int newCountsPerRevolution)
  {
    int oldCountsPerRevolution = countsPerRevolution;
    countsPerRevolution = newCountsPerRevolution;
    boolean oldCountsPerRevolutionESet = countsPerRevolutionESet;
    countsPerRevolutionESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__COUNTS_PER_REVOLUTION, oldCountsPerRevolution, countsPerRevolution, !oldCountsPerRevolutionESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetCountsPerRevolution()
  {
    int oldCountsPerRevolution = countsPerRevolution;
    boolean oldCountsPerRevolutionESet = countsPerRevolutionESet;
    countsPerRevolution = COUNTS_PER_REVOLUTION_EDEFAULT;
    countsPerRevolutionESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.TEST_SESSION__COUNTS_PER_REVOLUTION, oldCountsPerRevolution, COUNTS_PER_REVOLUTION_EDEFAULT, oldCountsPerRevolutionESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetCountsPerRevolution()
  {
    return countsPerRevolutionESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public Delimiter getDelimiter()
  {
    return delimiter;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setDelimiter(Delimiter newDelimiter)
  {
    Delimiter oldDelimiter = delimiter;
    delimiter = newDelimiter == null ? DELIMITER_EDEFAULT : newDelimiter;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__DELIMITER, oldDelimiter, delimiter));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public DecimalSeparator getDecimalSeparator()
  {
    return decimalSeparator;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setDecimalSeparator(DecimalSeparator newDecimalSeparator)
  {
    DecimalSeparator oldDecimalSeparator = decimalSeparator;
    decimalSeparator = newDecimalSeparator == null ? DECIMAL_SEPARATOR_EDEFAULT : newDecimalSeparator;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__DECIMAL_SEPARATOR, oldDecimalSeparator, decimalSeparator));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getContentHash()
  {
    return contentHash;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setContentHash(String newContentHash)
  {
    String oldContentHash = contentHash;
    contentHash = newContentHash;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__CONTENT_HASH, oldContentHash, contentHash));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public double getReleaseAngle()
  {
    return releaseAngle;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setReleaseAngle(double newReleaseAngle)
  {
    double oldReleaseAngle = releaseAngle;
    releaseAngle = newReleaseAngle;
    boolean oldReleaseAngleESet = releaseAngleESet;
    releaseAngleESet = true;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__RELEASE_ANGLE, oldReleaseAngle, releaseAngle, !oldReleaseAngleESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void unsetReleaseAngle()
  {
    double oldReleaseAngle = releaseAngle;
    boolean oldReleaseAngleESet = releaseAngleESet;
    releaseAngle = RELEASE_ANGLE_EDEFAULT;
    releaseAngleESet = false;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.UNSET, PendulinePackage.TEST_SESSION__RELEASE_ANGLE, oldReleaseAngle, RELEASE_ANGLE_EDEFAULT, oldReleaseAngleESet));
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public boolean isSetReleaseAngle()
  {
    return releaseAngleESet;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public String getNotes()
  {
    return notes;
  }

  /**
   * <!-- begin-user-doc -->
   * <!-- end-user-doc -->
   * @generated
   */
  @Override
  public void setNotes(String newNotes)
  {
    String oldNotes = notes;
    notes = newNotes;
    if (eNotificationRequired())
      eNotify(new ENotificationImpl(this, Notification.SET, PendulinePackage.TEST_SESSION__NOTES, oldNotes, notes));
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
      case PendulinePackage.TEST_SESSION__ID:
        return getId();
      case PendulinePackage.TEST_SESSION__NAME:
        return getName();
      case PendulinePackage.TEST_SESSION__RECORD_PATH:
        return getRecordPath();
      case PendulinePackage.TEST_SESSION__TIME_COLUMN_NAME:
        return getTimeColumnName();
      case PendulinePackage.TEST_SESSION__TIME_COLUMN_NUMBER:
        return getTimeColumnNumber();
      case PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NAME:
        return getAngleColumnName();
      case PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NUMBER:
        return getAngleColumnNumber();
      case PendulinePackage.TEST_SESSION__TIME_UNIT:
        return getTimeUnit();
      case PendulinePackage.TEST_SESSION__ANGLE_UNIT:
        return getAngleUnit();
      case PendulinePackage.TEST_SESSION__COUNTS_PER_REVOLUTION:
        return getCountsPerRevolution();
      case PendulinePackage.TEST_SESSION__DELIMITER:
        return getDelimiter();
      case PendulinePackage.TEST_SESSION__DECIMAL_SEPARATOR:
        return getDecimalSeparator();
      case PendulinePackage.TEST_SESSION__CONTENT_HASH:
        return getContentHash();
      case PendulinePackage.TEST_SESSION__RELEASE_ANGLE:
        return getReleaseAngle();
      case PendulinePackage.TEST_SESSION__NOTES:
        return getNotes();
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
      case PendulinePackage.TEST_SESSION__ID:
        setId((String)newValue);
        return;
      case PendulinePackage.TEST_SESSION__NAME:
        setName((String)newValue);
        return;
      case PendulinePackage.TEST_SESSION__RECORD_PATH:
        setRecordPath((String)newValue);
        return;
      case PendulinePackage.TEST_SESSION__TIME_COLUMN_NAME:
        setTimeColumnName((String)newValue);
        return;
      case PendulinePackage.TEST_SESSION__TIME_COLUMN_NUMBER:
        setTimeColumnNumber((Integer)newValue);
        return;
      case PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NAME:
        setAngleColumnName((String)newValue);
        return;
      case PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NUMBER:
        setAngleColumnNumber((Integer)newValue);
        return;
      case PendulinePackage.TEST_SESSION__TIME_UNIT:
        setTimeUnit((TimeUnit)newValue);
        return;
      case PendulinePackage.TEST_SESSION__ANGLE_UNIT:
        setAngleUnit((AngleUnit)newValue);
        return;
      case PendulinePackage.TEST_SESSION__COUNTS_PER_REVOLUTION:
        setCountsPerRevolution((Integer)newValue);
        return;
      case PendulinePackage.TEST_SESSION__DELIMITER:
        setDelimiter((Delimiter)newValue);
        return;
      case PendulinePackage.TEST_SESSION__DECIMAL_SEPARATOR:
        setDecimalSeparator((DecimalSeparator)newValue);
        return;
      case PendulinePackage.TEST_SESSION__CONTENT_HASH:
        setContentHash((String)newValue);
        return;
      case PendulinePackage.TEST_SESSION__RELEASE_ANGLE:
        setReleaseAngle((Double)newValue);
        return;
      case PendulinePackage.TEST_SESSION__NOTES:
        setNotes((String)newValue);
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
      case PendulinePackage.TEST_SESSION__ID:
        setId(ID_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__NAME:
        setName(NAME_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__RECORD_PATH:
        setRecordPath(RECORD_PATH_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__TIME_COLUMN_NAME:
        setTimeColumnName(TIME_COLUMN_NAME_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__TIME_COLUMN_NUMBER:
        unsetTimeColumnNumber();
        return;
      case PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NAME:
        setAngleColumnName(ANGLE_COLUMN_NAME_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NUMBER:
        unsetAngleColumnNumber();
        return;
      case PendulinePackage.TEST_SESSION__TIME_UNIT:
        setTimeUnit(TIME_UNIT_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__ANGLE_UNIT:
        setAngleUnit(ANGLE_UNIT_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__COUNTS_PER_REVOLUTION:
        unsetCountsPerRevolution();
        return;
      case PendulinePackage.TEST_SESSION__DELIMITER:
        setDelimiter(DELIMITER_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__DECIMAL_SEPARATOR:
        setDecimalSeparator(DECIMAL_SEPARATOR_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__CONTENT_HASH:
        setContentHash(CONTENT_HASH_EDEFAULT);
        return;
      case PendulinePackage.TEST_SESSION__RELEASE_ANGLE:
        unsetReleaseAngle();
        return;
      case PendulinePackage.TEST_SESSION__NOTES:
        setNotes(NOTES_EDEFAULT);
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
      case PendulinePackage.TEST_SESSION__ID:
        return ID_EDEFAULT == null ? id != null : !ID_EDEFAULT.equals(id);
      case PendulinePackage.TEST_SESSION__NAME:
        return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
      case PendulinePackage.TEST_SESSION__RECORD_PATH:
        return RECORD_PATH_EDEFAULT == null ? recordPath != null : !RECORD_PATH_EDEFAULT.equals(recordPath);
      case PendulinePackage.TEST_SESSION__TIME_COLUMN_NAME:
        return TIME_COLUMN_NAME_EDEFAULT == null ? timeColumnName != null : !TIME_COLUMN_NAME_EDEFAULT.equals(timeColumnName);
      case PendulinePackage.TEST_SESSION__TIME_COLUMN_NUMBER:
        return isSetTimeColumnNumber();
      case PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NAME:
        return ANGLE_COLUMN_NAME_EDEFAULT == null ? angleColumnName != null : !ANGLE_COLUMN_NAME_EDEFAULT.equals(angleColumnName);
      case PendulinePackage.TEST_SESSION__ANGLE_COLUMN_NUMBER:
        return isSetAngleColumnNumber();
      case PendulinePackage.TEST_SESSION__TIME_UNIT:
        return timeUnit != TIME_UNIT_EDEFAULT;
      case PendulinePackage.TEST_SESSION__ANGLE_UNIT:
        return angleUnit != ANGLE_UNIT_EDEFAULT;
      case PendulinePackage.TEST_SESSION__COUNTS_PER_REVOLUTION:
        return isSetCountsPerRevolution();
      case PendulinePackage.TEST_SESSION__DELIMITER:
        return delimiter != DELIMITER_EDEFAULT;
      case PendulinePackage.TEST_SESSION__DECIMAL_SEPARATOR:
        return decimalSeparator != DECIMAL_SEPARATOR_EDEFAULT;
      case PendulinePackage.TEST_SESSION__CONTENT_HASH:
        return CONTENT_HASH_EDEFAULT == null ? contentHash != null : !CONTENT_HASH_EDEFAULT.equals(contentHash);
      case PendulinePackage.TEST_SESSION__RELEASE_ANGLE:
        return isSetReleaseAngle();
      case PendulinePackage.TEST_SESSION__NOTES:
        return NOTES_EDEFAULT == null ? notes != null : !NOTES_EDEFAULT.equals(notes);
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
    result.append(", recordPath: ");
    result.append(recordPath);
    result.append(", timeColumnName: ");
    result.append(timeColumnName);
    result.append(", timeColumnNumber: ");
    if (timeColumnNumberESet) result.append(timeColumnNumber); else result.append("<unset>");
    result.append(", angleColumnName: ");
    result.append(angleColumnName);
    result.append(", angleColumnNumber: ");
    if (angleColumnNumberESet) result.append(angleColumnNumber); else result.append("<unset>");
    result.append(", timeUnit: ");
    result.append(timeUnit);
    result.append(", angleUnit: ");
    result.append(angleUnit);
    result.append(", countsPerRevolution: ");
    if (countsPerRevolutionESet) result.append(countsPerRevolution); else result.append("<unset>");
    result.append(", delimiter: ");
    result.append(delimiter);
    result.append(", decimalSeparator: ");
    result.append(decimalSeparator);
    result.append(", contentHash: ");
    result.append(contentHash);
    result.append(", releaseAngle: ");
    if (releaseAngleESet) result.append(releaseAngle); else result.append("<unset>");
    result.append(", notes: ");
    result.append(notes);
    result.append(')');
    return result.toString();
  }

} //TestSessionImpl
