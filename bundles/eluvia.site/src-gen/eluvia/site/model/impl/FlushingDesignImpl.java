/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.SitePackage;
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
		result.append(')');
		return result.toString();
	}

} //FlushingDesignImpl
