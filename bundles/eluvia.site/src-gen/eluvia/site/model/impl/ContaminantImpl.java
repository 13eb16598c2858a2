/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.Contaminant;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.SitePackage;

import eluvia.site.model.SorptionIsotherm;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Contaminant</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getCasNumber <em>Cas Number</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getKocLitresPerKg <em>Koc Litres Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#isKdEntered <em>Kd Entered</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getKdLitresPerKg <em>Kd Litres Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getDiffusionSquareMetresPerSecond <em>Diffusion Square Metres Per Second</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getHalfLifeDays <em>Half Life Days</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getIsotherm <em>Isotherm</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getFreundlichKfMgPerKgPerMgPerLitreToN <em>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getFreundlichExponent <em>Freundlich Exponent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getLangmuirMaximumMilligramsPerKg <em>Langmuir Maximum Milligrams Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getLangmuirConstantLitresPerMilligram <em>Langmuir Constant Litres Per Milligram</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getWaterSolubilityMilligramsPerLitre <em>Water Solubility Milligrams Per Litre</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getNonequilibrium <em>Nonequilibrium</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getBeta <em>Beta</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getOmega <em>Omega</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getMobileWaterFraction <em>Mobile Water Fraction</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getMobileSiteFraction <em>Mobile Site Fraction</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getMassTransferRatePerDay <em>Mass Transfer Rate Per Day</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getPropertySource <em>Property Source</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ContaminantImpl extends MinimalEObjectImpl.Container implements Contaminant {
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
	 * The default value of the '{@link #getCasNumber() <em>Cas Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCasNumber()
	 * @generated
	 * @ordered
	 */
	protected static final String CAS_NUMBER_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCasNumber() <em>Cas Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCasNumber()
	 * @generated
	 * @ordered
	 */
	protected String casNumber = CAS_NUMBER_EDEFAULT;

	/**
	 * The default value of the '{@link #getKocLitresPerKg() <em>Koc Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKocLitresPerKg()
	 * @generated
	 * @ordered
	 */
	protected static final double KOC_LITRES_PER_KG_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getKocLitresPerKg() <em>Koc Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKocLitresPerKg()
	 * @generated
	 * @ordered
	 */
	protected double kocLitresPerKg = KOC_LITRES_PER_KG_EDEFAULT;

	/**
	 * The default value of the '{@link #isKdEntered() <em>Kd Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isKdEntered()
	 * @generated
	 * @ordered
	 */
	protected static final boolean KD_ENTERED_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isKdEntered() <em>Kd Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isKdEntered()
	 * @generated
	 * @ordered
	 */
	protected boolean kdEntered = KD_ENTERED_EDEFAULT;

	/**
	 * The default value of the '{@link #getKdLitresPerKg() <em>Kd Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKdLitresPerKg()
	 * @generated
	 * @ordered
	 */
	protected static final double KD_LITRES_PER_KG_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getKdLitresPerKg() <em>Kd Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKdLitresPerKg()
	 * @generated
	 * @ordered
	 */
	protected double kdLitresPerKg = KD_LITRES_PER_KG_EDEFAULT;

	/**
	 * The default value of the '{@link #getDiffusionSquareMetresPerSecond() <em>Diffusion Square Metres Per Second</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiffusionSquareMetresPerSecond()
	 * @generated
	 * @ordered
	 */
	protected static final double DIFFUSION_SQUARE_METRES_PER_SECOND_EDEFAULT = 1.0E-9;

	/**
	 * The cached value of the '{@link #getDiffusionSquareMetresPerSecond() <em>Diffusion Square Metres Per Second</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiffusionSquareMetresPerSecond()
	 * @generated
	 * @ordered
	 */
	protected double diffusionSquareMetresPerSecond = DIFFUSION_SQUARE_METRES_PER_SECOND_EDEFAULT;

	/**
	 * The default value of the '{@link #getHalfLifeDays() <em>Half Life Days</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHalfLifeDays()
	 * @generated
	 * @ordered
	 */
	protected static final double HALF_LIFE_DAYS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getHalfLifeDays() <em>Half Life Days</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHalfLifeDays()
	 * @generated
	 * @ordered
	 */
	protected double halfLifeDays = HALF_LIFE_DAYS_EDEFAULT;

	/**
	 * The default value of the '{@link #getIsotherm() <em>Isotherm</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIsotherm()
	 * @generated
	 * @ordered
	 */
	protected static final SorptionIsotherm ISOTHERM_EDEFAULT = SorptionIsotherm.LINEAR;

	/**
	 * The cached value of the '{@link #getIsotherm() <em>Isotherm</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIsotherm()
	 * @generated
	 * @ordered
	 */
	protected SorptionIsotherm isotherm = ISOTHERM_EDEFAULT;

	/**
	 * The default value of the '{@link #getFreundlichKfMgPerKgPerMgPerLitreToN() <em>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFreundlichKfMgPerKgPerMgPerLitreToN()
	 * @generated
	 * @ordered
	 */
	protected static final double FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getFreundlichKfMgPerKgPerMgPerLitreToN() <em>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFreundlichKfMgPerKgPerMgPerLitreToN()
	 * @generated
	 * @ordered
	 */
	protected double freundlichKfMgPerKgPerMgPerLitreToN = FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N_EDEFAULT;

	/**
	 * The default value of the '{@link #getFreundlichExponent() <em>Freundlich Exponent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFreundlichExponent()
	 * @generated
	 * @ordered
	 */
	protected static final double FREUNDLICH_EXPONENT_EDEFAULT = 1.0;

	/**
	 * The cached value of the '{@link #getFreundlichExponent() <em>Freundlich Exponent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFreundlichExponent()
	 * @generated
	 * @ordered
	 */
	protected double freundlichExponent = FREUNDLICH_EXPONENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getLangmuirMaximumMilligramsPerKg() <em>Langmuir Maximum Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLangmuirMaximumMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected static final double LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLangmuirMaximumMilligramsPerKg() <em>Langmuir Maximum Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLangmuirMaximumMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected double langmuirMaximumMilligramsPerKg = LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG_EDEFAULT;

	/**
	 * The default value of the '{@link #getLangmuirConstantLitresPerMilligram() <em>Langmuir Constant Litres Per Milligram</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLangmuirConstantLitresPerMilligram()
	 * @generated
	 * @ordered
	 */
	protected static final double LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLangmuirConstantLitresPerMilligram() <em>Langmuir Constant Litres Per Milligram</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLangmuirConstantLitresPerMilligram()
	 * @generated
	 * @ordered
	 */
	protected double langmuirConstantLitresPerMilligram = LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM_EDEFAULT;

	/**
	 * The default value of the '{@link #getWaterSolubilityMilligramsPerLitre() <em>Water Solubility Milligrams Per Litre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWaterSolubilityMilligramsPerLitre()
	 * @generated
	 * @ordered
	 */
	protected static final double WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getWaterSolubilityMilligramsPerLitre() <em>Water Solubility Milligrams Per Litre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWaterSolubilityMilligramsPerLitre()
	 * @generated
	 * @ordered
	 */
	protected double waterSolubilityMilligramsPerLitre = WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE_EDEFAULT;

	/**
	 * The default value of the '{@link #getNonequilibrium() <em>Nonequilibrium</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNonequilibrium()
	 * @generated
	 * @ordered
	 */
	protected static final NonequilibriumEntry NONEQUILIBRIUM_EDEFAULT = NonequilibriumEntry.EQUILIBRIUM;

	/**
	 * The cached value of the '{@link #getNonequilibrium() <em>Nonequilibrium</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNonequilibrium()
	 * @generated
	 * @ordered
	 */
	protected NonequilibriumEntry nonequilibrium = NONEQUILIBRIUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getBeta() <em>Beta</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBeta()
	 * @generated
	 * @ordered
	 */
	protected static final double BETA_EDEFAULT = 1.0;

	/**
	 * The cached value of the '{@link #getBeta() <em>Beta</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBeta()
	 * @generated
	 * @ordered
	 */
	protected double beta = BETA_EDEFAULT;

	/**
	 * The default value of the '{@link #getOmega() <em>Omega</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOmega()
	 * @generated
	 * @ordered
	 */
	protected static final double OMEGA_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getOmega() <em>Omega</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOmega()
	 * @generated
	 * @ordered
	 */
	protected double omega = OMEGA_EDEFAULT;

	/**
	 * The default value of the '{@link #getMobileWaterFraction() <em>Mobile Water Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMobileWaterFraction()
	 * @generated
	 * @ordered
	 */
	protected static final double MOBILE_WATER_FRACTION_EDEFAULT = 1.0;

	/**
	 * The cached value of the '{@link #getMobileWaterFraction() <em>Mobile Water Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMobileWaterFraction()
	 * @generated
	 * @ordered
	 */
	protected double mobileWaterFraction = MOBILE_WATER_FRACTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getMobileSiteFraction() <em>Mobile Site Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMobileSiteFraction()
	 * @generated
	 * @ordered
	 */
	protected static final double MOBILE_SITE_FRACTION_EDEFAULT = 1.0;

	/**
	 * The cached value of the '{@link #getMobileSiteFraction() <em>Mobile Site Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMobileSiteFraction()
	 * @generated
	 * @ordered
	 */
	protected double mobileSiteFraction = MOBILE_SITE_FRACTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getMassTransferRatePerDay() <em>Mass Transfer Rate Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMassTransferRatePerDay()
	 * @generated
	 * @ordered
	 */
	protected static final double MASS_TRANSFER_RATE_PER_DAY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMassTransferRatePerDay() <em>Mass Transfer Rate Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMassTransferRatePerDay()
	 * @generated
	 * @ordered
	 */
	protected double massTransferRatePerDay = MASS_TRANSFER_RATE_PER_DAY_EDEFAULT;

	/**
	 * The default value of the '{@link #getPropertySource() <em>Property Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPropertySource()
	 * @generated
	 * @ordered
	 */
	protected static final String PROPERTY_SOURCE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getPropertySource() <em>Property Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPropertySource()
	 * @generated
	 * @ordered
	 */
	protected String propertySource = PROPERTY_SOURCE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ContaminantImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.CONTAMINANT;
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCasNumber() {
		return casNumber;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCasNumber(String newCasNumber) {
		String oldCasNumber = casNumber;
		casNumber = newCasNumber;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__CAS_NUMBER, oldCasNumber, casNumber));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getKocLitresPerKg() {
		return kocLitresPerKg;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKocLitresPerKg(double newKocLitresPerKg) {
		double oldKocLitresPerKg = kocLitresPerKg;
		kocLitresPerKg = newKocLitresPerKg;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__KOC_LITRES_PER_KG, oldKocLitresPerKg, kocLitresPerKg));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isKdEntered() {
		return kdEntered;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKdEntered(boolean newKdEntered) {
		boolean oldKdEntered = kdEntered;
		kdEntered = newKdEntered;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__KD_ENTERED, oldKdEntered, kdEntered));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getKdLitresPerKg() {
		return kdLitresPerKg;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKdLitresPerKg(double newKdLitresPerKg) {
		double oldKdLitresPerKg = kdLitresPerKg;
		kdLitresPerKg = newKdLitresPerKg;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__KD_LITRES_PER_KG, oldKdLitresPerKg, kdLitresPerKg));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDiffusionSquareMetresPerSecond() {
		return diffusionSquareMetresPerSecond;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDiffusionSquareMetresPerSecond(double newDiffusionSquareMetresPerSecond) {
		double oldDiffusionSquareMetresPerSecond = diffusionSquareMetresPerSecond;
		diffusionSquareMetresPerSecond = newDiffusionSquareMetresPerSecond;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND, oldDiffusionSquareMetresPerSecond, diffusionSquareMetresPerSecond));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getHalfLifeDays() {
		return halfLifeDays;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setHalfLifeDays(double newHalfLifeDays) {
		double oldHalfLifeDays = halfLifeDays;
		halfLifeDays = newHalfLifeDays;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__HALF_LIFE_DAYS, oldHalfLifeDays, halfLifeDays));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SorptionIsotherm getIsotherm() {
		return isotherm;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setIsotherm(SorptionIsotherm newIsotherm) {
		SorptionIsotherm oldIsotherm = isotherm;
		isotherm = newIsotherm == null ? ISOTHERM_EDEFAULT : newIsotherm;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__ISOTHERM, oldIsotherm, isotherm));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getFreundlichKfMgPerKgPerMgPerLitreToN() {
		return freundlichKfMgPerKgPerMgPerLitreToN;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFreundlichKfMgPerKgPerMgPerLitreToN(double newFreundlichKfMgPerKgPerMgPerLitreToN) {
		double oldFreundlichKfMgPerKgPerMgPerLitreToN = freundlichKfMgPerKgPerMgPerLitreToN;
		freundlichKfMgPerKgPerMgPerLitreToN = newFreundlichKfMgPerKgPerMgPerLitreToN;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N, oldFreundlichKfMgPerKgPerMgPerLitreToN, freundlichKfMgPerKgPerMgPerLitreToN));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getFreundlichExponent() {
		return freundlichExponent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFreundlichExponent(double newFreundlichExponent) {
		double oldFreundlichExponent = freundlichExponent;
		freundlichExponent = newFreundlichExponent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__FREUNDLICH_EXPONENT, oldFreundlichExponent, freundlichExponent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLangmuirMaximumMilligramsPerKg() {
		return langmuirMaximumMilligramsPerKg;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLangmuirMaximumMilligramsPerKg(double newLangmuirMaximumMilligramsPerKg) {
		double oldLangmuirMaximumMilligramsPerKg = langmuirMaximumMilligramsPerKg;
		langmuirMaximumMilligramsPerKg = newLangmuirMaximumMilligramsPerKg;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG, oldLangmuirMaximumMilligramsPerKg, langmuirMaximumMilligramsPerKg));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLangmuirConstantLitresPerMilligram() {
		return langmuirConstantLitresPerMilligram;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLangmuirConstantLitresPerMilligram(double newLangmuirConstantLitresPerMilligram) {
		double oldLangmuirConstantLitresPerMilligram = langmuirConstantLitresPerMilligram;
		langmuirConstantLitresPerMilligram = newLangmuirConstantLitresPerMilligram;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM, oldLangmuirConstantLitresPerMilligram, langmuirConstantLitresPerMilligram));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getWaterSolubilityMilligramsPerLitre() {
		return waterSolubilityMilligramsPerLitre;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setWaterSolubilityMilligramsPerLitre(double newWaterSolubilityMilligramsPerLitre) {
		double oldWaterSolubilityMilligramsPerLitre = waterSolubilityMilligramsPerLitre;
		waterSolubilityMilligramsPerLitre = newWaterSolubilityMilligramsPerLitre;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE, oldWaterSolubilityMilligramsPerLitre, waterSolubilityMilligramsPerLitre));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NonequilibriumEntry getNonequilibrium() {
		return nonequilibrium;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNonequilibrium(NonequilibriumEntry newNonequilibrium) {
		NonequilibriumEntry oldNonequilibrium = nonequilibrium;
		nonequilibrium = newNonequilibrium == null ? NONEQUILIBRIUM_EDEFAULT : newNonequilibrium;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__NONEQUILIBRIUM, oldNonequilibrium, nonequilibrium));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBeta() {
		return beta;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBeta(double newBeta) {
		double oldBeta = beta;
		beta = newBeta;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__BETA, oldBeta, beta));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getOmega() {
		return omega;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOmega(double newOmega) {
		double oldOmega = omega;
		omega = newOmega;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__OMEGA, oldOmega, omega));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMobileWaterFraction() {
		return mobileWaterFraction;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMobileWaterFraction(double newMobileWaterFraction) {
		double oldMobileWaterFraction = mobileWaterFraction;
		mobileWaterFraction = newMobileWaterFraction;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__MOBILE_WATER_FRACTION, oldMobileWaterFraction, mobileWaterFraction));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMobileSiteFraction() {
		return mobileSiteFraction;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMobileSiteFraction(double newMobileSiteFraction) {
		double oldMobileSiteFraction = mobileSiteFraction;
		mobileSiteFraction = newMobileSiteFraction;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__MOBILE_SITE_FRACTION, oldMobileSiteFraction, mobileSiteFraction));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMassTransferRatePerDay() {
		return massTransferRatePerDay;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMassTransferRatePerDay(double newMassTransferRatePerDay) {
		double oldMassTransferRatePerDay = massTransferRatePerDay;
		massTransferRatePerDay = newMassTransferRatePerDay;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY, oldMassTransferRatePerDay, massTransferRatePerDay));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getPropertySource() {
		return propertySource;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPropertySource(String newPropertySource) {
		String oldPropertySource = propertySource;
		propertySource = newPropertySource;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__PROPERTY_SOURCE, oldPropertySource, propertySource));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.CONTAMINANT__NAME:
				return getName();
			case SitePackage.CONTAMINANT__CAS_NUMBER:
				return getCasNumber();
			case SitePackage.CONTAMINANT__KOC_LITRES_PER_KG:
				return getKocLitresPerKg();
			case SitePackage.CONTAMINANT__KD_ENTERED:
				return isKdEntered();
			case SitePackage.CONTAMINANT__KD_LITRES_PER_KG:
				return getKdLitresPerKg();
			case SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND:
				return getDiffusionSquareMetresPerSecond();
			case SitePackage.CONTAMINANT__HALF_LIFE_DAYS:
				return getHalfLifeDays();
			case SitePackage.CONTAMINANT__ISOTHERM:
				return getIsotherm();
			case SitePackage.CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N:
				return getFreundlichKfMgPerKgPerMgPerLitreToN();
			case SitePackage.CONTAMINANT__FREUNDLICH_EXPONENT:
				return getFreundlichExponent();
			case SitePackage.CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG:
				return getLangmuirMaximumMilligramsPerKg();
			case SitePackage.CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM:
				return getLangmuirConstantLitresPerMilligram();
			case SitePackage.CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE:
				return getWaterSolubilityMilligramsPerLitre();
			case SitePackage.CONTAMINANT__NONEQUILIBRIUM:
				return getNonequilibrium();
			case SitePackage.CONTAMINANT__BETA:
				return getBeta();
			case SitePackage.CONTAMINANT__OMEGA:
				return getOmega();
			case SitePackage.CONTAMINANT__MOBILE_WATER_FRACTION:
				return getMobileWaterFraction();
			case SitePackage.CONTAMINANT__MOBILE_SITE_FRACTION:
				return getMobileSiteFraction();
			case SitePackage.CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY:
				return getMassTransferRatePerDay();
			case SitePackage.CONTAMINANT__PROPERTY_SOURCE:
				return getPropertySource();
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
			case SitePackage.CONTAMINANT__NAME:
				setName((String)newValue);
				return;
			case SitePackage.CONTAMINANT__CAS_NUMBER:
				setCasNumber((String)newValue);
				return;
			case SitePackage.CONTAMINANT__KOC_LITRES_PER_KG:
				setKocLitresPerKg((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__KD_ENTERED:
				setKdEntered((Boolean)newValue);
				return;
			case SitePackage.CONTAMINANT__KD_LITRES_PER_KG:
				setKdLitresPerKg((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND:
				setDiffusionSquareMetresPerSecond((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__HALF_LIFE_DAYS:
				setHalfLifeDays((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__ISOTHERM:
				setIsotherm((SorptionIsotherm)newValue);
				return;
			case SitePackage.CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N:
				setFreundlichKfMgPerKgPerMgPerLitreToN((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__FREUNDLICH_EXPONENT:
				setFreundlichExponent((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG:
				setLangmuirMaximumMilligramsPerKg((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM:
				setLangmuirConstantLitresPerMilligram((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE:
				setWaterSolubilityMilligramsPerLitre((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__NONEQUILIBRIUM:
				setNonequilibrium((NonequilibriumEntry)newValue);
				return;
			case SitePackage.CONTAMINANT__BETA:
				setBeta((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__OMEGA:
				setOmega((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__MOBILE_WATER_FRACTION:
				setMobileWaterFraction((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__MOBILE_SITE_FRACTION:
				setMobileSiteFraction((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY:
				setMassTransferRatePerDay((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__PROPERTY_SOURCE:
				setPropertySource((String)newValue);
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
			case SitePackage.CONTAMINANT__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__CAS_NUMBER:
				setCasNumber(CAS_NUMBER_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__KOC_LITRES_PER_KG:
				setKocLitresPerKg(KOC_LITRES_PER_KG_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__KD_ENTERED:
				setKdEntered(KD_ENTERED_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__KD_LITRES_PER_KG:
				setKdLitresPerKg(KD_LITRES_PER_KG_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND:
				setDiffusionSquareMetresPerSecond(DIFFUSION_SQUARE_METRES_PER_SECOND_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__HALF_LIFE_DAYS:
				setHalfLifeDays(HALF_LIFE_DAYS_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__ISOTHERM:
				setIsotherm(ISOTHERM_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N:
				setFreundlichKfMgPerKgPerMgPerLitreToN(FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__FREUNDLICH_EXPONENT:
				setFreundlichExponent(FREUNDLICH_EXPONENT_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG:
				setLangmuirMaximumMilligramsPerKg(LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM:
				setLangmuirConstantLitresPerMilligram(LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE:
				setWaterSolubilityMilligramsPerLitre(WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__NONEQUILIBRIUM:
				setNonequilibrium(NONEQUILIBRIUM_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__BETA:
				setBeta(BETA_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__OMEGA:
				setOmega(OMEGA_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__MOBILE_WATER_FRACTION:
				setMobileWaterFraction(MOBILE_WATER_FRACTION_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__MOBILE_SITE_FRACTION:
				setMobileSiteFraction(MOBILE_SITE_FRACTION_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY:
				setMassTransferRatePerDay(MASS_TRANSFER_RATE_PER_DAY_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__PROPERTY_SOURCE:
				setPropertySource(PROPERTY_SOURCE_EDEFAULT);
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
			case SitePackage.CONTAMINANT__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.CONTAMINANT__CAS_NUMBER:
				return CAS_NUMBER_EDEFAULT == null ? casNumber != null : !CAS_NUMBER_EDEFAULT.equals(casNumber);
			case SitePackage.CONTAMINANT__KOC_LITRES_PER_KG:
				return kocLitresPerKg != KOC_LITRES_PER_KG_EDEFAULT;
			case SitePackage.CONTAMINANT__KD_ENTERED:
				return kdEntered != KD_ENTERED_EDEFAULT;
			case SitePackage.CONTAMINANT__KD_LITRES_PER_KG:
				return kdLitresPerKg != KD_LITRES_PER_KG_EDEFAULT;
			case SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND:
				return diffusionSquareMetresPerSecond != DIFFUSION_SQUARE_METRES_PER_SECOND_EDEFAULT;
			case SitePackage.CONTAMINANT__HALF_LIFE_DAYS:
				return halfLifeDays != HALF_LIFE_DAYS_EDEFAULT;
			case SitePackage.CONTAMINANT__ISOTHERM:
				return isotherm != ISOTHERM_EDEFAULT;
			case SitePackage.CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N:
				return freundlichKfMgPerKgPerMgPerLitreToN != FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N_EDEFAULT;
			case SitePackage.CONTAMINANT__FREUNDLICH_EXPONENT:
				return freundlichExponent != FREUNDLICH_EXPONENT_EDEFAULT;
			case SitePackage.CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG:
				return langmuirMaximumMilligramsPerKg != LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG_EDEFAULT;
			case SitePackage.CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM:
				return langmuirConstantLitresPerMilligram != LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM_EDEFAULT;
			case SitePackage.CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE:
				return waterSolubilityMilligramsPerLitre != WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE_EDEFAULT;
			case SitePackage.CONTAMINANT__NONEQUILIBRIUM:
				return nonequilibrium != NONEQUILIBRIUM_EDEFAULT;
			case SitePackage.CONTAMINANT__BETA:
				return beta != BETA_EDEFAULT;
			case SitePackage.CONTAMINANT__OMEGA:
				return omega != OMEGA_EDEFAULT;
			case SitePackage.CONTAMINANT__MOBILE_WATER_FRACTION:
				return mobileWaterFraction != MOBILE_WATER_FRACTION_EDEFAULT;
			case SitePackage.CONTAMINANT__MOBILE_SITE_FRACTION:
				return mobileSiteFraction != MOBILE_SITE_FRACTION_EDEFAULT;
			case SitePackage.CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY:
				return massTransferRatePerDay != MASS_TRANSFER_RATE_PER_DAY_EDEFAULT;
			case SitePackage.CONTAMINANT__PROPERTY_SOURCE:
				return PROPERTY_SOURCE_EDEFAULT == null ? propertySource != null : !PROPERTY_SOURCE_EDEFAULT.equals(propertySource);
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
		result.append(", casNumber: ");
		result.append(casNumber);
		result.append(", kocLitresPerKg: ");
		result.append(kocLitresPerKg);
		result.append(", kdEntered: ");
		result.append(kdEntered);
		result.append(", kdLitresPerKg: ");
		result.append(kdLitresPerKg);
		result.append(", diffusionSquareMetresPerSecond: ");
		result.append(diffusionSquareMetresPerSecond);
		result.append(", halfLifeDays: ");
		result.append(halfLifeDays);
		result.append(", isotherm: ");
		result.append(isotherm);
		result.append(", freundlichKfMgPerKgPerMgPerLitreToN: ");
		result.append(freundlichKfMgPerKgPerMgPerLitreToN);
		result.append(", freundlichExponent: ");
		result.append(freundlichExponent);
		result.append(", langmuirMaximumMilligramsPerKg: ");
		result.append(langmuirMaximumMilligramsPerKg);
		result.append(", langmuirConstantLitresPerMilligram: ");
		result.append(langmuirConstantLitresPerMilligram);
		result.append(", waterSolubilityMilligramsPerLitre: ");
		result.append(waterSolubilityMilligramsPerLitre);
		result.append(", nonequilibrium: ");
		result.append(nonequilibrium);
		result.append(", beta: ");
		result.append(beta);
		result.append(", omega: ");
		result.append(omega);
		result.append(", mobileWaterFraction: ");
		result.append(mobileWaterFraction);
		result.append(", mobileSiteFraction: ");
		result.append(mobileSiteFraction);
		result.append(", massTransferRatePerDay: ");
		result.append(massTransferRatePerDay);
		result.append(", propertySource: ");
		result.append(propertySource);
		result.append(')');
		return result.toString();
	}

} //ContaminantImpl
