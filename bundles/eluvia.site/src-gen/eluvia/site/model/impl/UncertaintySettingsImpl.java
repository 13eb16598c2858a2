/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.RankCorrelation;
import eluvia.site.model.SitePackage;
import eluvia.site.model.UncertainInput;
import eluvia.site.model.UncertaintySampling;
import eluvia.site.model.UncertaintySettings;

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
 * An implementation of the model object '<em><b>Uncertainty Settings</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.UncertaintySettingsImpl#isEnabled <em>Enabled</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertaintySettingsImpl#getRunCount <em>Run Count</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertaintySettingsImpl#getSeed <em>Seed</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertaintySettingsImpl#getSamplingMethod <em>Sampling Method</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertaintySettingsImpl#getInputs <em>Inputs</em>}</li>
 *   <li>{@link eluvia.site.model.impl.UncertaintySettingsImpl#getRankCorrelations <em>Rank Correlations</em>}</li>
 * </ul>
 *
 * @generated
 */
public class UncertaintySettingsImpl extends MinimalEObjectImpl.Container implements UncertaintySettings {
	/**
	 * The default value of the '{@link #isEnabled() <em>Enabled</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isEnabled()
	 * @generated
	 * @ordered
	 */
	protected static final boolean ENABLED_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isEnabled() <em>Enabled</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isEnabled()
	 * @generated
	 * @ordered
	 */
	protected boolean enabled = ENABLED_EDEFAULT;

	/**
	 * The default value of the '{@link #getRunCount() <em>Run Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRunCount()
	 * @generated
	 * @ordered
	 */
	protected static final int RUN_COUNT_EDEFAULT = 2000;

	/**
	 * The cached value of the '{@link #getRunCount() <em>Run Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRunCount()
	 * @generated
	 * @ordered
	 */
	protected int runCount = RUN_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getSeed() <em>Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSeed()
	 * @generated
	 * @ordered
	 */
	protected static final long SEED_EDEFAULT = 20261201L;

	/**
	 * The cached value of the '{@link #getSeed() <em>Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSeed()
	 * @generated
	 * @ordered
	 */
	protected long seed = SEED_EDEFAULT;

	/**
	 * The default value of the '{@link #getSamplingMethod() <em>Sampling Method</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSamplingMethod()
	 * @generated
	 * @ordered
	 */
	protected static final UncertaintySampling SAMPLING_METHOD_EDEFAULT = UncertaintySampling.LATIN_HYPERCUBE;

	/**
	 * The cached value of the '{@link #getSamplingMethod() <em>Sampling Method</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSamplingMethod()
	 * @generated
	 * @ordered
	 */
	protected UncertaintySampling samplingMethod = SAMPLING_METHOD_EDEFAULT;

	/**
	 * The cached value of the '{@link #getInputs() <em>Inputs</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInputs()
	 * @generated
	 * @ordered
	 */
	protected EList<UncertainInput> inputs;

	/**
	 * The cached value of the '{@link #getRankCorrelations() <em>Rank Correlations</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRankCorrelations()
	 * @generated
	 * @ordered
	 */
	protected EList<RankCorrelation> rankCorrelations;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected UncertaintySettingsImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.UNCERTAINTY_SETTINGS;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isEnabled() {
		return enabled;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEnabled(boolean newEnabled) {
		boolean oldEnabled = enabled;
		enabled = newEnabled;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAINTY_SETTINGS__ENABLED, oldEnabled, enabled));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getRunCount() {
		return runCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRunCount(int newRunCount) {
		int oldRunCount = runCount;
		runCount = newRunCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAINTY_SETTINGS__RUN_COUNT, oldRunCount, runCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public long getSeed() {
		return seed;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSeed(long newSeed) {
		long oldSeed = seed;
		seed = newSeed;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAINTY_SETTINGS__SEED, oldSeed, seed));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public UncertaintySampling getSamplingMethod() {
		return samplingMethod;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSamplingMethod(UncertaintySampling newSamplingMethod) {
		UncertaintySampling oldSamplingMethod = samplingMethod;
		samplingMethod = newSamplingMethod == null ? SAMPLING_METHOD_EDEFAULT : newSamplingMethod;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.UNCERTAINTY_SETTINGS__SAMPLING_METHOD, oldSamplingMethod, samplingMethod));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<UncertainInput> getInputs() {
		if (inputs == null) {
			inputs = new EObjectContainmentEList<UncertainInput>(UncertainInput.class, this, SitePackage.UNCERTAINTY_SETTINGS__INPUTS);
		}
		return inputs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<RankCorrelation> getRankCorrelations() {
		if (rankCorrelations == null) {
			rankCorrelations = new EObjectContainmentEList<RankCorrelation>(RankCorrelation.class, this, SitePackage.UNCERTAINTY_SETTINGS__RANK_CORRELATIONS);
		}
		return rankCorrelations;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case SitePackage.UNCERTAINTY_SETTINGS__INPUTS:
				return ((InternalEList<?>)getInputs()).basicRemove(otherEnd, msgs);
			case SitePackage.UNCERTAINTY_SETTINGS__RANK_CORRELATIONS:
				return ((InternalEList<?>)getRankCorrelations()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.UNCERTAINTY_SETTINGS__ENABLED:
				return isEnabled();
			case SitePackage.UNCERTAINTY_SETTINGS__RUN_COUNT:
				return getRunCount();
			case SitePackage.UNCERTAINTY_SETTINGS__SEED:
				return getSeed();
			case SitePackage.UNCERTAINTY_SETTINGS__SAMPLING_METHOD:
				return getSamplingMethod();
			case SitePackage.UNCERTAINTY_SETTINGS__INPUTS:
				return getInputs();
			case SitePackage.UNCERTAINTY_SETTINGS__RANK_CORRELATIONS:
				return getRankCorrelations();
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
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case SitePackage.UNCERTAINTY_SETTINGS__ENABLED:
				setEnabled((Boolean)newValue);
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__RUN_COUNT:
				setRunCount((Integer)newValue);
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__SEED:
				setSeed((Long)newValue);
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__SAMPLING_METHOD:
				setSamplingMethod((UncertaintySampling)newValue);
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__INPUTS:
				getInputs().clear();
				getInputs().addAll((Collection<? extends UncertainInput>)newValue);
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__RANK_CORRELATIONS:
				getRankCorrelations().clear();
				getRankCorrelations().addAll((Collection<? extends RankCorrelation>)newValue);
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
			case SitePackage.UNCERTAINTY_SETTINGS__ENABLED:
				setEnabled(ENABLED_EDEFAULT);
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__RUN_COUNT:
				setRunCount(RUN_COUNT_EDEFAULT);
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__SEED:
				setSeed(SEED_EDEFAULT);
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__SAMPLING_METHOD:
				setSamplingMethod(SAMPLING_METHOD_EDEFAULT);
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__INPUTS:
				getInputs().clear();
				return;
			case SitePackage.UNCERTAINTY_SETTINGS__RANK_CORRELATIONS:
				getRankCorrelations().clear();
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
			case SitePackage.UNCERTAINTY_SETTINGS__ENABLED:
				return enabled != ENABLED_EDEFAULT;
			case SitePackage.UNCERTAINTY_SETTINGS__RUN_COUNT:
				return runCount != RUN_COUNT_EDEFAULT;
			case SitePackage.UNCERTAINTY_SETTINGS__SEED:
				return seed != SEED_EDEFAULT;
			case SitePackage.UNCERTAINTY_SETTINGS__SAMPLING_METHOD:
				return samplingMethod != SAMPLING_METHOD_EDEFAULT;
			case SitePackage.UNCERTAINTY_SETTINGS__INPUTS:
				return inputs != null && !inputs.isEmpty();
			case SitePackage.UNCERTAINTY_SETTINGS__RANK_CORRELATIONS:
				return rankCorrelations != null && !rankCorrelations.isEmpty();
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
		result.append(" (enabled: ");
		result.append(enabled);
		result.append(", runCount: ");
		result.append(runCount);
		result.append(", seed: ");
		result.append(seed);
		result.append(", samplingMethod: ");
		result.append(samplingMethod);
		result.append(')');
		return result.toString();
	}

} //UncertaintySettingsImpl
