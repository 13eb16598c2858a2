/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.PriceBook;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SolutionMethod;
import eluvia.site.model.TreatmentZone;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Flushing Design</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getZone <em>Zone</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getDarcyFluxMetresPerDay <em>Darcy Flux Metres Per Day</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getOperatingDaysPerWeek <em>Operating Days Per Week</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getCaptureEfficiency <em>Capture Efficiency</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getCriterion <em>Criterion</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getMaxPoreVolumes <em>Max Pore Volumes</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getSolutionMethod <em>Solution Method</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getNumericalCellCount <em>Numerical Cell Count</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getNumericalRelativeTolerance <em>Numerical Relative Tolerance</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getMonitoringIntervalDays <em>Monitoring Interval Days</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getAmendmentName <em>Amendment Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getAmendmentDoseKilogramsPerCubicMetre <em>Amendment Dose Kilograms Per Cubic Metre</em>}</li>
 *   <li>{@link eluvia.site.model.impl.FlushingDesignImpl#getPriceBook <em>Price Book</em>}</li>
 * </ul>
 *
 * @generated
 */
public class FlushingDesignImpl extends MinimalEObjectImpl.Container implements FlushingDesign {
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
	 * The cached value of the '{@link #getZone() <em>Zone</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getZone()
	 * @generated
	 * @ordered
	 */
	protected TreatmentZone zone;

	/**
	 * The default value of the '{@link #getDarcyFluxMetresPerDay() <em>Darcy Flux Metres Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDarcyFluxMetresPerDay()
	 * @generated
	 * @ordered
	 */
	protected static final double DARCY_FLUX_METRES_PER_DAY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDarcyFluxMetresPerDay() <em>Darcy Flux Metres Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDarcyFluxMetresPerDay()
	 * @generated
	 * @ordered
	 */
	protected double darcyFluxMetresPerDay = DARCY_FLUX_METRES_PER_DAY_EDEFAULT;

	/**
	 * The default value of the '{@link #getOperatingDaysPerWeek() <em>Operating Days Per Week</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOperatingDaysPerWeek()
	 * @generated
	 * @ordered
	 */
	protected static final double OPERATING_DAYS_PER_WEEK_EDEFAULT = 7.0;

	/**
	 * The cached value of the '{@link #getOperatingDaysPerWeek() <em>Operating Days Per Week</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOperatingDaysPerWeek()
	 * @generated
	 * @ordered
	 */
	protected double operatingDaysPerWeek = OPERATING_DAYS_PER_WEEK_EDEFAULT;

	/**
	 * The default value of the '{@link #getCaptureEfficiency() <em>Capture Efficiency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCaptureEfficiency()
	 * @generated
	 * @ordered
	 */
	protected static final double CAPTURE_EFFICIENCY_EDEFAULT = 0.95;

	/**
	 * The cached value of the '{@link #getCaptureEfficiency() <em>Capture Efficiency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCaptureEfficiency()
	 * @generated
	 * @ordered
	 */
	protected double captureEfficiency = CAPTURE_EFFICIENCY_EDEFAULT;

	/**
	 * The default value of the '{@link #getCriterion() <em>Criterion</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCriterion()
	 * @generated
	 * @ordered
	 */
	protected static final ComplianceCriterion CRITERION_EDEFAULT = ComplianceCriterion.EFFLUENT;

	/**
	 * The cached value of the '{@link #getCriterion() <em>Criterion</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCriterion()
	 * @generated
	 * @ordered
	 */
	protected ComplianceCriterion criterion = CRITERION_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaxPoreVolumes() <em>Max Pore Volumes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxPoreVolumes()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_PORE_VOLUMES_EDEFAULT = 1000.0;

	/**
	 * The cached value of the '{@link #getMaxPoreVolumes() <em>Max Pore Volumes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxPoreVolumes()
	 * @generated
	 * @ordered
	 */
	protected double maxPoreVolumes = MAX_PORE_VOLUMES_EDEFAULT;

	/**
	 * The default value of the '{@link #getSolutionMethod() <em>Solution Method</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSolutionMethod()
	 * @generated
	 * @ordered
	 */
	protected static final SolutionMethod SOLUTION_METHOD_EDEFAULT = SolutionMethod.EQUILIBRIUM;

	/**
	 * The cached value of the '{@link #getSolutionMethod() <em>Solution Method</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSolutionMethod()
	 * @generated
	 * @ordered
	 */
	protected SolutionMethod solutionMethod = SOLUTION_METHOD_EDEFAULT;

	/**
	 * The default value of the '{@link #getNumericalCellCount() <em>Numerical Cell Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNumericalCellCount()
	 * @generated
	 * @ordered
	 */
	protected static final int NUMERICAL_CELL_COUNT_EDEFAULT = 200;

	/**
	 * The cached value of the '{@link #getNumericalCellCount() <em>Numerical Cell Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNumericalCellCount()
	 * @generated
	 * @ordered
	 */
	protected int numericalCellCount = NUMERICAL_CELL_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getNumericalRelativeTolerance() <em>Numerical Relative Tolerance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNumericalRelativeTolerance()
	 * @generated
	 * @ordered
	 */
	protected static final double NUMERICAL_RELATIVE_TOLERANCE_EDEFAULT = 1.0E-6;

	/**
	 * The cached value of the '{@link #getNumericalRelativeTolerance() <em>Numerical Relative Tolerance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNumericalRelativeTolerance()
	 * @generated
	 * @ordered
	 */
	protected double numericalRelativeTolerance = NUMERICAL_RELATIVE_TOLERANCE_EDEFAULT;

	/**
	 * The default value of the '{@link #getMonitoringIntervalDays() <em>Monitoring Interval Days</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMonitoringIntervalDays()
	 * @generated
	 * @ordered
	 */
	protected static final double MONITORING_INTERVAL_DAYS_EDEFAULT = 7.0;

	/**
	 * The cached value of the '{@link #getMonitoringIntervalDays() <em>Monitoring Interval Days</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMonitoringIntervalDays()
	 * @generated
	 * @ordered
	 */
	protected double monitoringIntervalDays = MONITORING_INTERVAL_DAYS_EDEFAULT;

	/**
	 * The default value of the '{@link #getAmendmentName() <em>Amendment Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAmendmentName()
	 * @generated
	 * @ordered
	 */
	protected static final String AMENDMENT_NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getAmendmentName() <em>Amendment Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAmendmentName()
	 * @generated
	 * @ordered
	 */
	protected String amendmentName = AMENDMENT_NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getAmendmentDoseKilogramsPerCubicMetre() <em>Amendment Dose Kilograms Per Cubic Metre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAmendmentDoseKilogramsPerCubicMetre()
	 * @generated
	 * @ordered
	 */
	protected static final double AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getAmendmentDoseKilogramsPerCubicMetre() <em>Amendment Dose Kilograms Per Cubic Metre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAmendmentDoseKilogramsPerCubicMetre()
	 * @generated
	 * @ordered
	 */
	protected double amendmentDoseKilogramsPerCubicMetre = AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE_EDEFAULT;

	/**
	 * The cached value of the '{@link #getPriceBook() <em>Price Book</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPriceBook()
	 * @generated
	 * @ordered
	 */
	protected PriceBook priceBook;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected FlushingDesignImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.FLUSHING_DESIGN;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
		return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setName(String newName) {
		String oldName = name;
		name = newName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TreatmentZone getZone() {
		if (zone != null && zone.eIsProxy()) {
			InternalEObject oldZone = (InternalEObject)zone;
			zone = (TreatmentZone)eResolveProxy(oldZone);
			if (zone != oldZone) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.FLUSHING_DESIGN__ZONE, oldZone, zone));
			}
		}
		return zone;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public TreatmentZone basicGetZone() {
		return zone;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setZone(TreatmentZone newZone) {
		TreatmentZone oldZone = zone;
		zone = newZone;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__ZONE, oldZone, zone));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDarcyFluxMetresPerDay() {
		return darcyFluxMetresPerDay;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDarcyFluxMetresPerDay(double newDarcyFluxMetresPerDay) {
		double oldDarcyFluxMetresPerDay = darcyFluxMetresPerDay;
		darcyFluxMetresPerDay = newDarcyFluxMetresPerDay;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY, oldDarcyFluxMetresPerDay, darcyFluxMetresPerDay));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getOperatingDaysPerWeek() {
		return operatingDaysPerWeek;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOperatingDaysPerWeek(double newOperatingDaysPerWeek) {
		double oldOperatingDaysPerWeek = operatingDaysPerWeek;
		operatingDaysPerWeek = newOperatingDaysPerWeek;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK, oldOperatingDaysPerWeek, operatingDaysPerWeek));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCaptureEfficiency() {
		return captureEfficiency;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCaptureEfficiency(double newCaptureEfficiency) {
		double oldCaptureEfficiency = captureEfficiency;
		captureEfficiency = newCaptureEfficiency;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__CAPTURE_EFFICIENCY, oldCaptureEfficiency, captureEfficiency));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ComplianceCriterion getCriterion() {
		return criterion;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCriterion(ComplianceCriterion newCriterion) {
		ComplianceCriterion oldCriterion = criterion;
		criterion = newCriterion == null ? CRITERION_EDEFAULT : newCriterion;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__CRITERION, oldCriterion, criterion));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaxPoreVolumes() {
		return maxPoreVolumes;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxPoreVolumes(double newMaxPoreVolumes) {
		double oldMaxPoreVolumes = maxPoreVolumes;
		maxPoreVolumes = newMaxPoreVolumes;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__MAX_PORE_VOLUMES, oldMaxPoreVolumes, maxPoreVolumes));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SolutionMethod getSolutionMethod() {
		return solutionMethod;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSolutionMethod(SolutionMethod newSolutionMethod) {
		SolutionMethod oldSolutionMethod = solutionMethod;
		solutionMethod = newSolutionMethod == null ? SOLUTION_METHOD_EDEFAULT : newSolutionMethod;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__SOLUTION_METHOD, oldSolutionMethod, solutionMethod));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getNumericalCellCount() {
		return numericalCellCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNumericalCellCount(int newNumericalCellCount) {
		int oldNumericalCellCount = numericalCellCount;
		numericalCellCount = newNumericalCellCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__NUMERICAL_CELL_COUNT, oldNumericalCellCount, numericalCellCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getNumericalRelativeTolerance() {
		return numericalRelativeTolerance;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNumericalRelativeTolerance(double newNumericalRelativeTolerance) {
		double oldNumericalRelativeTolerance = numericalRelativeTolerance;
		numericalRelativeTolerance = newNumericalRelativeTolerance;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE, oldNumericalRelativeTolerance, numericalRelativeTolerance));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMonitoringIntervalDays() {
		return monitoringIntervalDays;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMonitoringIntervalDays(double newMonitoringIntervalDays) {
		double oldMonitoringIntervalDays = monitoringIntervalDays;
		monitoringIntervalDays = newMonitoringIntervalDays;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS, oldMonitoringIntervalDays, monitoringIntervalDays));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getAmendmentName() {
		return amendmentName;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAmendmentName(String newAmendmentName) {
		String oldAmendmentName = amendmentName;
		amendmentName = newAmendmentName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__AMENDMENT_NAME, oldAmendmentName, amendmentName));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getAmendmentDoseKilogramsPerCubicMetre() {
		return amendmentDoseKilogramsPerCubicMetre;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAmendmentDoseKilogramsPerCubicMetre(double newAmendmentDoseKilogramsPerCubicMetre) {
		double oldAmendmentDoseKilogramsPerCubicMetre = amendmentDoseKilogramsPerCubicMetre;
		amendmentDoseKilogramsPerCubicMetre = newAmendmentDoseKilogramsPerCubicMetre;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE, oldAmendmentDoseKilogramsPerCubicMetre, amendmentDoseKilogramsPerCubicMetre));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public PriceBook getPriceBook() {
		if (priceBook != null && priceBook.eIsProxy()) {
			InternalEObject oldPriceBook = (InternalEObject)priceBook;
			priceBook = (PriceBook)eResolveProxy(oldPriceBook);
			if (priceBook != oldPriceBook) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.FLUSHING_DESIGN__PRICE_BOOK, oldPriceBook, priceBook));
			}
		}
		return priceBook;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public PriceBook basicGetPriceBook() {
		return priceBook;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPriceBook(PriceBook newPriceBook) {
		PriceBook oldPriceBook = priceBook;
		priceBook = newPriceBook;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.FLUSHING_DESIGN__PRICE_BOOK, oldPriceBook, priceBook));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.FLUSHING_DESIGN__NAME:
				return getName();
			case SitePackage.FLUSHING_DESIGN__ZONE:
				if (resolve) return getZone();
				return basicGetZone();
			case SitePackage.FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY:
				return getDarcyFluxMetresPerDay();
			case SitePackage.FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK:
				return getOperatingDaysPerWeek();
			case SitePackage.FLUSHING_DESIGN__CAPTURE_EFFICIENCY:
				return getCaptureEfficiency();
			case SitePackage.FLUSHING_DESIGN__CRITERION:
				return getCriterion();
			case SitePackage.FLUSHING_DESIGN__MAX_PORE_VOLUMES:
				return getMaxPoreVolumes();
			case SitePackage.FLUSHING_DESIGN__SOLUTION_METHOD:
				return getSolutionMethod();
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_CELL_COUNT:
				return getNumericalCellCount();
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE:
				return getNumericalRelativeTolerance();
			case SitePackage.FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS:
				return getMonitoringIntervalDays();
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_NAME:
				return getAmendmentName();
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE:
				return getAmendmentDoseKilogramsPerCubicMetre();
			case SitePackage.FLUSHING_DESIGN__PRICE_BOOK:
				if (resolve) return getPriceBook();
				return basicGetPriceBook();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case SitePackage.FLUSHING_DESIGN__NAME:
				setName((String)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__ZONE:
				setZone((TreatmentZone)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY:
				setDarcyFluxMetresPerDay((Double)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK:
				setOperatingDaysPerWeek((Double)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__CAPTURE_EFFICIENCY:
				setCaptureEfficiency((Double)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__CRITERION:
				setCriterion((ComplianceCriterion)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__MAX_PORE_VOLUMES:
				setMaxPoreVolumes((Double)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__SOLUTION_METHOD:
				setSolutionMethod((SolutionMethod)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_CELL_COUNT:
				setNumericalCellCount((Integer)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE:
				setNumericalRelativeTolerance((Double)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS:
				setMonitoringIntervalDays((Double)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_NAME:
				setAmendmentName((String)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE:
				setAmendmentDoseKilogramsPerCubicMetre((Double)newValue);
				return;
			case SitePackage.FLUSHING_DESIGN__PRICE_BOOK:
				setPriceBook((PriceBook)newValue);
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
	public void eUnset(int featureID) {
		switch (featureID) {
			case SitePackage.FLUSHING_DESIGN__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__ZONE:
				setZone((TreatmentZone)null);
				return;
			case SitePackage.FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY:
				setDarcyFluxMetresPerDay(DARCY_FLUX_METRES_PER_DAY_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK:
				setOperatingDaysPerWeek(OPERATING_DAYS_PER_WEEK_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__CAPTURE_EFFICIENCY:
				setCaptureEfficiency(CAPTURE_EFFICIENCY_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__CRITERION:
				setCriterion(CRITERION_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__MAX_PORE_VOLUMES:
				setMaxPoreVolumes(MAX_PORE_VOLUMES_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__SOLUTION_METHOD:
				setSolutionMethod(SOLUTION_METHOD_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_CELL_COUNT:
				setNumericalCellCount(NUMERICAL_CELL_COUNT_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE:
				setNumericalRelativeTolerance(NUMERICAL_RELATIVE_TOLERANCE_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS:
				setMonitoringIntervalDays(MONITORING_INTERVAL_DAYS_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_NAME:
				setAmendmentName(AMENDMENT_NAME_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE:
				setAmendmentDoseKilogramsPerCubicMetre(AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE_EDEFAULT);
				return;
			case SitePackage.FLUSHING_DESIGN__PRICE_BOOK:
				setPriceBook((PriceBook)null);
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
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case SitePackage.FLUSHING_DESIGN__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.FLUSHING_DESIGN__ZONE:
				return zone != null;
			case SitePackage.FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY:
				return darcyFluxMetresPerDay != DARCY_FLUX_METRES_PER_DAY_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK:
				return operatingDaysPerWeek != OPERATING_DAYS_PER_WEEK_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__CAPTURE_EFFICIENCY:
				return captureEfficiency != CAPTURE_EFFICIENCY_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__CRITERION:
				return criterion != CRITERION_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__MAX_PORE_VOLUMES:
				return maxPoreVolumes != MAX_PORE_VOLUMES_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__SOLUTION_METHOD:
				return solutionMethod != SOLUTION_METHOD_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_CELL_COUNT:
				return numericalCellCount != NUMERICAL_CELL_COUNT_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE:
				return numericalRelativeTolerance != NUMERICAL_RELATIVE_TOLERANCE_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS:
				return monitoringIntervalDays != MONITORING_INTERVAL_DAYS_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_NAME:
				return AMENDMENT_NAME_EDEFAULT == null ? amendmentName != null : !AMENDMENT_NAME_EDEFAULT.equals(amendmentName);
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE:
				return amendmentDoseKilogramsPerCubicMetre != AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE_EDEFAULT;
			case SitePackage.FLUSHING_DESIGN__PRICE_BOOK:
				return priceBook != null;
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (name: ");
		result.append(name);
		result.append(", darcyFluxMetresPerDay: ");
		result.append(darcyFluxMetresPerDay);
		result.append(", operatingDaysPerWeek: ");
		result.append(operatingDaysPerWeek);
		result.append(", captureEfficiency: ");
		result.append(captureEfficiency);
		result.append(", criterion: ");
		result.append(criterion);
		result.append(", maxPoreVolumes: ");
		result.append(maxPoreVolumes);
		result.append(", solutionMethod: ");
		result.append(solutionMethod);
		result.append(", numericalCellCount: ");
		result.append(numericalCellCount);
		result.append(", numericalRelativeTolerance: ");
		result.append(numericalRelativeTolerance);
		result.append(", monitoringIntervalDays: ");
		result.append(monitoringIntervalDays);
		result.append(", amendmentName: ");
		result.append(amendmentName);
		result.append(", amendmentDoseKilogramsPerCubicMetre: ");
		result.append(amendmentDoseKilogramsPerCubicMetre);
		result.append(')');
		return result.toString();
	}

} //FlushingDesignImpl
