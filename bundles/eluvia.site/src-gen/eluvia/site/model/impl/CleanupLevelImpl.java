/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ComplianceStatistic;
import eluvia.site.model.Contaminant;
import eluvia.site.model.SitePackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Cleanup Level</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.CleanupLevelImpl#getContaminant <em>Contaminant</em>}</li>
 *   <li>{@link eluvia.site.model.impl.CleanupLevelImpl#getSoilLevelMilligramsPerKg <em>Soil Level Milligrams Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.impl.CleanupLevelImpl#getBasis <em>Basis</em>}</li>
 *   <li>{@link eluvia.site.model.impl.CleanupLevelImpl#isSoilLevelEntered <em>Soil Level Entered</em>}</li>
 *   <li>{@link eluvia.site.model.impl.CleanupLevelImpl#isPorewaterLevelEntered <em>Porewater Level Entered</em>}</li>
 *   <li>{@link eluvia.site.model.impl.CleanupLevelImpl#getPorewaterLevelMilligramsPerLitre <em>Porewater Level Milligrams Per Litre</em>}</li>
 *   <li>{@link eluvia.site.model.impl.CleanupLevelImpl#getStatistic <em>Statistic</em>}</li>
 * </ul>
 *
 * @generated
 */
public class CleanupLevelImpl extends MinimalEObjectImpl.Container implements CleanupLevel {
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
	 * The default value of the '{@link #getSoilLevelMilligramsPerKg() <em>Soil Level Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoilLevelMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected static final double SOIL_LEVEL_MILLIGRAMS_PER_KG_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSoilLevelMilligramsPerKg() <em>Soil Level Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoilLevelMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected double soilLevelMilligramsPerKg = SOIL_LEVEL_MILLIGRAMS_PER_KG_EDEFAULT;

	/**
	 * The default value of the '{@link #getBasis() <em>Basis</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBasis()
	 * @generated
	 * @ordered
	 */
	protected static final String BASIS_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getBasis() <em>Basis</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBasis()
	 * @generated
	 * @ordered
	 */
	protected String basis = BASIS_EDEFAULT;

	/**
	 * The default value of the '{@link #isSoilLevelEntered() <em>Soil Level Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSoilLevelEntered()
	 * @generated
	 * @ordered
	 */
	protected static final boolean SOIL_LEVEL_ENTERED_EDEFAULT = true;

	/**
	 * The cached value of the '{@link #isSoilLevelEntered() <em>Soil Level Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSoilLevelEntered()
	 * @generated
	 * @ordered
	 */
	protected boolean soilLevelEntered = SOIL_LEVEL_ENTERED_EDEFAULT;

	/**
	 * The default value of the '{@link #isPorewaterLevelEntered() <em>Porewater Level Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isPorewaterLevelEntered()
	 * @generated
	 * @ordered
	 */
	protected static final boolean POREWATER_LEVEL_ENTERED_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isPorewaterLevelEntered() <em>Porewater Level Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isPorewaterLevelEntered()
	 * @generated
	 * @ordered
	 */
	protected boolean porewaterLevelEntered = POREWATER_LEVEL_ENTERED_EDEFAULT;

	/**
	 * The default value of the '{@link #getPorewaterLevelMilligramsPerLitre() <em>Porewater Level Milligrams Per Litre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPorewaterLevelMilligramsPerLitre()
	 * @generated
	 * @ordered
	 */
	protected static final double POREWATER_LEVEL_MILLIGRAMS_PER_LITRE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPorewaterLevelMilligramsPerLitre() <em>Porewater Level Milligrams Per Litre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPorewaterLevelMilligramsPerLitre()
	 * @generated
	 * @ordered
	 */
	protected double porewaterLevelMilligramsPerLitre = POREWATER_LEVEL_MILLIGRAMS_PER_LITRE_EDEFAULT;

	/**
	 * The default value of the '{@link #getStatistic() <em>Statistic</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatistic()
	 * @generated
	 * @ordered
	 */
	protected static final ComplianceStatistic STATISTIC_EDEFAULT = ComplianceStatistic.NOT_TO_EXCEED;

	/**
	 * The cached value of the '{@link #getStatistic() <em>Statistic</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatistic()
	 * @generated
	 * @ordered
	 */
	protected ComplianceStatistic statistic = STATISTIC_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected CleanupLevelImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.CLEANUP_LEVEL;
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
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.CLEANUP_LEVEL__CONTAMINANT, oldContaminant, contaminant));
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CLEANUP_LEVEL__CONTAMINANT, oldContaminant, contaminant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSoilLevelMilligramsPerKg() {
		return soilLevelMilligramsPerKg;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSoilLevelMilligramsPerKg(double newSoilLevelMilligramsPerKg) {
		double oldSoilLevelMilligramsPerKg = soilLevelMilligramsPerKg;
		soilLevelMilligramsPerKg = newSoilLevelMilligramsPerKg;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG, oldSoilLevelMilligramsPerKg, soilLevelMilligramsPerKg));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getBasis() {
		return basis;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBasis(String newBasis) {
		String oldBasis = basis;
		basis = newBasis;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CLEANUP_LEVEL__BASIS, oldBasis, basis));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSoilLevelEntered() {
		return soilLevelEntered;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSoilLevelEntered(boolean newSoilLevelEntered) {
		boolean oldSoilLevelEntered = soilLevelEntered;
		soilLevelEntered = newSoilLevelEntered;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_ENTERED, oldSoilLevelEntered, soilLevelEntered));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isPorewaterLevelEntered() {
		return porewaterLevelEntered;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPorewaterLevelEntered(boolean newPorewaterLevelEntered) {
		boolean oldPorewaterLevelEntered = porewaterLevelEntered;
		porewaterLevelEntered = newPorewaterLevelEntered;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED, oldPorewaterLevelEntered, porewaterLevelEntered));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPorewaterLevelMilligramsPerLitre() {
		return porewaterLevelMilligramsPerLitre;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPorewaterLevelMilligramsPerLitre(double newPorewaterLevelMilligramsPerLitre) {
		double oldPorewaterLevelMilligramsPerLitre = porewaterLevelMilligramsPerLitre;
		porewaterLevelMilligramsPerLitre = newPorewaterLevelMilligramsPerLitre;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE, oldPorewaterLevelMilligramsPerLitre, porewaterLevelMilligramsPerLitre));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ComplianceStatistic getStatistic() {
		return statistic;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStatistic(ComplianceStatistic newStatistic) {
		ComplianceStatistic oldStatistic = statistic;
		statistic = newStatistic == null ? STATISTIC_EDEFAULT : newStatistic;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CLEANUP_LEVEL__STATISTIC, oldStatistic, statistic));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.CLEANUP_LEVEL__CONTAMINANT:
				if (resolve) return getContaminant();
				return basicGetContaminant();
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG:
				return getSoilLevelMilligramsPerKg();
			case SitePackage.CLEANUP_LEVEL__BASIS:
				return getBasis();
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_ENTERED:
				return isSoilLevelEntered();
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED:
				return isPorewaterLevelEntered();
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE:
				return getPorewaterLevelMilligramsPerLitre();
			case SitePackage.CLEANUP_LEVEL__STATISTIC:
				return getStatistic();
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
			case SitePackage.CLEANUP_LEVEL__CONTAMINANT:
				setContaminant((Contaminant)newValue);
				return;
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG:
				setSoilLevelMilligramsPerKg((Double)newValue);
				return;
			case SitePackage.CLEANUP_LEVEL__BASIS:
				setBasis((String)newValue);
				return;
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_ENTERED:
				setSoilLevelEntered((Boolean)newValue);
				return;
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED:
				setPorewaterLevelEntered((Boolean)newValue);
				return;
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE:
				setPorewaterLevelMilligramsPerLitre((Double)newValue);
				return;
			case SitePackage.CLEANUP_LEVEL__STATISTIC:
				setStatistic((ComplianceStatistic)newValue);
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
			case SitePackage.CLEANUP_LEVEL__CONTAMINANT:
				setContaminant((Contaminant)null);
				return;
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG:
				setSoilLevelMilligramsPerKg(SOIL_LEVEL_MILLIGRAMS_PER_KG_EDEFAULT);
				return;
			case SitePackage.CLEANUP_LEVEL__BASIS:
				setBasis(BASIS_EDEFAULT);
				return;
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_ENTERED:
				setSoilLevelEntered(SOIL_LEVEL_ENTERED_EDEFAULT);
				return;
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED:
				setPorewaterLevelEntered(POREWATER_LEVEL_ENTERED_EDEFAULT);
				return;
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE:
				setPorewaterLevelMilligramsPerLitre(POREWATER_LEVEL_MILLIGRAMS_PER_LITRE_EDEFAULT);
				return;
			case SitePackage.CLEANUP_LEVEL__STATISTIC:
				setStatistic(STATISTIC_EDEFAULT);
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
			case SitePackage.CLEANUP_LEVEL__CONTAMINANT:
				return contaminant != null;
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG:
				return soilLevelMilligramsPerKg != SOIL_LEVEL_MILLIGRAMS_PER_KG_EDEFAULT;
			case SitePackage.CLEANUP_LEVEL__BASIS:
				return BASIS_EDEFAULT == null ? basis != null : !BASIS_EDEFAULT.equals(basis);
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_ENTERED:
				return soilLevelEntered != SOIL_LEVEL_ENTERED_EDEFAULT;
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED:
				return porewaterLevelEntered != POREWATER_LEVEL_ENTERED_EDEFAULT;
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE:
				return porewaterLevelMilligramsPerLitre != POREWATER_LEVEL_MILLIGRAMS_PER_LITRE_EDEFAULT;
			case SitePackage.CLEANUP_LEVEL__STATISTIC:
				return statistic != STATISTIC_EDEFAULT;
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
		result.append(" (soilLevelMilligramsPerKg: ");
		result.append(soilLevelMilligramsPerKg);
		result.append(", basis: ");
		result.append(basis);
		result.append(", soilLevelEntered: ");
		result.append(soilLevelEntered);
		result.append(", porewaterLevelEntered: ");
		result.append(porewaterLevelEntered);
		result.append(", porewaterLevelMilligramsPerLitre: ");
		result.append(porewaterLevelMilligramsPerLitre);
		result.append(", statistic: ");
		result.append(statistic);
		result.append(')');
		return result.toString();
	}

} //CleanupLevelImpl
