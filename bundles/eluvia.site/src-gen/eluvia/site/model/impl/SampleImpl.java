/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.Contaminant;
import eluvia.site.model.Sample;
import eluvia.site.model.SitePackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Sample</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.SampleImpl#getTopDepthMetres <em>Top Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SampleImpl#getBottomDepthMetres <em>Bottom Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SampleImpl#getContaminant <em>Contaminant</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SampleImpl#getConcentrationMilligramsPerKg <em>Concentration Milligrams Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SampleImpl#isNonDetect <em>Non Detect</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SampleImpl#getDetectionLimitMilligramsPerKg <em>Detection Limit Milligrams Per Kg</em>}</li>
 * </ul>
 *
 * @generated
 */
public class SampleImpl extends MinimalEObjectImpl.Container implements Sample {
	/**
	 * The default value of the '{@link #getTopDepthMetres() <em>Top Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTopDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double TOP_DEPTH_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTopDepthMetres() <em>Top Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTopDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected double topDepthMetres = TOP_DEPTH_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getBottomDepthMetres() <em>Bottom Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBottomDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double BOTTOM_DEPTH_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBottomDepthMetres() <em>Bottom Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBottomDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected double bottomDepthMetres = BOTTOM_DEPTH_METRES_EDEFAULT;

	/**
	 * The cached value of the '{@link #getContaminant() <em>Contaminant</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContaminant()
	 * @generated
	 * @ordered
	 */
	protected Contaminant contaminant;

	/**
	 * The default value of the '{@link #getConcentrationMilligramsPerKg() <em>Concentration Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConcentrationMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected static final double CONCENTRATION_MILLIGRAMS_PER_KG_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getConcentrationMilligramsPerKg() <em>Concentration Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConcentrationMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected double concentrationMilligramsPerKg = CONCENTRATION_MILLIGRAMS_PER_KG_EDEFAULT;

	/**
	 * The default value of the '{@link #isNonDetect() <em>Non Detect</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isNonDetect()
	 * @generated
	 * @ordered
	 */
	protected static final boolean NON_DETECT_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isNonDetect() <em>Non Detect</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isNonDetect()
	 * @generated
	 * @ordered
	 */
	protected boolean nonDetect = NON_DETECT_EDEFAULT;

	/**
	 * The default value of the '{@link #getDetectionLimitMilligramsPerKg() <em>Detection Limit Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDetectionLimitMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected static final double DETECTION_LIMIT_MILLIGRAMS_PER_KG_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDetectionLimitMilligramsPerKg() <em>Detection Limit Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDetectionLimitMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected double detectionLimitMilligramsPerKg = DETECTION_LIMIT_MILLIGRAMS_PER_KG_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SampleImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.SAMPLE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTopDepthMetres() {
		return topDepthMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTopDepthMetres(double newTopDepthMetres) {
		double oldTopDepthMetres = topDepthMetres;
		topDepthMetres = newTopDepthMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLE__TOP_DEPTH_METRES, oldTopDepthMetres, topDepthMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBottomDepthMetres() {
		return bottomDepthMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBottomDepthMetres(double newBottomDepthMetres) {
		double oldBottomDepthMetres = bottomDepthMetres;
		bottomDepthMetres = newBottomDepthMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLE__BOTTOM_DEPTH_METRES, oldBottomDepthMetres, bottomDepthMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Contaminant getContaminant() {
		if (contaminant != null && contaminant.eIsProxy()) {
			InternalEObject oldContaminant = (InternalEObject)contaminant;
			contaminant = (Contaminant)eResolveProxy(oldContaminant);
			if (contaminant != oldContaminant) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.SAMPLE__CONTAMINANT, oldContaminant, contaminant));
			}
		}
		return contaminant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Contaminant basicGetContaminant() {
		return contaminant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setContaminant(Contaminant newContaminant) {
		Contaminant oldContaminant = contaminant;
		contaminant = newContaminant;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLE__CONTAMINANT, oldContaminant, contaminant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getConcentrationMilligramsPerKg() {
		return concentrationMilligramsPerKg;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setConcentrationMilligramsPerKg(double newConcentrationMilligramsPerKg) {
		double oldConcentrationMilligramsPerKg = concentrationMilligramsPerKg;
		concentrationMilligramsPerKg = newConcentrationMilligramsPerKg;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLE__CONCENTRATION_MILLIGRAMS_PER_KG, oldConcentrationMilligramsPerKg, concentrationMilligramsPerKg));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isNonDetect() {
		return nonDetect;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNonDetect(boolean newNonDetect) {
		boolean oldNonDetect = nonDetect;
		nonDetect = newNonDetect;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLE__NON_DETECT, oldNonDetect, nonDetect));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDetectionLimitMilligramsPerKg() {
		return detectionLimitMilligramsPerKg;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDetectionLimitMilligramsPerKg(double newDetectionLimitMilligramsPerKg) {
		double oldDetectionLimitMilligramsPerKg = detectionLimitMilligramsPerKg;
		detectionLimitMilligramsPerKg = newDetectionLimitMilligramsPerKg;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLE__DETECTION_LIMIT_MILLIGRAMS_PER_KG, oldDetectionLimitMilligramsPerKg, detectionLimitMilligramsPerKg));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.SAMPLE__TOP_DEPTH_METRES:
				return getTopDepthMetres();
			case SitePackage.SAMPLE__BOTTOM_DEPTH_METRES:
				return getBottomDepthMetres();
			case SitePackage.SAMPLE__CONTAMINANT:
				if (resolve) return getContaminant();
				return basicGetContaminant();
			case SitePackage.SAMPLE__CONCENTRATION_MILLIGRAMS_PER_KG:
				return getConcentrationMilligramsPerKg();
			case SitePackage.SAMPLE__NON_DETECT:
				return isNonDetect();
			case SitePackage.SAMPLE__DETECTION_LIMIT_MILLIGRAMS_PER_KG:
				return getDetectionLimitMilligramsPerKg();
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
			case SitePackage.SAMPLE__TOP_DEPTH_METRES:
				setTopDepthMetres((Double)newValue);
				return;
			case SitePackage.SAMPLE__BOTTOM_DEPTH_METRES:
				setBottomDepthMetres((Double)newValue);
				return;
			case SitePackage.SAMPLE__CONTAMINANT:
				setContaminant((Contaminant)newValue);
				return;
			case SitePackage.SAMPLE__CONCENTRATION_MILLIGRAMS_PER_KG:
				setConcentrationMilligramsPerKg((Double)newValue);
				return;
			case SitePackage.SAMPLE__NON_DETECT:
				setNonDetect((Boolean)newValue);
				return;
			case SitePackage.SAMPLE__DETECTION_LIMIT_MILLIGRAMS_PER_KG:
				setDetectionLimitMilligramsPerKg((Double)newValue);
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
			case SitePackage.SAMPLE__TOP_DEPTH_METRES:
				setTopDepthMetres(TOP_DEPTH_METRES_EDEFAULT);
				return;
			case SitePackage.SAMPLE__BOTTOM_DEPTH_METRES:
				setBottomDepthMetres(BOTTOM_DEPTH_METRES_EDEFAULT);
				return;
			case SitePackage.SAMPLE__CONTAMINANT:
				setContaminant((Contaminant)null);
				return;
			case SitePackage.SAMPLE__CONCENTRATION_MILLIGRAMS_PER_KG:
				setConcentrationMilligramsPerKg(CONCENTRATION_MILLIGRAMS_PER_KG_EDEFAULT);
				return;
			case SitePackage.SAMPLE__NON_DETECT:
				setNonDetect(NON_DETECT_EDEFAULT);
				return;
			case SitePackage.SAMPLE__DETECTION_LIMIT_MILLIGRAMS_PER_KG:
				setDetectionLimitMilligramsPerKg(DETECTION_LIMIT_MILLIGRAMS_PER_KG_EDEFAULT);
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
			case SitePackage.SAMPLE__TOP_DEPTH_METRES:
				return topDepthMetres != TOP_DEPTH_METRES_EDEFAULT;
			case SitePackage.SAMPLE__BOTTOM_DEPTH_METRES:
				return bottomDepthMetres != BOTTOM_DEPTH_METRES_EDEFAULT;
			case SitePackage.SAMPLE__CONTAMINANT:
				return contaminant != null;
			case SitePackage.SAMPLE__CONCENTRATION_MILLIGRAMS_PER_KG:
				return concentrationMilligramsPerKg != CONCENTRATION_MILLIGRAMS_PER_KG_EDEFAULT;
			case SitePackage.SAMPLE__NON_DETECT:
				return nonDetect != NON_DETECT_EDEFAULT;
			case SitePackage.SAMPLE__DETECTION_LIMIT_MILLIGRAMS_PER_KG:
				return detectionLimitMilligramsPerKg != DETECTION_LIMIT_MILLIGRAMS_PER_KG_EDEFAULT;
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
		result.append(" (topDepthMetres: ");
		result.append(topDepthMetres);
		result.append(", bottomDepthMetres: ");
		result.append(bottomDepthMetres);
		result.append(", concentrationMilligramsPerKg: ");
		result.append(concentrationMilligramsPerKg);
		result.append(", nonDetect: ");
		result.append(nonDetect);
		result.append(", detectionLimitMilligramsPerKg: ");
		result.append(detectionLimitMilligramsPerKg);
		result.append(')');
		return result.toString();
	}

} //SampleImpl
