/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Contaminant</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A contaminant of concern and the properties that govern its flushing. Linear sorption: Kd = Koc foc (Karickhoff, Brown, Scott 1979) unless a measured Kd is entered (kdEntered).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.Contaminant#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getCasNumber <em>Cas Number</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getKocLitresPerKg <em>Koc Litres Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#isKdEntered <em>Kd Entered</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getKdLitresPerKg <em>Kd Litres Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getDiffusionSquareMetresPerSecond <em>Diffusion Square Metres Per Second</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getHalfLifeDays <em>Half Life Days</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getIsotherm <em>Isotherm</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getFreundlichKfMgPerKgPerMgPerLitreToN <em>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getFreundlichExponent <em>Freundlich Exponent</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getLangmuirMaximumMilligramsPerKg <em>Langmuir Maximum Milligrams Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getLangmuirConstantLitresPerMilligram <em>Langmuir Constant Litres Per Milligram</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getWaterSolubilityMilligramsPerLitre <em>Water Solubility Milligrams Per Litre</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getNonequilibrium <em>Nonequilibrium</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getBeta <em>Beta</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getOmega <em>Omega</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getMobileWaterFraction <em>Mobile Water Fraction</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getMobileSiteFraction <em>Mobile Site Fraction</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getMassTransferRatePerDay <em>Mass Transfer Rate Per Day</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getPropertySource <em>Property Source</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getContaminant()
 * @model
 * @generated
 */
public interface Contaminant extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The contaminant's name, e.g. 'Benzene'.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getContaminant_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Cas Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Chemical Abstracts Service registry number, e.g. '71-43-2'; may be empty.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Cas Number</em>' attribute.
	 * @see #setCasNumber(String)
	 * @see eluvia.site.model.SitePackage#getContaminant_CasNumber()
	 * @model
	 * @generated
	 */
	String getCasNumber();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getCasNumber <em>Cas Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Cas Number</em>' attribute.
	 * @see #getCasNumber()
	 * @generated
	 */
	void setCasNumber(String value);

	/**
	 * Returns the value of the '<em><b>Koc Litres Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Organic-carbon partition coefficient Koc in L/kg; used when kdEntered is false.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Koc Litres Per Kg</em>' attribute.
	 * @see #setKocLitresPerKg(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_KocLitresPerKg()
	 * @model
	 * @generated
	 */
	double getKocLitresPerKg();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getKocLitresPerKg <em>Koc Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Koc Litres Per Kg</em>' attribute.
	 * @see #getKocLitresPerKg()
	 * @generated
	 */
	void setKocLitresPerKg(double value);

	/**
	 * Returns the value of the '<em><b>Kd Entered</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * True when kdLitresPerKg is a measured or chosen Kd that overrides Koc foc in every layer.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Kd Entered</em>' attribute.
	 * @see #setKdEntered(boolean)
	 * @see eluvia.site.model.SitePackage#getContaminant_KdEntered()
	 * @model
	 * @generated
	 */
	boolean isKdEntered();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#isKdEntered <em>Kd Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kd Entered</em>' attribute.
	 * @see #isKdEntered()
	 * @generated
	 */
	void setKdEntered(boolean value);

	/**
	 * Returns the value of the '<em><b>Kd Litres Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Soil-water distribution coefficient Kd in L/kg; used only when kdEntered is true.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Kd Litres Per Kg</em>' attribute.
	 * @see #setKdLitresPerKg(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_KdLitresPerKg()
	 * @model
	 * @generated
	 */
	double getKdLitresPerKg();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getKdLitresPerKg <em>Kd Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kd Litres Per Kg</em>' attribute.
	 * @see #getKdLitresPerKg()
	 * @generated
	 */
	void setKdLitresPerKg(double value);

	/**
	 * Returns the value of the '<em><b>Diffusion Square Metres Per Second</b></em>' attribute.
	 * The default value is <code>"1.0E-9"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Free-water molecular diffusion coefficient D0 in m2/s; about 1e-9 m2/s for small solutes (common practice).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Diffusion Square Metres Per Second</em>' attribute.
	 * @see #setDiffusionSquareMetresPerSecond(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_DiffusionSquareMetresPerSecond()
	 * @model default="1.0E-9"
	 * @generated
	 */
	double getDiffusionSquareMetresPerSecond();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getDiffusionSquareMetresPerSecond <em>Diffusion Square Metres Per Second</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Diffusion Square Metres Per Second</em>' attribute.
	 * @see #getDiffusionSquareMetresPerSecond()
	 * @generated
	 */
	void setDiffusionSquareMetresPerSecond(double value);

	/**
	 * Returns the value of the '<em><b>Half Life Days</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * First-order decay half-life in days; 0 means no decay.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Half Life Days</em>' attribute.
	 * @see #setHalfLifeDays(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_HalfLifeDays()
	 * @model
	 * @generated
	 */
	double getHalfLifeDays();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getHalfLifeDays <em>Half Life Days</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Half Life Days</em>' attribute.
	 * @see #getHalfLifeDays()
	 * @generated
	 */
	void setHalfLifeDays(double value);

	/**
	 * Returns the value of the '<em><b>Isotherm</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.SorptionIsotherm}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The sorption isotherm: linear (Kd, or Koc foc), Freundlich or Langmuir.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Isotherm</em>' attribute.
	 * @see eluvia.site.model.SorptionIsotherm
	 * @see #setIsotherm(SorptionIsotherm)
	 * @see eluvia.site.model.SitePackage#getContaminant_Isotherm()
	 * @model
	 * @generated
	 */
	SorptionIsotherm getIsotherm();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getIsotherm <em>Isotherm</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Isotherm</em>' attribute.
	 * @see eluvia.site.model.SorptionIsotherm
	 * @see #getIsotherm()
	 * @generated
	 */
	void setIsotherm(SorptionIsotherm value);

	/**
	 * Returns the value of the '<em><b>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Freundlich coefficient Kf in S = Kf C^n, with S in mg/kg and C in mg/L, so Kf is in (mg/kg)/(mg/L)^n.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</em>' attribute.
	 * @see #setFreundlichKfMgPerKgPerMgPerLitreToN(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_FreundlichKfMgPerKgPerMgPerLitreToN()
	 * @model
	 * @generated
	 */
	double getFreundlichKfMgPerKgPerMgPerLitreToN();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getFreundlichKfMgPerKgPerMgPerLitreToN <em>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</em>' attribute.
	 * @see #getFreundlichKfMgPerKgPerMgPerLitreToN()
	 * @generated
	 */
	void setFreundlichKfMgPerKgPerMgPerLitreToN(double value);

	/**
	 * Returns the value of the '<em><b>Freundlich Exponent</b></em>' attribute.
	 * The default value is <code>"1"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Freundlich exponent n, dimensionless (n = 1 is linear).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Freundlich Exponent</em>' attribute.
	 * @see #setFreundlichExponent(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_FreundlichExponent()
	 * @model default="1"
	 * @generated
	 */
	double getFreundlichExponent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getFreundlichExponent <em>Freundlich Exponent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Freundlich Exponent</em>' attribute.
	 * @see #getFreundlichExponent()
	 * @generated
	 */
	void setFreundlichExponent(double value);

	/**
	 * Returns the value of the '<em><b>Langmuir Maximum Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Langmuir sorption maximum Smax in mg/kg: S = Smax K C / (1 + K C).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Langmuir Maximum Milligrams Per Kg</em>' attribute.
	 * @see #setLangmuirMaximumMilligramsPerKg(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_LangmuirMaximumMilligramsPerKg()
	 * @model
	 * @generated
	 */
	double getLangmuirMaximumMilligramsPerKg();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getLangmuirMaximumMilligramsPerKg <em>Langmuir Maximum Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Langmuir Maximum Milligrams Per Kg</em>' attribute.
	 * @see #getLangmuirMaximumMilligramsPerKg()
	 * @generated
	 */
	void setLangmuirMaximumMilligramsPerKg(double value);

	/**
	 * Returns the value of the '<em><b>Langmuir Constant Litres Per Milligram</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Langmuir constant K in L/mg.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Langmuir Constant Litres Per Milligram</em>' attribute.
	 * @see #setLangmuirConstantLitresPerMilligram(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_LangmuirConstantLitresPerMilligram()
	 * @model
	 * @generated
	 */
	double getLangmuirConstantLitresPerMilligram();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getLangmuirConstantLitresPerMilligram <em>Langmuir Constant Litres Per Milligram</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Langmuir Constant Litres Per Milligram</em>' attribute.
	 * @see #getLangmuirConstantLitresPerMilligram()
	 * @generated
	 */
	void setLangmuirConstantLitresPerMilligram(double value);

	/**
	 * Returns the value of the '<em><b>Water Solubility Milligrams Per Litre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Solubility in water in mg/L; 0 means not given.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Water Solubility Milligrams Per Litre</em>' attribute.
	 * @see #setWaterSolubilityMilligramsPerLitre(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_WaterSolubilityMilligramsPerLitre()
	 * @model
	 * @generated
	 */
	double getWaterSolubilityMilligramsPerLitre();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getWaterSolubilityMilligramsPerLitre <em>Water Solubility Milligrams Per Litre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Water Solubility Milligrams Per Litre</em>' attribute.
	 * @see #getWaterSolubilityMilligramsPerLitre()
	 * @generated
	 */
	void setWaterSolubilityMilligramsPerLitre(double value);

	/**
	 * Returns the value of the '<em><b>Nonequilibrium</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.NonequilibriumEntry}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Whether sorption or transfer is at equilibrium, and how the nonequilibrium parameters are entered (van Genuchten and Wierenga 1976; Nkedi-Kizza et al. 1984).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Nonequilibrium</em>' attribute.
	 * @see eluvia.site.model.NonequilibriumEntry
	 * @see #setNonequilibrium(NonequilibriumEntry)
	 * @see eluvia.site.model.SitePackage#getContaminant_Nonequilibrium()
	 * @model
	 * @generated
	 */
	NonequilibriumEntry getNonequilibrium();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getNonequilibrium <em>Nonequilibrium</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Nonequilibrium</em>' attribute.
	 * @see eluvia.site.model.NonequilibriumEntry
	 * @see #getNonequilibrium()
	 * @generated
	 */
	void setNonequilibrium(NonequilibriumEntry value);

	/**
	 * Returns the value of the '<em><b>Beta</b></em>' attribute.
	 * The default value is <code>"1"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Dimensionless partitioning coefficient beta of the two-region model, in (0, 1] (1 = equilibrium).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Beta</em>' attribute.
	 * @see #setBeta(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_Beta()
	 * @model default="1"
	 * @generated
	 */
	double getBeta();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getBeta <em>Beta</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Beta</em>' attribute.
	 * @see #getBeta()
	 * @generated
	 */
	void setBeta(double value);

	/**
	 * Returns the value of the '<em><b>Omega</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Dimensionless mass-transfer coefficient omega of the two-region model, 0 or more.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Omega</em>' attribute.
	 * @see #setOmega(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_Omega()
	 * @model
	 * @generated
	 */
	double getOmega();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getOmega <em>Omega</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Omega</em>' attribute.
	 * @see #getOmega()
	 * @generated
	 */
	void setOmega(double value);

	/**
	 * Returns the value of the '<em><b>Mobile Water Fraction</b></em>' attribute.
	 * The default value is <code>"1"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Physical nonequilibrium: mobile water content over total water content, theta_m / theta, dimensionless, in (0, 1].
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Mobile Water Fraction</em>' attribute.
	 * @see #setMobileWaterFraction(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_MobileWaterFraction()
	 * @model default="1"
	 * @generated
	 */
	double getMobileWaterFraction();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getMobileWaterFraction <em>Mobile Water Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Mobile Water Fraction</em>' attribute.
	 * @see #getMobileWaterFraction()
	 * @generated
	 */
	void setMobileWaterFraction(double value);

	/**
	 * Returns the value of the '<em><b>Mobile Site Fraction</b></em>' attribute.
	 * The default value is <code>"1"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Physical nonequilibrium: fraction f of sorption sites in contact with mobile water, dimensionless, in [0, 1]. Chemical nonequilibrium: fraction F of instantaneous sites.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Mobile Site Fraction</em>' attribute.
	 * @see #setMobileSiteFraction(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_MobileSiteFraction()
	 * @model default="1"
	 * @generated
	 */
	double getMobileSiteFraction();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getMobileSiteFraction <em>Mobile Site Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Mobile Site Fraction</em>' attribute.
	 * @see #getMobileSiteFraction()
	 * @generated
	 */
	void setMobileSiteFraction(double value);

	/**
	 * Returns the value of the '<em><b>Mass Transfer Rate Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * First-order mass-transfer rate in 1/d: alpha between mobile and immobile water (physical) or k for kinetic sites (chemical).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Mass Transfer Rate Per Day</em>' attribute.
	 * @see #setMassTransferRatePerDay(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_MassTransferRatePerDay()
	 * @model
	 * @generated
	 */
	double getMassTransferRatePerDay();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getMassTransferRatePerDay <em>Mass Transfer Rate Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Mass Transfer Rate Per Day</em>' attribute.
	 * @see #getMassTransferRatePerDay()
	 * @generated
	 */
	void setMassTransferRatePerDay(double value);

	/**
	 * Returns the value of the '<em><b>Property Source</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Where the property values come from (e.g. the property library entry and its sources), for the design package.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Property Source</em>' attribute.
	 * @see #setPropertySource(String)
	 * @see eluvia.site.model.SitePackage#getContaminant_PropertySource()
	 * @model
	 * @generated
	 */
	String getPropertySource();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getPropertySource <em>Property Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Property Source</em>' attribute.
	 * @see #getPropertySource()
	 * @generated
	 */
	void setPropertySource(String value);

} // Contaminant
