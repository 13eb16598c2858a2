/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.InputDistributionKind;
import eluvia.site.model.SitePackage;
import eluvia.site.model.UncertainInput;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Uncertain Input</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getTarget <em>Target</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getFeatureName <em>Feature Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getDistribution <em>Distribution</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getMeanInFeatureUnit <em>Mean In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getStandardDeviationInFeatureUnit <em>Standard Deviation In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getMedianInFeatureUnit <em>Median In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getGeometricStandardDeviation <em>Geometric Standard Deviation</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getMinimumInFeatureUnit <em>Minimum In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getModeInFeatureUnit <em>Mode In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertainInputImpl#getMaximumInFeatureUnit <em>Maximum In Feature Unit</em>}</li>
 * </ul>
 *
 * @generated
 */
public class UncertainInputImpl extends MinimalEObjectImpl.Container implements UncertainInput {
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
	 * The cached value of the '{@link #getTarget() <em>Target</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTarget()
	 * @generated
	 * @ordered
	 */
	protected EObject target;

	/**
	 * The default value of the '{@link #getFeatureName() <em>Feature Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFeatureName()
	 * @generated
	 * @ordered
	 */
	protected static final String FEATURE_NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getFeatureName() <em>Feature Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFeatureName()
	 * @generated
	 * @ordered
	 */
	protected String featureName = FEATURE_NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getDistribution() <em>Distribution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDistribution()
	 * @generated
	 * @ordered
	 */
	protected static final InputDistributionKind DISTRIBUTION_EDEFAULT = InputDistributionKind.NORMAL;

	/**
	 * The cached value of the '{@link #getDistribution() <em>Distribution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDistribution()
	 * @generated
	 * @ordered
	 */
	protected InputDistributionKind distribution = DISTRIBUTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getMeanInFeatureUnit() <em>Mean In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeanInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected static final double MEAN_IN_FEATURE_UNIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMeanInFeatureUnit() <em>Mean In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeanInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected double meanInFeatureUnit = MEAN_IN_FEATURE_UNIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getStandardDeviationInFeatureUnit() <em>Standard Deviation In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStandardDeviationInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected static final double STANDARD_DEVIATION_IN_FEATURE_UNIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getStandardDeviationInFeatureUnit() <em>Standard Deviation In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStandardDeviationInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected double standardDeviationInFeatureUnit = STANDARD_DEVIATION_IN_FEATURE_UNIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getMedianInFeatureUnit() <em>Median In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMedianInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected static final double MEDIAN_IN_FEATURE_UNIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMedianInFeatureUnit() <em>Median In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMedianInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected double medianInFeatureUnit = MEDIAN_IN_FEATURE_UNIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getGeometricStandardDeviation() <em>Geometric Standard Deviation</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGeometricStandardDeviation()
	 * @generated
	 * @ordered
	 */
	protected static final double GEOMETRIC_STANDARD_DEVIATION_EDEFAULT = 1.0;

	/**
	 * The cached value of the '{@link #getGeometricStandardDeviation() <em>Geometric Standard Deviation</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGeometricStandardDeviation()
	 * @generated
	 * @ordered
	 */
	protected double geometricStandardDeviation = GEOMETRIC_STANDARD_DEVIATION_EDEFAULT;

	/**
	 * The default value of the '{@link #getMinimumInFeatureUnit() <em>Minimum In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMinimumInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected static final double MINIMUM_IN_FEATURE_UNIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMinimumInFeatureUnit() <em>Minimum In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMinimumInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected double minimumInFeatureUnit = MINIMUM_IN_FEATURE_UNIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getModeInFeatureUnit() <em>Mode In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getModeInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected static final double MODE_IN_FEATURE_UNIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getModeInFeatureUnit() <em>Mode In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getModeInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected double modeInFeatureUnit = MODE_IN_FEATURE_UNIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaximumInFeatureUnit() <em>Maximum In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected static final double MAXIMUM_IN_FEATURE_UNIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaximumInFeatureUnit() <em>Maximum In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumInFeatureUnit()
	 * @generated
	 * @ordered
	 */
	protected double maximumInFeatureUnit = MAXIMUM_IN_FEATURE_UNIT_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected UncertainInputImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.UNCERTAIN_INPUT;
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EObject getTarget() {
		if (target != null && target.eIsProxy()) {
			InternalEObject oldTarget = (InternalEObject)target;
			target = eResolveProxy(oldTarget);
			if (target != oldTarget) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.UNCERTAIN_INPUT__TARGET, oldTarget, target));
			}
		}
		return target;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public EObject basicGetTarget() {
		return target;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTarget(EObject newTarget) {
		EObject oldTarget = target;
		target = newTarget;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__TARGET, oldTarget, target));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getFeatureName() {
		return featureName;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFeatureName(String newFeatureName) {
		String oldFeatureName = featureName;
		featureName = newFeatureName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__FEATURE_NAME, oldFeatureName, featureName));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public InputDistributionKind getDistribution() {
		return distribution;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDistribution(InputDistributionKind newDistribution) {
		InputDistributionKind oldDistribution = distribution;
		distribution = newDistribution == null ? DISTRIBUTION_EDEFAULT : newDistribution;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__DISTRIBUTION, oldDistribution, distribution));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMeanInFeatureUnit() {
		return meanInFeatureUnit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMeanInFeatureUnit(double newMeanInFeatureUnit) {
		double oldMeanInFeatureUnit = meanInFeatureUnit;
		meanInFeatureUnit = newMeanInFeatureUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT, oldMeanInFeatureUnit, meanInFeatureUnit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getStandardDeviationInFeatureUnit() {
		return standardDeviationInFeatureUnit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStandardDeviationInFeatureUnit(double newStandardDeviationInFeatureUnit) {
		double oldStandardDeviationInFeatureUnit = standardDeviationInFeatureUnit;
		standardDeviationInFeatureUnit = newStandardDeviationInFeatureUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT, oldStandardDeviationInFeatureUnit, standardDeviationInFeatureUnit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMedianInFeatureUnit() {
		return medianInFeatureUnit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMedianInFeatureUnit(double newMedianInFeatureUnit) {
		double oldMedianInFeatureUnit = medianInFeatureUnit;
		medianInFeatureUnit = newMedianInFeatureUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT, oldMedianInFeatureUnit, medianInFeatureUnit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getGeometricStandardDeviation() {
		return geometricStandardDeviation;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setGeometricStandardDeviation(double newGeometricStandardDeviation) {
		double oldGeometricStandardDeviation = geometricStandardDeviation;
		geometricStandardDeviation = newGeometricStandardDeviation;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION, oldGeometricStandardDeviation, geometricStandardDeviation));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMinimumInFeatureUnit() {
		return minimumInFeatureUnit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMinimumInFeatureUnit(double newMinimumInFeatureUnit) {
		double oldMinimumInFeatureUnit = minimumInFeatureUnit;
		minimumInFeatureUnit = newMinimumInFeatureUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT, oldMinimumInFeatureUnit, minimumInFeatureUnit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getModeInFeatureUnit() {
		return modeInFeatureUnit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setModeInFeatureUnit(double newModeInFeatureUnit) {
		double oldModeInFeatureUnit = modeInFeatureUnit;
		modeInFeatureUnit = newModeInFeatureUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT, oldModeInFeatureUnit, modeInFeatureUnit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaximumInFeatureUnit() {
		return maximumInFeatureUnit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaximumInFeatureUnit(double newMaximumInFeatureUnit) {
		double oldMaximumInFeatureUnit = maximumInFeatureUnit;
		maximumInFeatureUnit = newMaximumInFeatureUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT, oldMaximumInFeatureUnit, maximumInFeatureUnit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.UNCERTAIN_INPUT__NAME:
				return getName();
			case SitePackage.UNCERTAIN_INPUT__TARGET:
				if (resolve) return getTarget();
				return basicGetTarget();
			case SitePackage.UNCERTAIN_INPUT__FEATURE_NAME:
				return getFeatureName();
			case SitePackage.UNCERTAIN_INPUT__DISTRIBUTION:
				return getDistribution();
			case SitePackage.UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT:
				return getMeanInFeatureUnit();
			case SitePackage.UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT:
				return getStandardDeviationInFeatureUnit();
			case SitePackage.UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT:
				return getMedianInFeatureUnit();
			case SitePackage.UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION:
				return getGeometricStandardDeviation();
			case SitePackage.UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT:
				return getMinimumInFeatureUnit();
			case SitePackage.UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT:
				return getModeInFeatureUnit();
			case SitePackage.UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT:
				return getMaximumInFeatureUnit();
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
			case SitePackage.UNCERTAIN_INPUT__NAME:
				setName((String)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__TARGET:
				setTarget((EObject)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__FEATURE_NAME:
				setFeatureName((String)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__DISTRIBUTION:
				setDistribution((InputDistributionKind)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT:
				setMeanInFeatureUnit((Double)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT:
				setStandardDeviationInFeatureUnit((Double)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT:
				setMedianInFeatureUnit((Double)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION:
				setGeometricStandardDeviation((Double)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT:
				setMinimumInFeatureUnit((Double)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT:
				setModeInFeatureUnit((Double)newValue);
				return;
			case SitePackage.UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT:
				setMaximumInFeatureUnit((Double)newValue);
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
			case SitePackage.UNCERTAIN_INPUT__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.UNCERTAIN_INPUT__TARGET:
				setTarget((EObject)null);
				return;
			case SitePackage.UNCERTAIN_INPUT__FEATURE_NAME:
				setFeatureName(FEATURE_NAME_EDEFAULT);
				return;
			case SitePackage.UNCERTAIN_INPUT__DISTRIBUTION:
				setDistribution(DISTRIBUTION_EDEFAULT);
				return;
			case SitePackage.UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT:
				setMeanInFeatureUnit(MEAN_IN_FEATURE_UNIT_EDEFAULT);
				return;
			case SitePackage.UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT:
				setStandardDeviationInFeatureUnit(STANDARD_DEVIATION_IN_FEATURE_UNIT_EDEFAULT);
				return;
			case SitePackage.UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT:
				setMedianInFeatureUnit(MEDIAN_IN_FEATURE_UNIT_EDEFAULT);
				return;
			case SitePackage.UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION:
				setGeometricStandardDeviation(GEOMETRIC_STANDARD_DEVIATION_EDEFAULT);
				return;
			case SitePackage.UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT:
				setMinimumInFeatureUnit(MINIMUM_IN_FEATURE_UNIT_EDEFAULT);
				return;
			case SitePackage.UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT:
				setModeInFeatureUnit(MODE_IN_FEATURE_UNIT_EDEFAULT);
				return;
			case SitePackage.UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT:
				setMaximumInFeatureUnit(MAXIMUM_IN_FEATURE_UNIT_EDEFAULT);
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
			case SitePackage.UNCERTAIN_INPUT__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.UNCERTAIN_INPUT__TARGET:
				return target != null;
			case SitePackage.UNCERTAIN_INPUT__FEATURE_NAME:
				return FEATURE_NAME_EDEFAULT == null ? featureName != null : !FEATURE_NAME_EDEFAULT.equals(featureName);
			case SitePackage.UNCERTAIN_INPUT__DISTRIBUTION:
				return distribution != DISTRIBUTION_EDEFAULT;
			case SitePackage.UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT:
				return meanInFeatureUnit != MEAN_IN_FEATURE_UNIT_EDEFAULT;
			case SitePackage.UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT:
				return standardDeviationInFeatureUnit != STANDARD_DEVIATION_IN_FEATURE_UNIT_EDEFAULT;
			case SitePackage.UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT:
				return medianInFeatureUnit != MEDIAN_IN_FEATURE_UNIT_EDEFAULT;
			case SitePackage.UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION:
				return geometricStandardDeviation != GEOMETRIC_STANDARD_DEVIATION_EDEFAULT;
			case SitePackage.UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT:
				return minimumInFeatureUnit != MINIMUM_IN_FEATURE_UNIT_EDEFAULT;
			case SitePackage.UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT:
				return modeInFeatureUnit != MODE_IN_FEATURE_UNIT_EDEFAULT;
			case SitePackage.UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT:
				return maximumInFeatureUnit != MAXIMUM_IN_FEATURE_UNIT_EDEFAULT;
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
		result.append(", featureName: ");
		result.append(featureName);
		result.append(", distribution: ");
		result.append(distribution);
		result.append(", meanInFeatureUnit: ");
		result.append(meanInFeatureUnit);
		result.append(", standardDeviationInFeatureUnit: ");
		result.append(standardDeviationInFeatureUnit);
		result.append(", medianInFeatureUnit: ");
		result.append(medianInFeatureUnit);
		result.append(", geometricStandardDeviation: ");
		result.append(geometricStandardDeviation);
		result.append(", minimumInFeatureUnit: ");
		result.append(minimumInFeatureUnit);
		result.append(", modeInFeatureUnit: ");
		result.append(modeInFeatureUnit);
		result.append(", maximumInFeatureUnit: ");
		result.append(maximumInFeatureUnit);
		result.append(')');
		return result.toString();
	}

} //UncertainInputImpl
