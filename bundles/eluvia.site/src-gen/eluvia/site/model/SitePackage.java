/**
 */
package eluvia.site.model;

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
 * The Eluvia site model: the project file's content. Every quantity is stored in SI units (or the unit named in the feature name); conversion for display lives in eluvia.site.units.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SiteFactory
 * @model kind="package"
 * @generated
 */
public interface SitePackage extends EPackage {
	/**
	 * The package name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNAME = "site";

	/**
	 * The package namespace URI.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_URI = "urn:eluvia:site";

	/**
	 * The package namespace name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_PREFIX = "site";

	/**
	 * The singleton instance of the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	SitePackage eINSTANCE = eluvia.site.model.impl.SitePackageImpl.init();

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.ProjectImpl <em>Project</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.ProjectImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getProject()
	 * @generated
	 */
	int PROJECT = 0;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__NAME = 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__DESCRIPTION = 1;

	/**
	 * The feature id for the '<em><b>Schema Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__SCHEMA_VERSION = 2;

	/**
	 * The feature id for the '<em><b>Site</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__SITE = 3;

	/**
	 * The feature id for the '<em><b>Contaminants</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__CONTAMINANTS = 4;

	/**
	 * The feature id for the '<em><b>Cleanup Levels</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__CLEANUP_LEVELS = 5;

	/**
	 * The feature id for the '<em><b>Flushing Designs</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__FLUSHING_DESIGNS = 6;

	/**
	 * The feature id for the '<em><b>Unit System</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__UNIT_SYSTEM = 7;

	/**
	 * The feature id for the '<em><b>Revisions</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__REVISIONS = 8;

	/**
	 * The feature id for the '<em><b>Excavation Designs</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__EXCAVATION_DESIGNS = 9;

	/**
	 * The feature id for the '<em><b>Price Books</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__PRICE_BOOKS = 10;

	/**
	 * The feature id for the '<em><b>Column Tests</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__COLUMN_TESTS = 11;

	/**
	 * The feature id for the '<em><b>Uncertainty</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__UNCERTAINTY = 12;

	/**
	 * The feature id for the '<em><b>Zone Analysis</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__ZONE_ANALYSIS = 13;

	/**
	 * The number of structural features of the '<em>Project</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_FEATURE_COUNT = 14;

	/**
	 * The number of operations of the '<em>Project</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.SiteImpl <em>Site</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.SiteImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getSite()
	 * @generated
	 */
	int SITE = 1;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__NAME = 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__DESCRIPTION = 1;

	/**
	 * The feature id for the '<em><b>Layers</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__LAYERS = 2;

	/**
	 * The feature id for the '<em><b>Zones</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__ZONES = 3;

	/**
	 * The feature id for the '<em><b>Coordinate Frame</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__COORDINATE_FRAME = 4;

	/**
	 * The feature id for the '<em><b>Ground Surface Elevation Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__GROUND_SURFACE_ELEVATION_METRES = 5;

	/**
	 * The feature id for the '<em><b>Boundary</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__BOUNDARY = 6;

	/**
	 * The feature id for the '<em><b>Sampling Locations</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__SAMPLING_LOCATIONS = 7;

	/**
	 * The number of structural features of the '<em>Site</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE_FEATURE_COUNT = 8;

	/**
	 * The number of operations of the '<em>Site</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.SoilLayerImpl <em>Soil Layer</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.SoilLayerImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getSoilLayer()
	 * @generated
	 */
	int SOIL_LAYER = 2;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__NAME = 0;

	/**
	 * The feature id for the '<em><b>Top Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__TOP_DEPTH_METRES = 1;

	/**
	 * The feature id for the '<em><b>Bottom Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__BOTTOM_DEPTH_METRES = 2;

	/**
	 * The feature id for the '<em><b>Texture Class</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__TEXTURE_CLASS = 3;

	/**
	 * The feature id for the '<em><b>Bulk Density Kg Per Cubic Metre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE = 4;

	/**
	 * The feature id for the '<em><b>Porosity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__POROSITY = 5;

	/**
	 * The feature id for the '<em><b>Water Content</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__WATER_CONTENT = 6;

	/**
	 * The feature id for the '<em><b>Organic Carbon Fraction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__ORGANIC_CARBON_FRACTION = 7;

	/**
	 * The feature id for the '<em><b>Saturated Conductivity Metres Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY = 8;

	/**
	 * The feature id for the '<em><b>Dispersivity Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__DISPERSIVITY_METRES = 9;

	/**
	 * The feature id for the '<em><b>Swell Factor</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__SWELL_FACTOR = 10;

	/**
	 * The feature id for the '<em><b>Shrinkage Factor</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__SHRINKAGE_FACTOR = 11;

	/**
	 * The feature id for the '<em><b>Dispersivity Rule</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__DISPERSIVITY_RULE = 12;

	/**
	 * The feature id for the '<em><b>Dispersivity Scale Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__DISPERSIVITY_SCALE_METRES = 13;

	/**
	 * The feature id for the '<em><b>Effective Dispersivity Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__EFFECTIVE_DISPERSIVITY_METRES = 14;

	/**
	 * The number of structural features of the '<em>Soil Layer</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER_FEATURE_COUNT = 15;

	/**
	 * The number of operations of the '<em>Soil Layer</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.ContaminantImpl <em>Contaminant</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.ContaminantImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getContaminant()
	 * @generated
	 */
	int CONTAMINANT = 3;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__NAME = 0;

	/**
	 * The feature id for the '<em><b>Cas Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__CAS_NUMBER = 1;

	/**
	 * The feature id for the '<em><b>Koc Litres Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__KOC_LITRES_PER_KG = 2;

	/**
	 * The feature id for the '<em><b>Kd Entered</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__KD_ENTERED = 3;

	/**
	 * The feature id for the '<em><b>Kd Litres Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__KD_LITRES_PER_KG = 4;

	/**
	 * The feature id for the '<em><b>Diffusion Square Metres Per Second</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND = 5;

	/**
	 * The feature id for the '<em><b>Half Life Days</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__HALF_LIFE_DAYS = 6;

	/**
	 * The feature id for the '<em><b>Isotherm</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__ISOTHERM = 7;

	/**
	 * The feature id for the '<em><b>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N = 8;

	/**
	 * The feature id for the '<em><b>Freundlich Exponent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__FREUNDLICH_EXPONENT = 9;

	/**
	 * The feature id for the '<em><b>Langmuir Maximum Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG = 10;

	/**
	 * The feature id for the '<em><b>Langmuir Constant Litres Per Milligram</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM = 11;

	/**
	 * The feature id for the '<em><b>Water Solubility Milligrams Per Litre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE = 12;

	/**
	 * The feature id for the '<em><b>Nonequilibrium</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__NONEQUILIBRIUM = 13;

	/**
	 * The feature id for the '<em><b>Beta</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__BETA = 14;

	/**
	 * The feature id for the '<em><b>Omega</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__OMEGA = 15;

	/**
	 * The feature id for the '<em><b>Mobile Water Fraction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__MOBILE_WATER_FRACTION = 16;

	/**
	 * The feature id for the '<em><b>Mobile Site Fraction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__MOBILE_SITE_FRACTION = 17;

	/**
	 * The feature id for the '<em><b>Mass Transfer Rate Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY = 18;

	/**
	 * The feature id for the '<em><b>Property Source</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__PROPERTY_SOURCE = 19;

	/**
	 * The number of structural features of the '<em>Contaminant</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT_FEATURE_COUNT = 20;

	/**
	 * The number of operations of the '<em>Contaminant</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.CleanupLevelImpl <em>Cleanup Level</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.CleanupLevelImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getCleanupLevel()
	 * @generated
	 */
	int CLEANUP_LEVEL = 4;

	/**
	 * The feature id for the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__CONTAMINANT = 0;

	/**
	 * The feature id for the '<em><b>Soil Level Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG = 1;

	/**
	 * The feature id for the '<em><b>Basis</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__BASIS = 2;

	/**
	 * The feature id for the '<em><b>Soil Level Entered</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__SOIL_LEVEL_ENTERED = 3;

	/**
	 * The feature id for the '<em><b>Porewater Level Entered</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED = 4;

	/**
	 * The feature id for the '<em><b>Porewater Level Milligrams Per Litre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE = 5;

	/**
	 * The feature id for the '<em><b>Statistic</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__STATISTIC = 6;

	/**
	 * The number of structural features of the '<em>Cleanup Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL_FEATURE_COUNT = 7;

	/**
	 * The number of operations of the '<em>Cleanup Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.TreatmentZoneImpl <em>Treatment Zone</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.TreatmentZoneImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getTreatmentZone()
	 * @generated
	 */
	int TREATMENT_ZONE = 5;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__NAME = 0;

	/**
	 * The feature id for the '<em><b>Area Square Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__AREA_SQUARE_METRES = 1;

	/**
	 * The feature id for the '<em><b>Top Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__TOP_DEPTH_METRES = 2;

	/**
	 * The feature id for the '<em><b>Bottom Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__BOTTOM_DEPTH_METRES = 3;

	/**
	 * The feature id for the '<em><b>Source Concentrations</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__SOURCE_CONCENTRATIONS = 4;

	/**
	 * The feature id for the '<em><b>Footprint</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__FOOTPRINT = 5;

	/**
	 * The feature id for the '<em><b>Effective Area Square Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__EFFECTIVE_AREA_SQUARE_METRES = 6;

	/**
	 * The feature id for the '<em><b>Volume Cubic Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__VOLUME_CUBIC_METRES = 7;

	/**
	 * The feature id for the '<em><b>Pore Volume Cubic Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__PORE_VOLUME_CUBIC_METRES = 8;

	/**
	 * The number of structural features of the '<em>Treatment Zone</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE_FEATURE_COUNT = 9;

	/**
	 * The number of operations of the '<em>Treatment Zone</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.SourceConcentrationImpl <em>Source Concentration</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.SourceConcentrationImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getSourceConcentration()
	 * @generated
	 */
	int SOURCE_CONCENTRATION = 6;

	/**
	 * The feature id for the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOURCE_CONCENTRATION__CONTAMINANT = 0;

	/**
	 * The feature id for the '<em><b>Soil Concentration Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG = 1;

	/**
	 * The number of structural features of the '<em>Source Concentration</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOURCE_CONCENTRATION_FEATURE_COUNT = 2;

	/**
	 * The number of operations of the '<em>Source Concentration</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOURCE_CONCENTRATION_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.FlushingDesignImpl <em>Flushing Design</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.FlushingDesignImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getFlushingDesign()
	 * @generated
	 */
	int FLUSHING_DESIGN = 7;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__NAME = 0;

	/**
	 * The feature id for the '<em><b>Zone</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__ZONE = 1;

	/**
	 * The feature id for the '<em><b>Darcy Flux Metres Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY = 2;

	/**
	 * The feature id for the '<em><b>Operating Days Per Week</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK = 3;

	/**
	 * The feature id for the '<em><b>Capture Efficiency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__CAPTURE_EFFICIENCY = 4;

	/**
	 * The feature id for the '<em><b>Criterion</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__CRITERION = 5;

	/**
	 * The feature id for the '<em><b>Max Pore Volumes</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__MAX_PORE_VOLUMES = 6;

	/**
	 * The feature id for the '<em><b>Solution Method</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__SOLUTION_METHOD = 7;

	/**
	 * The feature id for the '<em><b>Numerical Cell Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__NUMERICAL_CELL_COUNT = 8;

	/**
	 * The feature id for the '<em><b>Numerical Relative Tolerance</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE = 9;

	/**
	 * The feature id for the '<em><b>Monitoring Interval Days</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS = 10;

	/**
	 * The feature id for the '<em><b>Amendment Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__AMENDMENT_NAME = 11;

	/**
	 * The feature id for the '<em><b>Amendment Dose Kilograms Per Cubic Metre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE = 12;

	/**
	 * The feature id for the '<em><b>Price Book</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__PRICE_BOOK = 13;

	/**
	 * The number of structural features of the '<em>Flushing Design</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN_FEATURE_COUNT = 14;

	/**
	 * The number of operations of the '<em>Flushing Design</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.RevisionImpl <em>Revision</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.RevisionImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getRevision()
	 * @generated
	 */
	int REVISION = 8;

	/**
	 * The feature id for the '<em><b>Author</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REVISION__AUTHOR = 0;

	/**
	 * The feature id for the '<em><b>Timestamp</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REVISION__TIMESTAMP = 1;

	/**
	 * The feature id for the '<em><b>Summary</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REVISION__SUMMARY = 2;

	/**
	 * The number of structural features of the '<em>Revision</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REVISION_FEATURE_COUNT = 3;

	/**
	 * The number of operations of the '<em>Revision</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REVISION_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.VertexImpl <em>Vertex</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.VertexImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getVertex()
	 * @generated
	 */
	int VERTEX = 9;

	/**
	 * The feature id for the '<em><b>Easting Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VERTEX__EASTING_METRES = 0;

	/**
	 * The feature id for the '<em><b>Northing Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VERTEX__NORTHING_METRES = 1;

	/**
	 * The number of structural features of the '<em>Vertex</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VERTEX_FEATURE_COUNT = 2;

	/**
	 * The number of operations of the '<em>Vertex</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VERTEX_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.SamplingLocationImpl <em>Sampling Location</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.SamplingLocationImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getSamplingLocation()
	 * @generated
	 */
	int SAMPLING_LOCATION = 10;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLING_LOCATION__NAME = 0;

	/**
	 * The feature id for the '<em><b>Easting Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLING_LOCATION__EASTING_METRES = 1;

	/**
	 * The feature id for the '<em><b>Northing Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLING_LOCATION__NORTHING_METRES = 2;

	/**
	 * The feature id for the '<em><b>Ground Elevation Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLING_LOCATION__GROUND_ELEVATION_METRES = 3;

	/**
	 * The feature id for the '<em><b>Samples</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLING_LOCATION__SAMPLES = 4;

	/**
	 * The number of structural features of the '<em>Sampling Location</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLING_LOCATION_FEATURE_COUNT = 5;

	/**
	 * The number of operations of the '<em>Sampling Location</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLING_LOCATION_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.SampleImpl <em>Sample</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.SampleImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getSample()
	 * @generated
	 */
	int SAMPLE = 11;

	/**
	 * The feature id for the '<em><b>Top Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLE__TOP_DEPTH_METRES = 0;

	/**
	 * The feature id for the '<em><b>Bottom Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLE__BOTTOM_DEPTH_METRES = 1;

	/**
	 * The feature id for the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLE__CONTAMINANT = 2;

	/**
	 * The feature id for the '<em><b>Concentration Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLE__CONCENTRATION_MILLIGRAMS_PER_KG = 3;

	/**
	 * The feature id for the '<em><b>Non Detect</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLE__NON_DETECT = 4;

	/**
	 * The feature id for the '<em><b>Detection Limit Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLE__DETECTION_LIMIT_MILLIGRAMS_PER_KG = 5;

	/**
	 * The number of structural features of the '<em>Sample</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLE_FEATURE_COUNT = 6;

	/**
	 * The number of operations of the '<em>Sample</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SAMPLE_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.ExcavationDesignImpl <em>Excavation Design</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.ExcavationDesignImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getExcavationDesign()
	 * @generated
	 */
	int EXCAVATION_DESIGN = 12;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN__NAME = 0;

	/**
	 * The feature id for the '<em><b>Zone</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN__ZONE = 1;

	/**
	 * The feature id for the '<em><b>Soil Type</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN__SOIL_TYPE = 2;

	/**
	 * The feature id for the '<em><b>Side Slope Horizontal Per Vertical</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL = 3;

	/**
	 * The feature id for the '<em><b>Overdig Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN__OVERDIG_METRES = 4;

	/**
	 * The feature id for the '<em><b>Truck Heaped Capacity Cubic Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES = 5;

	/**
	 * The feature id for the '<em><b>Truck Payload Kilograms</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS = 6;

	/**
	 * The feature id for the '<em><b>Price Book</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN__PRICE_BOOK = 7;

	/**
	 * The number of structural features of the '<em>Excavation Design</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN_FEATURE_COUNT = 8;

	/**
	 * The number of operations of the '<em>Excavation Design</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXCAVATION_DESIGN_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.PriceBookImpl <em>Price Book</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.PriceBookImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getPriceBook()
	 * @generated
	 */
	int PRICE_BOOK = 13;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__NAME = 0;

	/**
	 * The feature id for the '<em><b>Currency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__CURRENCY = 1;

	/**
	 * The feature id for the '<em><b>Reference</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__REFERENCE = 2;

	/**
	 * The feature id for the '<em><b>Items</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__ITEMS = 3;

	/**
	 * The feature id for the '<em><b>Scope Contingency Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT = 4;

	/**
	 * The feature id for the '<em><b>Bid Contingency Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__BID_CONTINGENCY_PERCENT = 5;

	/**
	 * The feature id for the '<em><b>Project Management Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT = 6;

	/**
	 * The feature id for the '<em><b>Remedial Design Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__REMEDIAL_DESIGN_PERCENT = 7;

	/**
	 * The feature id for the '<em><b>Construction Management Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT = 8;

	/**
	 * The feature id for the '<em><b>Operating Contingency Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT = 9;

	/**
	 * The feature id for the '<em><b>Operating Project Management Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT = 10;

	/**
	 * The feature id for the '<em><b>Technical Support Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT = 11;

	/**
	 * The feature id for the '<em><b>Discount Rate Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__DISCOUNT_RATE_PERCENT = 12;

	/**
	 * The feature id for the '<em><b>Discount Rate Basis</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK__DISCOUNT_RATE_BASIS = 13;

	/**
	 * The number of structural features of the '<em>Price Book</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK_FEATURE_COUNT = 14;

	/**
	 * The number of operations of the '<em>Price Book</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_BOOK_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.PriceItemImpl <em>Price Item</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.PriceItemImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getPriceItem()
	 * @generated
	 */
	int PRICE_ITEM = 14;

	/**
	 * The feature id for the '<em><b>Code</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_ITEM__CODE = 0;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_ITEM__NAME = 1;

	/**
	 * The feature id for the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_ITEM__UNIT = 2;

	/**
	 * The feature id for the '<em><b>Rate Per Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_ITEM__RATE_PER_UNIT = 3;

	/**
	 * The feature id for the '<em><b>Currency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_ITEM__CURRENCY = 4;

	/**
	 * The feature id for the '<em><b>Source Note</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_ITEM__SOURCE_NOTE = 5;

	/**
	 * The number of structural features of the '<em>Price Item</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_ITEM_FEATURE_COUNT = 6;

	/**
	 * The number of operations of the '<em>Price Item</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PRICE_ITEM_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.ColumnTestImpl <em>Column Test</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.ColumnTestImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getColumnTest()
	 * @generated
	 */
	int COLUMN_TEST = 15;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__NAME = 0;

	/**
	 * The feature id for the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__CONTAMINANT = 1;

	/**
	 * The feature id for the '<em><b>Layer</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__LAYER = 2;

	/**
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__KIND = 3;

	/**
	 * The feature id for the '<em><b>Column Length Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__COLUMN_LENGTH_METRES = 4;

	/**
	 * The feature id for the '<em><b>Darcy Flux Metres Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__DARCY_FLUX_METRES_PER_DAY = 5;

	/**
	 * The feature id for the '<em><b>Water Content</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__WATER_CONTENT = 6;

	/**
	 * The feature id for the '<em><b>Bulk Density Kg Per Cubic Metre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__BULK_DENSITY_KG_PER_CUBIC_METRE = 7;

	/**
	 * The feature id for the '<em><b>Reference Concentration Milligrams Per Litre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE = 8;

	/**
	 * The feature id for the '<em><b>Points</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST__POINTS = 9;

	/**
	 * The number of structural features of the '<em>Column Test</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST_FEATURE_COUNT = 10;

	/**
	 * The number of operations of the '<em>Column Test</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.ColumnTestPointImpl <em>Column Test Point</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.ColumnTestPointImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getColumnTestPoint()
	 * @generated
	 */
	int COLUMN_TEST_POINT = 16;

	/**
	 * The feature id for the '<em><b>Pore Volumes</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST_POINT__PORE_VOLUMES = 0;

	/**
	 * The feature id for the '<em><b>Relative Concentration</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST_POINT__RELATIVE_CONCENTRATION = 1;

	/**
	 * The number of structural features of the '<em>Column Test Point</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST_POINT_FEATURE_COUNT = 2;

	/**
	 * The number of operations of the '<em>Column Test Point</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int COLUMN_TEST_POINT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.UncertaintySettingsImpl <em>Uncertainty Settings</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.UncertaintySettingsImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getUncertaintySettings()
	 * @generated
	 */
	int UNCERTAINTY_SETTINGS = 17;

	/**
	 * The feature id for the '<em><b>Enabled</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAINTY_SETTINGS__ENABLED = 0;

	/**
	 * The feature id for the '<em><b>Run Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAINTY_SETTINGS__RUN_COUNT = 1;

	/**
	 * The feature id for the '<em><b>Seed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAINTY_SETTINGS__SEED = 2;

	/**
	 * The feature id for the '<em><b>Sampling Method</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAINTY_SETTINGS__SAMPLING_METHOD = 3;

	/**
	 * The feature id for the '<em><b>Inputs</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAINTY_SETTINGS__INPUTS = 4;

	/**
	 * The feature id for the '<em><b>Rank Correlations</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAINTY_SETTINGS__RANK_CORRELATIONS = 5;

	/**
	 * The number of structural features of the '<em>Uncertainty Settings</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAINTY_SETTINGS_FEATURE_COUNT = 6;

	/**
	 * The number of operations of the '<em>Uncertainty Settings</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAINTY_SETTINGS_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.UncertainInputImpl <em>Uncertain Input</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.UncertainInputImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getUncertainInput()
	 * @generated
	 */
	int UNCERTAIN_INPUT = 18;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__NAME = 0;

	/**
	 * The feature id for the '<em><b>Target</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__TARGET = 1;

	/**
	 * The feature id for the '<em><b>Feature Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__FEATURE_NAME = 2;

	/**
	 * The feature id for the '<em><b>Distribution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__DISTRIBUTION = 3;

	/**
	 * The feature id for the '<em><b>Mean In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT = 4;

	/**
	 * The feature id for the '<em><b>Standard Deviation In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT = 5;

	/**
	 * The feature id for the '<em><b>Median In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT = 6;

	/**
	 * The feature id for the '<em><b>Geometric Standard Deviation</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION = 7;

	/**
	 * The feature id for the '<em><b>Minimum In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT = 8;

	/**
	 * The feature id for the '<em><b>Mode In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT = 9;

	/**
	 * The feature id for the '<em><b>Maximum In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT = 10;

	/**
	 * The number of structural features of the '<em>Uncertain Input</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT_FEATURE_COUNT = 11;

	/**
	 * The number of operations of the '<em>Uncertain Input</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNCERTAIN_INPUT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.RankCorrelationImpl <em>Rank Correlation</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.RankCorrelationImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getRankCorrelation()
	 * @generated
	 */
	int RANK_CORRELATION = 19;

	/**
	 * The feature id for the '<em><b>First</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RANK_CORRELATION__FIRST = 0;

	/**
	 * The feature id for the '<em><b>Second</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RANK_CORRELATION__SECOND = 1;

	/**
	 * The feature id for the '<em><b>Coefficient</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RANK_CORRELATION__COEFFICIENT = 2;

	/**
	 * The number of structural features of the '<em>Rank Correlation</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RANK_CORRELATION_FEATURE_COUNT = 3;

	/**
	 * The number of operations of the '<em>Rank Correlation</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RANK_CORRELATION_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl <em>Zone Analysis Settings</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.ZoneAnalysisSettingsImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getZoneAnalysisSettings()
	 * @generated
	 */
	int ZONE_ANALYSIS_SETTINGS = 20;

	/**
	 * The feature id for the '<em><b>Estimator</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__ESTIMATOR = 0;

	/**
	 * The feature id for the '<em><b>Non Detect Rule</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE = 1;

	/**
	 * The feature id for the '<em><b>Inverse Distance Power</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER = 2;

	/**
	 * The feature id for the '<em><b>Maximum Neighbours</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS = 3;

	/**
	 * The feature id for the '<em><b>Search Radius Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES = 4;

	/**
	 * The feature id for the '<em><b>Vertical Distance Factor</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR = 5;

	/**
	 * The feature id for the '<em><b>Block Plan Size Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES = 6;

	/**
	 * The feature id for the '<em><b>Block Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES = 7;

	/**
	 * The feature id for the '<em><b>Variogram Model</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL = 8;

	/**
	 * The feature id for the '<em><b>Variogram Nugget Mg Per Kg Squared</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED = 9;

	/**
	 * The feature id for the '<em><b>Variogram Sill Mg Per Kg Squared</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED = 10;

	/**
	 * The feature id for the '<em><b>Variogram Range Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES = 11;

	/**
	 * The feature id for the '<em><b>Delay Years</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__DELAY_YEARS = 12;

	/**
	 * The feature id for the '<em><b>Transverse Dispersivity Fraction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION = 13;

	/**
	 * The feature id for the '<em><b>Hot Spot Multiple</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE = 14;

	/**
	 * The number of structural features of the '<em>Zone Analysis Settings</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS_FEATURE_COUNT = 15;

	/**
	 * The number of operations of the '<em>Zone Analysis Settings</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ZONE_ANALYSIS_SETTINGS_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.ComplianceCriterion <em>Compliance Criterion</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.ComplianceCriterion
	 * @see eluvia.site.model.impl.SitePackageImpl#getComplianceCriterion()
	 * @generated
	 */
	int COMPLIANCE_CRITERION = 21;


	/**
	 * The meta object id for the '{@link eluvia.site.model.UnitSystem <em>Unit System</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.UnitSystem
	 * @see eluvia.site.model.impl.SitePackageImpl#getUnitSystem()
	 * @generated
	 */
	int UNIT_SYSTEM = 22;

	/**
	 * The meta object id for the '{@link eluvia.site.model.DispersivityRule <em>Dispersivity Rule</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.DispersivityRule
	 * @see eluvia.site.model.impl.SitePackageImpl#getDispersivityRule()
	 * @generated
	 */
	int DISPERSIVITY_RULE = 23;

	/**
	 * The meta object id for the '{@link eluvia.site.model.SorptionIsotherm <em>Sorption Isotherm</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.SorptionIsotherm
	 * @see eluvia.site.model.impl.SitePackageImpl#getSorptionIsotherm()
	 * @generated
	 */
	int SORPTION_ISOTHERM = 24;

	/**
	 * The meta object id for the '{@link eluvia.site.model.NonequilibriumEntry <em>Nonequilibrium Entry</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.NonequilibriumEntry
	 * @see eluvia.site.model.impl.SitePackageImpl#getNonequilibriumEntry()
	 * @generated
	 */
	int NONEQUILIBRIUM_ENTRY = 25;

	/**
	 * The meta object id for the '{@link eluvia.site.model.ComplianceStatistic <em>Compliance Statistic</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.ComplianceStatistic
	 * @see eluvia.site.model.impl.SitePackageImpl#getComplianceStatistic()
	 * @generated
	 */
	int COMPLIANCE_STATISTIC = 26;

	/**
	 * The meta object id for the '{@link eluvia.site.model.SolutionMethod <em>Solution Method</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.SolutionMethod
	 * @see eluvia.site.model.impl.SitePackageImpl#getSolutionMethod()
	 * @generated
	 */
	int SOLUTION_METHOD = 27;

	/**
	 * The meta object id for the '{@link eluvia.site.model.ExcavationSoilType <em>Excavation Soil Type</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.ExcavationSoilType
	 * @see eluvia.site.model.impl.SitePackageImpl#getExcavationSoilType()
	 * @generated
	 */
	int EXCAVATION_SOIL_TYPE = 28;

	/**
	 * The meta object id for the '{@link eluvia.site.model.ColumnTestKind <em>Column Test Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.ColumnTestKind
	 * @see eluvia.site.model.impl.SitePackageImpl#getColumnTestKind()
	 * @generated
	 */
	int COLUMN_TEST_KIND = 29;


	/**
	 * The meta object id for the '{@link eluvia.site.model.UncertaintySampling <em>Uncertainty Sampling</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.UncertaintySampling
	 * @see eluvia.site.model.impl.SitePackageImpl#getUncertaintySampling()
	 * @generated
	 */
	int UNCERTAINTY_SAMPLING = 30;

	/**
	 * The meta object id for the '{@link eluvia.site.model.InputDistributionKind <em>Input Distribution Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.InputDistributionKind
	 * @see eluvia.site.model.impl.SitePackageImpl#getInputDistributionKind()
	 * @generated
	 */
	int INPUT_DISTRIBUTION_KIND = 31;


	/**
	 * The meta object id for the '{@link eluvia.site.model.ZoneEstimatorKind <em>Zone Estimator Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.ZoneEstimatorKind
	 * @see eluvia.site.model.impl.SitePackageImpl#getZoneEstimatorKind()
	 * @generated
	 */
	int ZONE_ESTIMATOR_KIND = 32;

	/**
	 * The meta object id for the '{@link eluvia.site.model.NonDetectValue <em>Non Detect Value</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.NonDetectValue
	 * @see eluvia.site.model.impl.SitePackageImpl#getNonDetectValue()
	 * @generated
	 */
	int NON_DETECT_VALUE = 33;

	/**
	 * The meta object id for the '{@link eluvia.site.model.VariogramShapeKind <em>Variogram Shape Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.VariogramShapeKind
	 * @see eluvia.site.model.impl.SitePackageImpl#getVariogramShapeKind()
	 * @generated
	 */
	int VARIOGRAM_SHAPE_KIND = 34;


	/**
	 * Returns the meta object for class '{@link eluvia.site.model.Project <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Project</em>'.
	 * @see eluvia.site.model.Project
	 * @generated
	 */
	EClass getProject();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Project#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.Project#getName()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Project#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see eluvia.site.model.Project#getDescription()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_Description();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Project#getSchemaVersion <em>Schema Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Schema Version</em>'.
	 * @see eluvia.site.model.Project#getSchemaVersion()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_SchemaVersion();

	/**
	 * Returns the meta object for the containment reference '{@link eluvia.site.model.Project#getSite <em>Site</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Site</em>'.
	 * @see eluvia.site.model.Project#getSite()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Site();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getContaminants <em>Contaminants</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Contaminants</em>'.
	 * @see eluvia.site.model.Project#getContaminants()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Contaminants();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getCleanupLevels <em>Cleanup Levels</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Cleanup Levels</em>'.
	 * @see eluvia.site.model.Project#getCleanupLevels()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_CleanupLevels();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getFlushingDesigns <em>Flushing Designs</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Flushing Designs</em>'.
	 * @see eluvia.site.model.Project#getFlushingDesigns()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_FlushingDesigns();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Project#getUnitSystem <em>Unit System</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Unit System</em>'.
	 * @see eluvia.site.model.Project#getUnitSystem()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_UnitSystem();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getRevisions <em>Revisions</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Revisions</em>'.
	 * @see eluvia.site.model.Project#getRevisions()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Revisions();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getExcavationDesigns <em>Excavation Designs</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Excavation Designs</em>'.
	 * @see eluvia.site.model.Project#getExcavationDesigns()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_ExcavationDesigns();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getPriceBooks <em>Price Books</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Price Books</em>'.
	 * @see eluvia.site.model.Project#getPriceBooks()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_PriceBooks();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getColumnTests <em>Column Tests</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Column Tests</em>'.
	 * @see eluvia.site.model.Project#getColumnTests()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_ColumnTests();

	/**
	 * Returns the meta object for the containment reference '{@link eluvia.site.model.Project#getUncertainty <em>Uncertainty</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Uncertainty</em>'.
	 * @see eluvia.site.model.Project#getUncertainty()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Uncertainty();

	/**
	 * Returns the meta object for the containment reference '{@link eluvia.site.model.Project#getZoneAnalysis <em>Zone Analysis</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Zone Analysis</em>'.
	 * @see eluvia.site.model.Project#getZoneAnalysis()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_ZoneAnalysis();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.Site <em>Site</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Site</em>'.
	 * @see eluvia.site.model.Site
	 * @generated
	 */
	EClass getSite();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Site#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.Site#getName()
	 * @see #getSite()
	 * @generated
	 */
	EAttribute getSite_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Site#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see eluvia.site.model.Site#getDescription()
	 * @see #getSite()
	 * @generated
	 */
	EAttribute getSite_Description();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Site#getLayers <em>Layers</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Layers</em>'.
	 * @see eluvia.site.model.Site#getLayers()
	 * @see #getSite()
	 * @generated
	 */
	EReference getSite_Layers();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Site#getZones <em>Zones</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Zones</em>'.
	 * @see eluvia.site.model.Site#getZones()
	 * @see #getSite()
	 * @generated
	 */
	EReference getSite_Zones();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Site#getCoordinateFrame <em>Coordinate Frame</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Coordinate Frame</em>'.
	 * @see eluvia.site.model.Site#getCoordinateFrame()
	 * @see #getSite()
	 * @generated
	 */
	EAttribute getSite_CoordinateFrame();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Site#getGroundSurfaceElevationMetres <em>Ground Surface Elevation Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Ground Surface Elevation Metres</em>'.
	 * @see eluvia.site.model.Site#getGroundSurfaceElevationMetres()
	 * @see #getSite()
	 * @generated
	 */
	EAttribute getSite_GroundSurfaceElevationMetres();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Site#getBoundary <em>Boundary</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Boundary</em>'.
	 * @see eluvia.site.model.Site#getBoundary()
	 * @see #getSite()
	 * @generated
	 */
	EReference getSite_Boundary();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Site#getSamplingLocations <em>Sampling Locations</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Sampling Locations</em>'.
	 * @see eluvia.site.model.Site#getSamplingLocations()
	 * @see #getSite()
	 * @generated
	 */
	EReference getSite_SamplingLocations();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.SoilLayer <em>Soil Layer</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Soil Layer</em>'.
	 * @see eluvia.site.model.SoilLayer
	 * @generated
	 */
	EClass getSoilLayer();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.SoilLayer#getName()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getTopDepthMetres <em>Top Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Top Depth Metres</em>'.
	 * @see eluvia.site.model.SoilLayer#getTopDepthMetres()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_TopDepthMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getBottomDepthMetres <em>Bottom Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bottom Depth Metres</em>'.
	 * @see eluvia.site.model.SoilLayer#getBottomDepthMetres()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_BottomDepthMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getTextureClass <em>Texture Class</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Texture Class</em>'.
	 * @see eluvia.site.model.SoilLayer#getTextureClass()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_TextureClass();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getBulkDensityKgPerCubicMetre <em>Bulk Density Kg Per Cubic Metre</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bulk Density Kg Per Cubic Metre</em>'.
	 * @see eluvia.site.model.SoilLayer#getBulkDensityKgPerCubicMetre()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_BulkDensityKgPerCubicMetre();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getPorosity <em>Porosity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Porosity</em>'.
	 * @see eluvia.site.model.SoilLayer#getPorosity()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_Porosity();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getWaterContent <em>Water Content</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Water Content</em>'.
	 * @see eluvia.site.model.SoilLayer#getWaterContent()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_WaterContent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getOrganicCarbonFraction <em>Organic Carbon Fraction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Organic Carbon Fraction</em>'.
	 * @see eluvia.site.model.SoilLayer#getOrganicCarbonFraction()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_OrganicCarbonFraction();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getSaturatedConductivityMetresPerDay <em>Saturated Conductivity Metres Per Day</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Saturated Conductivity Metres Per Day</em>'.
	 * @see eluvia.site.model.SoilLayer#getSaturatedConductivityMetresPerDay()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_SaturatedConductivityMetresPerDay();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getDispersivityMetres <em>Dispersivity Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Dispersivity Metres</em>'.
	 * @see eluvia.site.model.SoilLayer#getDispersivityMetres()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_DispersivityMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getSwellFactor <em>Swell Factor</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Swell Factor</em>'.
	 * @see eluvia.site.model.SoilLayer#getSwellFactor()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_SwellFactor();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getShrinkageFactor <em>Shrinkage Factor</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Shrinkage Factor</em>'.
	 * @see eluvia.site.model.SoilLayer#getShrinkageFactor()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_ShrinkageFactor();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getDispersivityRule <em>Dispersivity Rule</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Dispersivity Rule</em>'.
	 * @see eluvia.site.model.SoilLayer#getDispersivityRule()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_DispersivityRule();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getDispersivityScaleMetres <em>Dispersivity Scale Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Dispersivity Scale Metres</em>'.
	 * @see eluvia.site.model.SoilLayer#getDispersivityScaleMetres()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_DispersivityScaleMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getEffectiveDispersivityMetres <em>Effective Dispersivity Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Effective Dispersivity Metres</em>'.
	 * @see eluvia.site.model.SoilLayer#getEffectiveDispersivityMetres()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_EffectiveDispersivityMetres();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.Contaminant <em>Contaminant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Contaminant</em>'.
	 * @see eluvia.site.model.Contaminant
	 * @generated
	 */
	EClass getContaminant();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.Contaminant#getName()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getCasNumber <em>Cas Number</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Cas Number</em>'.
	 * @see eluvia.site.model.Contaminant#getCasNumber()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_CasNumber();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getKocLitresPerKg <em>Koc Litres Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Koc Litres Per Kg</em>'.
	 * @see eluvia.site.model.Contaminant#getKocLitresPerKg()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_KocLitresPerKg();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#isKdEntered <em>Kd Entered</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kd Entered</em>'.
	 * @see eluvia.site.model.Contaminant#isKdEntered()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_KdEntered();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getKdLitresPerKg <em>Kd Litres Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kd Litres Per Kg</em>'.
	 * @see eluvia.site.model.Contaminant#getKdLitresPerKg()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_KdLitresPerKg();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getDiffusionSquareMetresPerSecond <em>Diffusion Square Metres Per Second</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Diffusion Square Metres Per Second</em>'.
	 * @see eluvia.site.model.Contaminant#getDiffusionSquareMetresPerSecond()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_DiffusionSquareMetresPerSecond();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getHalfLifeDays <em>Half Life Days</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Half Life Days</em>'.
	 * @see eluvia.site.model.Contaminant#getHalfLifeDays()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_HalfLifeDays();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getIsotherm <em>Isotherm</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Isotherm</em>'.
	 * @see eluvia.site.model.Contaminant#getIsotherm()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_Isotherm();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getFreundlichKfMgPerKgPerMgPerLitreToN <em>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</em>'.
	 * @see eluvia.site.model.Contaminant#getFreundlichKfMgPerKgPerMgPerLitreToN()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_FreundlichKfMgPerKgPerMgPerLitreToN();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getFreundlichExponent <em>Freundlich Exponent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Freundlich Exponent</em>'.
	 * @see eluvia.site.model.Contaminant#getFreundlichExponent()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_FreundlichExponent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getLangmuirMaximumMilligramsPerKg <em>Langmuir Maximum Milligrams Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Langmuir Maximum Milligrams Per Kg</em>'.
	 * @see eluvia.site.model.Contaminant#getLangmuirMaximumMilligramsPerKg()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_LangmuirMaximumMilligramsPerKg();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getLangmuirConstantLitresPerMilligram <em>Langmuir Constant Litres Per Milligram</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Langmuir Constant Litres Per Milligram</em>'.
	 * @see eluvia.site.model.Contaminant#getLangmuirConstantLitresPerMilligram()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_LangmuirConstantLitresPerMilligram();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getWaterSolubilityMilligramsPerLitre <em>Water Solubility Milligrams Per Litre</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Water Solubility Milligrams Per Litre</em>'.
	 * @see eluvia.site.model.Contaminant#getWaterSolubilityMilligramsPerLitre()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_WaterSolubilityMilligramsPerLitre();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getNonequilibrium <em>Nonequilibrium</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Nonequilibrium</em>'.
	 * @see eluvia.site.model.Contaminant#getNonequilibrium()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_Nonequilibrium();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getBeta <em>Beta</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Beta</em>'.
	 * @see eluvia.site.model.Contaminant#getBeta()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_Beta();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getOmega <em>Omega</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Omega</em>'.
	 * @see eluvia.site.model.Contaminant#getOmega()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_Omega();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getMobileWaterFraction <em>Mobile Water Fraction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Mobile Water Fraction</em>'.
	 * @see eluvia.site.model.Contaminant#getMobileWaterFraction()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_MobileWaterFraction();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getMobileSiteFraction <em>Mobile Site Fraction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Mobile Site Fraction</em>'.
	 * @see eluvia.site.model.Contaminant#getMobileSiteFraction()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_MobileSiteFraction();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getMassTransferRatePerDay <em>Mass Transfer Rate Per Day</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Mass Transfer Rate Per Day</em>'.
	 * @see eluvia.site.model.Contaminant#getMassTransferRatePerDay()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_MassTransferRatePerDay();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getPropertySource <em>Property Source</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Property Source</em>'.
	 * @see eluvia.site.model.Contaminant#getPropertySource()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_PropertySource();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.CleanupLevel <em>Cleanup Level</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Cleanup Level</em>'.
	 * @see eluvia.site.model.CleanupLevel
	 * @generated
	 */
	EClass getCleanupLevel();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.CleanupLevel#getContaminant <em>Contaminant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Contaminant</em>'.
	 * @see eluvia.site.model.CleanupLevel#getContaminant()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EReference getCleanupLevel_Contaminant();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.CleanupLevel#getSoilLevelMilligramsPerKg <em>Soil Level Milligrams Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Soil Level Milligrams Per Kg</em>'.
	 * @see eluvia.site.model.CleanupLevel#getSoilLevelMilligramsPerKg()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EAttribute getCleanupLevel_SoilLevelMilligramsPerKg();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.CleanupLevel#getBasis <em>Basis</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Basis</em>'.
	 * @see eluvia.site.model.CleanupLevel#getBasis()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EAttribute getCleanupLevel_Basis();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.CleanupLevel#isSoilLevelEntered <em>Soil Level Entered</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Soil Level Entered</em>'.
	 * @see eluvia.site.model.CleanupLevel#isSoilLevelEntered()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EAttribute getCleanupLevel_SoilLevelEntered();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.CleanupLevel#isPorewaterLevelEntered <em>Porewater Level Entered</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Porewater Level Entered</em>'.
	 * @see eluvia.site.model.CleanupLevel#isPorewaterLevelEntered()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EAttribute getCleanupLevel_PorewaterLevelEntered();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.CleanupLevel#getPorewaterLevelMilligramsPerLitre <em>Porewater Level Milligrams Per Litre</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Porewater Level Milligrams Per Litre</em>'.
	 * @see eluvia.site.model.CleanupLevel#getPorewaterLevelMilligramsPerLitre()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EAttribute getCleanupLevel_PorewaterLevelMilligramsPerLitre();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.CleanupLevel#getStatistic <em>Statistic</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Statistic</em>'.
	 * @see eluvia.site.model.CleanupLevel#getStatistic()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EAttribute getCleanupLevel_Statistic();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.TreatmentZone <em>Treatment Zone</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Treatment Zone</em>'.
	 * @see eluvia.site.model.TreatmentZone
	 * @generated
	 */
	EClass getTreatmentZone();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.TreatmentZone#getName()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getAreaSquareMetres <em>Area Square Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Area Square Metres</em>'.
	 * @see eluvia.site.model.TreatmentZone#getAreaSquareMetres()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_AreaSquareMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getTopDepthMetres <em>Top Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Top Depth Metres</em>'.
	 * @see eluvia.site.model.TreatmentZone#getTopDepthMetres()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_TopDepthMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getBottomDepthMetres <em>Bottom Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bottom Depth Metres</em>'.
	 * @see eluvia.site.model.TreatmentZone#getBottomDepthMetres()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_BottomDepthMetres();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.TreatmentZone#getSourceConcentrations <em>Source Concentrations</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Source Concentrations</em>'.
	 * @see eluvia.site.model.TreatmentZone#getSourceConcentrations()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EReference getTreatmentZone_SourceConcentrations();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.TreatmentZone#getFootprint <em>Footprint</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Footprint</em>'.
	 * @see eluvia.site.model.TreatmentZone#getFootprint()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EReference getTreatmentZone_Footprint();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getEffectiveAreaSquareMetres <em>Effective Area Square Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Effective Area Square Metres</em>'.
	 * @see eluvia.site.model.TreatmentZone#getEffectiveAreaSquareMetres()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_EffectiveAreaSquareMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getVolumeCubicMetres <em>Volume Cubic Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Volume Cubic Metres</em>'.
	 * @see eluvia.site.model.TreatmentZone#getVolumeCubicMetres()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_VolumeCubicMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getPoreVolumeCubicMetres <em>Pore Volume Cubic Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Pore Volume Cubic Metres</em>'.
	 * @see eluvia.site.model.TreatmentZone#getPoreVolumeCubicMetres()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_PoreVolumeCubicMetres();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.SourceConcentration <em>Source Concentration</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Source Concentration</em>'.
	 * @see eluvia.site.model.SourceConcentration
	 * @generated
	 */
	EClass getSourceConcentration();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.SourceConcentration#getContaminant <em>Contaminant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Contaminant</em>'.
	 * @see eluvia.site.model.SourceConcentration#getContaminant()
	 * @see #getSourceConcentration()
	 * @generated
	 */
	EReference getSourceConcentration_Contaminant();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SourceConcentration#getSoilConcentrationMilligramsPerKg <em>Soil Concentration Milligrams Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Soil Concentration Milligrams Per Kg</em>'.
	 * @see eluvia.site.model.SourceConcentration#getSoilConcentrationMilligramsPerKg()
	 * @see #getSourceConcentration()
	 * @generated
	 */
	EAttribute getSourceConcentration_SoilConcentrationMilligramsPerKg();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.FlushingDesign <em>Flushing Design</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Flushing Design</em>'.
	 * @see eluvia.site.model.FlushingDesign
	 * @generated
	 */
	EClass getFlushingDesign();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.FlushingDesign#getName()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_Name();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.FlushingDesign#getZone <em>Zone</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Zone</em>'.
	 * @see eluvia.site.model.FlushingDesign#getZone()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EReference getFlushingDesign_Zone();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getDarcyFluxMetresPerDay <em>Darcy Flux Metres Per Day</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Darcy Flux Metres Per Day</em>'.
	 * @see eluvia.site.model.FlushingDesign#getDarcyFluxMetresPerDay()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_DarcyFluxMetresPerDay();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getOperatingDaysPerWeek <em>Operating Days Per Week</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Operating Days Per Week</em>'.
	 * @see eluvia.site.model.FlushingDesign#getOperatingDaysPerWeek()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_OperatingDaysPerWeek();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getCaptureEfficiency <em>Capture Efficiency</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Capture Efficiency</em>'.
	 * @see eluvia.site.model.FlushingDesign#getCaptureEfficiency()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_CaptureEfficiency();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getCriterion <em>Criterion</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Criterion</em>'.
	 * @see eluvia.site.model.FlushingDesign#getCriterion()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_Criterion();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getMaxPoreVolumes <em>Max Pore Volumes</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Pore Volumes</em>'.
	 * @see eluvia.site.model.FlushingDesign#getMaxPoreVolumes()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_MaxPoreVolumes();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getSolutionMethod <em>Solution Method</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Solution Method</em>'.
	 * @see eluvia.site.model.FlushingDesign#getSolutionMethod()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_SolutionMethod();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getNumericalCellCount <em>Numerical Cell Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Numerical Cell Count</em>'.
	 * @see eluvia.site.model.FlushingDesign#getNumericalCellCount()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_NumericalCellCount();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getNumericalRelativeTolerance <em>Numerical Relative Tolerance</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Numerical Relative Tolerance</em>'.
	 * @see eluvia.site.model.FlushingDesign#getNumericalRelativeTolerance()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_NumericalRelativeTolerance();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getMonitoringIntervalDays <em>Monitoring Interval Days</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Monitoring Interval Days</em>'.
	 * @see eluvia.site.model.FlushingDesign#getMonitoringIntervalDays()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_MonitoringIntervalDays();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getAmendmentName <em>Amendment Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Amendment Name</em>'.
	 * @see eluvia.site.model.FlushingDesign#getAmendmentName()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_AmendmentName();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getAmendmentDoseKilogramsPerCubicMetre <em>Amendment Dose Kilograms Per Cubic Metre</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Amendment Dose Kilograms Per Cubic Metre</em>'.
	 * @see eluvia.site.model.FlushingDesign#getAmendmentDoseKilogramsPerCubicMetre()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_AmendmentDoseKilogramsPerCubicMetre();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.FlushingDesign#getPriceBook <em>Price Book</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Price Book</em>'.
	 * @see eluvia.site.model.FlushingDesign#getPriceBook()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EReference getFlushingDesign_PriceBook();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.Revision <em>Revision</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Revision</em>'.
	 * @see eluvia.site.model.Revision
	 * @generated
	 */
	EClass getRevision();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Revision#getAuthor <em>Author</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Author</em>'.
	 * @see eluvia.site.model.Revision#getAuthor()
	 * @see #getRevision()
	 * @generated
	 */
	EAttribute getRevision_Author();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Revision#getTimestamp <em>Timestamp</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Timestamp</em>'.
	 * @see eluvia.site.model.Revision#getTimestamp()
	 * @see #getRevision()
	 * @generated
	 */
	EAttribute getRevision_Timestamp();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Revision#getSummary <em>Summary</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Summary</em>'.
	 * @see eluvia.site.model.Revision#getSummary()
	 * @see #getRevision()
	 * @generated
	 */
	EAttribute getRevision_Summary();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.Vertex <em>Vertex</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Vertex</em>'.
	 * @see eluvia.site.model.Vertex
	 * @generated
	 */
	EClass getVertex();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Vertex#getEastingMetres <em>Easting Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Easting Metres</em>'.
	 * @see eluvia.site.model.Vertex#getEastingMetres()
	 * @see #getVertex()
	 * @generated
	 */
	EAttribute getVertex_EastingMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Vertex#getNorthingMetres <em>Northing Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Northing Metres</em>'.
	 * @see eluvia.site.model.Vertex#getNorthingMetres()
	 * @see #getVertex()
	 * @generated
	 */
	EAttribute getVertex_NorthingMetres();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.SamplingLocation <em>Sampling Location</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Sampling Location</em>'.
	 * @see eluvia.site.model.SamplingLocation
	 * @generated
	 */
	EClass getSamplingLocation();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SamplingLocation#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.SamplingLocation#getName()
	 * @see #getSamplingLocation()
	 * @generated
	 */
	EAttribute getSamplingLocation_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SamplingLocation#getEastingMetres <em>Easting Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Easting Metres</em>'.
	 * @see eluvia.site.model.SamplingLocation#getEastingMetres()
	 * @see #getSamplingLocation()
	 * @generated
	 */
	EAttribute getSamplingLocation_EastingMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SamplingLocation#getNorthingMetres <em>Northing Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Northing Metres</em>'.
	 * @see eluvia.site.model.SamplingLocation#getNorthingMetres()
	 * @see #getSamplingLocation()
	 * @generated
	 */
	EAttribute getSamplingLocation_NorthingMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SamplingLocation#getGroundElevationMetres <em>Ground Elevation Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Ground Elevation Metres</em>'.
	 * @see eluvia.site.model.SamplingLocation#getGroundElevationMetres()
	 * @see #getSamplingLocation()
	 * @generated
	 */
	EAttribute getSamplingLocation_GroundElevationMetres();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.SamplingLocation#getSamples <em>Samples</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Samples</em>'.
	 * @see eluvia.site.model.SamplingLocation#getSamples()
	 * @see #getSamplingLocation()
	 * @generated
	 */
	EReference getSamplingLocation_Samples();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.Sample <em>Sample</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Sample</em>'.
	 * @see eluvia.site.model.Sample
	 * @generated
	 */
	EClass getSample();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Sample#getTopDepthMetres <em>Top Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Top Depth Metres</em>'.
	 * @see eluvia.site.model.Sample#getTopDepthMetres()
	 * @see #getSample()
	 * @generated
	 */
	EAttribute getSample_TopDepthMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Sample#getBottomDepthMetres <em>Bottom Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bottom Depth Metres</em>'.
	 * @see eluvia.site.model.Sample#getBottomDepthMetres()
	 * @see #getSample()
	 * @generated
	 */
	EAttribute getSample_BottomDepthMetres();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.Sample#getContaminant <em>Contaminant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Contaminant</em>'.
	 * @see eluvia.site.model.Sample#getContaminant()
	 * @see #getSample()
	 * @generated
	 */
	EReference getSample_Contaminant();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Sample#getConcentrationMilligramsPerKg <em>Concentration Milligrams Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Concentration Milligrams Per Kg</em>'.
	 * @see eluvia.site.model.Sample#getConcentrationMilligramsPerKg()
	 * @see #getSample()
	 * @generated
	 */
	EAttribute getSample_ConcentrationMilligramsPerKg();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Sample#isNonDetect <em>Non Detect</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Non Detect</em>'.
	 * @see eluvia.site.model.Sample#isNonDetect()
	 * @see #getSample()
	 * @generated
	 */
	EAttribute getSample_NonDetect();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Sample#getDetectionLimitMilligramsPerKg <em>Detection Limit Milligrams Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Detection Limit Milligrams Per Kg</em>'.
	 * @see eluvia.site.model.Sample#getDetectionLimitMilligramsPerKg()
	 * @see #getSample()
	 * @generated
	 */
	EAttribute getSample_DetectionLimitMilligramsPerKg();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.ExcavationDesign <em>Excavation Design</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Excavation Design</em>'.
	 * @see eluvia.site.model.ExcavationDesign
	 * @generated
	 */
	EClass getExcavationDesign();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ExcavationDesign#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.ExcavationDesign#getName()
	 * @see #getExcavationDesign()
	 * @generated
	 */
	EAttribute getExcavationDesign_Name();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.ExcavationDesign#getZone <em>Zone</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Zone</em>'.
	 * @see eluvia.site.model.ExcavationDesign#getZone()
	 * @see #getExcavationDesign()
	 * @generated
	 */
	EReference getExcavationDesign_Zone();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ExcavationDesign#getSoilType <em>Soil Type</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Soil Type</em>'.
	 * @see eluvia.site.model.ExcavationDesign#getSoilType()
	 * @see #getExcavationDesign()
	 * @generated
	 */
	EAttribute getExcavationDesign_SoilType();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ExcavationDesign#getSideSlopeHorizontalPerVertical <em>Side Slope Horizontal Per Vertical</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Side Slope Horizontal Per Vertical</em>'.
	 * @see eluvia.site.model.ExcavationDesign#getSideSlopeHorizontalPerVertical()
	 * @see #getExcavationDesign()
	 * @generated
	 */
	EAttribute getExcavationDesign_SideSlopeHorizontalPerVertical();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ExcavationDesign#getOverdigMetres <em>Overdig Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Overdig Metres</em>'.
	 * @see eluvia.site.model.ExcavationDesign#getOverdigMetres()
	 * @see #getExcavationDesign()
	 * @generated
	 */
	EAttribute getExcavationDesign_OverdigMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ExcavationDesign#getTruckHeapedCapacityCubicMetres <em>Truck Heaped Capacity Cubic Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Truck Heaped Capacity Cubic Metres</em>'.
	 * @see eluvia.site.model.ExcavationDesign#getTruckHeapedCapacityCubicMetres()
	 * @see #getExcavationDesign()
	 * @generated
	 */
	EAttribute getExcavationDesign_TruckHeapedCapacityCubicMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ExcavationDesign#getTruckPayloadKilograms <em>Truck Payload Kilograms</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Truck Payload Kilograms</em>'.
	 * @see eluvia.site.model.ExcavationDesign#getTruckPayloadKilograms()
	 * @see #getExcavationDesign()
	 * @generated
	 */
	EAttribute getExcavationDesign_TruckPayloadKilograms();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.ExcavationDesign#getPriceBook <em>Price Book</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Price Book</em>'.
	 * @see eluvia.site.model.ExcavationDesign#getPriceBook()
	 * @see #getExcavationDesign()
	 * @generated
	 */
	EReference getExcavationDesign_PriceBook();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.PriceBook <em>Price Book</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Price Book</em>'.
	 * @see eluvia.site.model.PriceBook
	 * @generated
	 */
	EClass getPriceBook();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.PriceBook#getName()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getCurrency <em>Currency</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Currency</em>'.
	 * @see eluvia.site.model.PriceBook#getCurrency()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_Currency();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getReference <em>Reference</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Reference</em>'.
	 * @see eluvia.site.model.PriceBook#getReference()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_Reference();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.PriceBook#getItems <em>Items</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Items</em>'.
	 * @see eluvia.site.model.PriceBook#getItems()
	 * @see #getPriceBook()
	 * @generated
	 */
	EReference getPriceBook_Items();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getScopeContingencyPercent <em>Scope Contingency Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Scope Contingency Percent</em>'.
	 * @see eluvia.site.model.PriceBook#getScopeContingencyPercent()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_ScopeContingencyPercent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getBidContingencyPercent <em>Bid Contingency Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bid Contingency Percent</em>'.
	 * @see eluvia.site.model.PriceBook#getBidContingencyPercent()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_BidContingencyPercent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getProjectManagementPercent <em>Project Management Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Project Management Percent</em>'.
	 * @see eluvia.site.model.PriceBook#getProjectManagementPercent()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_ProjectManagementPercent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getRemedialDesignPercent <em>Remedial Design Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Remedial Design Percent</em>'.
	 * @see eluvia.site.model.PriceBook#getRemedialDesignPercent()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_RemedialDesignPercent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getConstructionManagementPercent <em>Construction Management Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Construction Management Percent</em>'.
	 * @see eluvia.site.model.PriceBook#getConstructionManagementPercent()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_ConstructionManagementPercent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getOperatingContingencyPercent <em>Operating Contingency Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Operating Contingency Percent</em>'.
	 * @see eluvia.site.model.PriceBook#getOperatingContingencyPercent()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_OperatingContingencyPercent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getOperatingProjectManagementPercent <em>Operating Project Management Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Operating Project Management Percent</em>'.
	 * @see eluvia.site.model.PriceBook#getOperatingProjectManagementPercent()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_OperatingProjectManagementPercent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getTechnicalSupportPercent <em>Technical Support Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Technical Support Percent</em>'.
	 * @see eluvia.site.model.PriceBook#getTechnicalSupportPercent()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_TechnicalSupportPercent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getDiscountRatePercent <em>Discount Rate Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Discount Rate Percent</em>'.
	 * @see eluvia.site.model.PriceBook#getDiscountRatePercent()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_DiscountRatePercent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceBook#getDiscountRateBasis <em>Discount Rate Basis</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Discount Rate Basis</em>'.
	 * @see eluvia.site.model.PriceBook#getDiscountRateBasis()
	 * @see #getPriceBook()
	 * @generated
	 */
	EAttribute getPriceBook_DiscountRateBasis();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.PriceItem <em>Price Item</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Price Item</em>'.
	 * @see eluvia.site.model.PriceItem
	 * @generated
	 */
	EClass getPriceItem();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceItem#getCode <em>Code</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Code</em>'.
	 * @see eluvia.site.model.PriceItem#getCode()
	 * @see #getPriceItem()
	 * @generated
	 */
	EAttribute getPriceItem_Code();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceItem#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.PriceItem#getName()
	 * @see #getPriceItem()
	 * @generated
	 */
	EAttribute getPriceItem_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceItem#getUnit <em>Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Unit</em>'.
	 * @see eluvia.site.model.PriceItem#getUnit()
	 * @see #getPriceItem()
	 * @generated
	 */
	EAttribute getPriceItem_Unit();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceItem#getRatePerUnit <em>Rate Per Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Rate Per Unit</em>'.
	 * @see eluvia.site.model.PriceItem#getRatePerUnit()
	 * @see #getPriceItem()
	 * @generated
	 */
	EAttribute getPriceItem_RatePerUnit();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceItem#getCurrency <em>Currency</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Currency</em>'.
	 * @see eluvia.site.model.PriceItem#getCurrency()
	 * @see #getPriceItem()
	 * @generated
	 */
	EAttribute getPriceItem_Currency();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.PriceItem#getSourceNote <em>Source Note</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Source Note</em>'.
	 * @see eluvia.site.model.PriceItem#getSourceNote()
	 * @see #getPriceItem()
	 * @generated
	 */
	EAttribute getPriceItem_SourceNote();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.ColumnTest <em>Column Test</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Column Test</em>'.
	 * @see eluvia.site.model.ColumnTest
	 * @generated
	 */
	EClass getColumnTest();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ColumnTest#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.ColumnTest#getName()
	 * @see #getColumnTest()
	 * @generated
	 */
	EAttribute getColumnTest_Name();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.ColumnTest#getContaminant <em>Contaminant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Contaminant</em>'.
	 * @see eluvia.site.model.ColumnTest#getContaminant()
	 * @see #getColumnTest()
	 * @generated
	 */
	EReference getColumnTest_Contaminant();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.ColumnTest#getLayer <em>Layer</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Layer</em>'.
	 * @see eluvia.site.model.ColumnTest#getLayer()
	 * @see #getColumnTest()
	 * @generated
	 */
	EReference getColumnTest_Layer();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ColumnTest#getKind <em>Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kind</em>'.
	 * @see eluvia.site.model.ColumnTest#getKind()
	 * @see #getColumnTest()
	 * @generated
	 */
	EAttribute getColumnTest_Kind();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ColumnTest#getColumnLengthMetres <em>Column Length Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Column Length Metres</em>'.
	 * @see eluvia.site.model.ColumnTest#getColumnLengthMetres()
	 * @see #getColumnTest()
	 * @generated
	 */
	EAttribute getColumnTest_ColumnLengthMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ColumnTest#getDarcyFluxMetresPerDay <em>Darcy Flux Metres Per Day</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Darcy Flux Metres Per Day</em>'.
	 * @see eluvia.site.model.ColumnTest#getDarcyFluxMetresPerDay()
	 * @see #getColumnTest()
	 * @generated
	 */
	EAttribute getColumnTest_DarcyFluxMetresPerDay();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ColumnTest#getWaterContent <em>Water Content</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Water Content</em>'.
	 * @see eluvia.site.model.ColumnTest#getWaterContent()
	 * @see #getColumnTest()
	 * @generated
	 */
	EAttribute getColumnTest_WaterContent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ColumnTest#getBulkDensityKgPerCubicMetre <em>Bulk Density Kg Per Cubic Metre</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bulk Density Kg Per Cubic Metre</em>'.
	 * @see eluvia.site.model.ColumnTest#getBulkDensityKgPerCubicMetre()
	 * @see #getColumnTest()
	 * @generated
	 */
	EAttribute getColumnTest_BulkDensityKgPerCubicMetre();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ColumnTest#getReferenceConcentrationMilligramsPerLitre <em>Reference Concentration Milligrams Per Litre</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Reference Concentration Milligrams Per Litre</em>'.
	 * @see eluvia.site.model.ColumnTest#getReferenceConcentrationMilligramsPerLitre()
	 * @see #getColumnTest()
	 * @generated
	 */
	EAttribute getColumnTest_ReferenceConcentrationMilligramsPerLitre();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.ColumnTest#getPoints <em>Points</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Points</em>'.
	 * @see eluvia.site.model.ColumnTest#getPoints()
	 * @see #getColumnTest()
	 * @generated
	 */
	EReference getColumnTest_Points();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.ColumnTestPoint <em>Column Test Point</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Column Test Point</em>'.
	 * @see eluvia.site.model.ColumnTestPoint
	 * @generated
	 */
	EClass getColumnTestPoint();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ColumnTestPoint#getPoreVolumes <em>Pore Volumes</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Pore Volumes</em>'.
	 * @see eluvia.site.model.ColumnTestPoint#getPoreVolumes()
	 * @see #getColumnTestPoint()
	 * @generated
	 */
	EAttribute getColumnTestPoint_PoreVolumes();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ColumnTestPoint#getRelativeConcentration <em>Relative Concentration</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Relative Concentration</em>'.
	 * @see eluvia.site.model.ColumnTestPoint#getRelativeConcentration()
	 * @see #getColumnTestPoint()
	 * @generated
	 */
	EAttribute getColumnTestPoint_RelativeConcentration();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.UncertaintySettings <em>Uncertainty Settings</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Uncertainty Settings</em>'.
	 * @see eluvia.site.model.UncertaintySettings
	 * @generated
	 */
	EClass getUncertaintySettings();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertaintySettings#isEnabled <em>Enabled</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Enabled</em>'.
	 * @see eluvia.site.model.UncertaintySettings#isEnabled()
	 * @see #getUncertaintySettings()
	 * @generated
	 */
	EAttribute getUncertaintySettings_Enabled();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertaintySettings#getRunCount <em>Run Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Run Count</em>'.
	 * @see eluvia.site.model.UncertaintySettings#getRunCount()
	 * @see #getUncertaintySettings()
	 * @generated
	 */
	EAttribute getUncertaintySettings_RunCount();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertaintySettings#getSeed <em>Seed</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Seed</em>'.
	 * @see eluvia.site.model.UncertaintySettings#getSeed()
	 * @see #getUncertaintySettings()
	 * @generated
	 */
	EAttribute getUncertaintySettings_Seed();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertaintySettings#getSamplingMethod <em>Sampling Method</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sampling Method</em>'.
	 * @see eluvia.site.model.UncertaintySettings#getSamplingMethod()
	 * @see #getUncertaintySettings()
	 * @generated
	 */
	EAttribute getUncertaintySettings_SamplingMethod();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.UncertaintySettings#getInputs <em>Inputs</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Inputs</em>'.
	 * @see eluvia.site.model.UncertaintySettings#getInputs()
	 * @see #getUncertaintySettings()
	 * @generated
	 */
	EReference getUncertaintySettings_Inputs();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.UncertaintySettings#getRankCorrelations <em>Rank Correlations</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Rank Correlations</em>'.
	 * @see eluvia.site.model.UncertaintySettings#getRankCorrelations()
	 * @see #getUncertaintySettings()
	 * @generated
	 */
	EReference getUncertaintySettings_RankCorrelations();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.UncertainInput <em>Uncertain Input</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Uncertain Input</em>'.
	 * @see eluvia.site.model.UncertainInput
	 * @generated
	 */
	EClass getUncertainInput();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.UncertainInput#getName()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_Name();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.UncertainInput#getTarget <em>Target</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Target</em>'.
	 * @see eluvia.site.model.UncertainInput#getTarget()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EReference getUncertainInput_Target();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getFeatureName <em>Feature Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Feature Name</em>'.
	 * @see eluvia.site.model.UncertainInput#getFeatureName()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_FeatureName();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getDistribution <em>Distribution</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Distribution</em>'.
	 * @see eluvia.site.model.UncertainInput#getDistribution()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_Distribution();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getMeanInFeatureUnit <em>Mean In Feature Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Mean In Feature Unit</em>'.
	 * @see eluvia.site.model.UncertainInput#getMeanInFeatureUnit()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_MeanInFeatureUnit();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getStandardDeviationInFeatureUnit <em>Standard Deviation In Feature Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Standard Deviation In Feature Unit</em>'.
	 * @see eluvia.site.model.UncertainInput#getStandardDeviationInFeatureUnit()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_StandardDeviationInFeatureUnit();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getMedianInFeatureUnit <em>Median In Feature Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Median In Feature Unit</em>'.
	 * @see eluvia.site.model.UncertainInput#getMedianInFeatureUnit()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_MedianInFeatureUnit();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getGeometricStandardDeviation <em>Geometric Standard Deviation</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Geometric Standard Deviation</em>'.
	 * @see eluvia.site.model.UncertainInput#getGeometricStandardDeviation()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_GeometricStandardDeviation();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getMinimumInFeatureUnit <em>Minimum In Feature Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Minimum In Feature Unit</em>'.
	 * @see eluvia.site.model.UncertainInput#getMinimumInFeatureUnit()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_MinimumInFeatureUnit();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getModeInFeatureUnit <em>Mode In Feature Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Mode In Feature Unit</em>'.
	 * @see eluvia.site.model.UncertainInput#getModeInFeatureUnit()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_ModeInFeatureUnit();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.UncertainInput#getMaximumInFeatureUnit <em>Maximum In Feature Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Maximum In Feature Unit</em>'.
	 * @see eluvia.site.model.UncertainInput#getMaximumInFeatureUnit()
	 * @see #getUncertainInput()
	 * @generated
	 */
	EAttribute getUncertainInput_MaximumInFeatureUnit();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.RankCorrelation <em>Rank Correlation</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Rank Correlation</em>'.
	 * @see eluvia.site.model.RankCorrelation
	 * @generated
	 */
	EClass getRankCorrelation();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.RankCorrelation#getFirst <em>First</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>First</em>'.
	 * @see eluvia.site.model.RankCorrelation#getFirst()
	 * @see #getRankCorrelation()
	 * @generated
	 */
	EReference getRankCorrelation_First();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.RankCorrelation#getSecond <em>Second</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Second</em>'.
	 * @see eluvia.site.model.RankCorrelation#getSecond()
	 * @see #getRankCorrelation()
	 * @generated
	 */
	EReference getRankCorrelation_Second();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.RankCorrelation#getCoefficient <em>Coefficient</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Coefficient</em>'.
	 * @see eluvia.site.model.RankCorrelation#getCoefficient()
	 * @see #getRankCorrelation()
	 * @generated
	 */
	EAttribute getRankCorrelation_Coefficient();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.ZoneAnalysisSettings <em>Zone Analysis Settings</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Zone Analysis Settings</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings
	 * @generated
	 */
	EClass getZoneAnalysisSettings();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getEstimator <em>Estimator</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Estimator</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getEstimator()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_Estimator();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getNonDetectRule <em>Non Detect Rule</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Non Detect Rule</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getNonDetectRule()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_NonDetectRule();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getInverseDistancePower <em>Inverse Distance Power</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Inverse Distance Power</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getInverseDistancePower()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_InverseDistancePower();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getMaximumNeighbours <em>Maximum Neighbours</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Maximum Neighbours</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getMaximumNeighbours()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_MaximumNeighbours();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getSearchRadiusMetres <em>Search Radius Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Search Radius Metres</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getSearchRadiusMetres()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_SearchRadiusMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getVerticalDistanceFactor <em>Vertical Distance Factor</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Vertical Distance Factor</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getVerticalDistanceFactor()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_VerticalDistanceFactor();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getBlockPlanSizeMetres <em>Block Plan Size Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Block Plan Size Metres</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getBlockPlanSizeMetres()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_BlockPlanSizeMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getBlockDepthMetres <em>Block Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Block Depth Metres</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getBlockDepthMetres()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_BlockDepthMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramModel <em>Variogram Model</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Variogram Model</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getVariogramModel()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_VariogramModel();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramNuggetMgPerKgSquared <em>Variogram Nugget Mg Per Kg Squared</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Variogram Nugget Mg Per Kg Squared</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getVariogramNuggetMgPerKgSquared()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_VariogramNuggetMgPerKgSquared();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramSillMgPerKgSquared <em>Variogram Sill Mg Per Kg Squared</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Variogram Sill Mg Per Kg Squared</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getVariogramSillMgPerKgSquared()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_VariogramSillMgPerKgSquared();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramRangeMetres <em>Variogram Range Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Variogram Range Metres</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getVariogramRangeMetres()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_VariogramRangeMetres();

	/**
	 * Returns the meta object for the attribute list '{@link eluvia.site.model.ZoneAnalysisSettings#getDelayYears <em>Delay Years</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Delay Years</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getDelayYears()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_DelayYears();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getTransverseDispersivityFraction <em>Transverse Dispersivity Fraction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Transverse Dispersivity Fraction</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getTransverseDispersivityFraction()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_TransverseDispersivityFraction();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.ZoneAnalysisSettings#getHotSpotMultiple <em>Hot Spot Multiple</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Hot Spot Multiple</em>'.
	 * @see eluvia.site.model.ZoneAnalysisSettings#getHotSpotMultiple()
	 * @see #getZoneAnalysisSettings()
	 * @generated
	 */
	EAttribute getZoneAnalysisSettings_HotSpotMultiple();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.ComplianceCriterion <em>Compliance Criterion</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Compliance Criterion</em>'.
	 * @see eluvia.site.model.ComplianceCriterion
	 * @generated
	 */
	EEnum getComplianceCriterion();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.UnitSystem <em>Unit System</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Unit System</em>'.
	 * @see eluvia.site.model.UnitSystem
	 * @generated
	 */
	EEnum getUnitSystem();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.DispersivityRule <em>Dispersivity Rule</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Dispersivity Rule</em>'.
	 * @see eluvia.site.model.DispersivityRule
	 * @generated
	 */
	EEnum getDispersivityRule();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.SorptionIsotherm <em>Sorption Isotherm</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Sorption Isotherm</em>'.
	 * @see eluvia.site.model.SorptionIsotherm
	 * @generated
	 */
	EEnum getSorptionIsotherm();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.NonequilibriumEntry <em>Nonequilibrium Entry</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Nonequilibrium Entry</em>'.
	 * @see eluvia.site.model.NonequilibriumEntry
	 * @generated
	 */
	EEnum getNonequilibriumEntry();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.ComplianceStatistic <em>Compliance Statistic</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Compliance Statistic</em>'.
	 * @see eluvia.site.model.ComplianceStatistic
	 * @generated
	 */
	EEnum getComplianceStatistic();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.SolutionMethod <em>Solution Method</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Solution Method</em>'.
	 * @see eluvia.site.model.SolutionMethod
	 * @generated
	 */
	EEnum getSolutionMethod();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.ExcavationSoilType <em>Excavation Soil Type</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Excavation Soil Type</em>'.
	 * @see eluvia.site.model.ExcavationSoilType
	 * @generated
	 */
	EEnum getExcavationSoilType();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.ColumnTestKind <em>Column Test Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Column Test Kind</em>'.
	 * @see eluvia.site.model.ColumnTestKind
	 * @generated
	 */
	EEnum getColumnTestKind();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.UncertaintySampling <em>Uncertainty Sampling</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Uncertainty Sampling</em>'.
	 * @see eluvia.site.model.UncertaintySampling
	 * @generated
	 */
	EEnum getUncertaintySampling();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.InputDistributionKind <em>Input Distribution Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Input Distribution Kind</em>'.
	 * @see eluvia.site.model.InputDistributionKind
	 * @generated
	 */
	EEnum getInputDistributionKind();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.ZoneEstimatorKind <em>Zone Estimator Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Zone Estimator Kind</em>'.
	 * @see eluvia.site.model.ZoneEstimatorKind
	 * @generated
	 */
	EEnum getZoneEstimatorKind();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.NonDetectValue <em>Non Detect Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Non Detect Value</em>'.
	 * @see eluvia.site.model.NonDetectValue
	 * @generated
	 */
	EEnum getNonDetectValue();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.VariogramShapeKind <em>Variogram Shape Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Variogram Shape Kind</em>'.
	 * @see eluvia.site.model.VariogramShapeKind
	 * @generated
	 */
	EEnum getVariogramShapeKind();

	/**
	 * Returns the factory that creates the instances of the model.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the factory that creates the instances of the model.
	 * @generated
	 */
	SiteFactory getSiteFactory();

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
	interface Literals {
		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.ProjectImpl <em>Project</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.ProjectImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getProject()
		 * @generated
		 */
		EClass PROJECT = eINSTANCE.getProject();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__NAME = eINSTANCE.getProject_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__DESCRIPTION = eINSTANCE.getProject_Description();

		/**
		 * The meta object literal for the '<em><b>Schema Version</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__SCHEMA_VERSION = eINSTANCE.getProject_SchemaVersion();

		/**
		 * The meta object literal for the '<em><b>Site</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__SITE = eINSTANCE.getProject_Site();

		/**
		 * The meta object literal for the '<em><b>Contaminants</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__CONTAMINANTS = eINSTANCE.getProject_Contaminants();

		/**
		 * The meta object literal for the '<em><b>Cleanup Levels</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__CLEANUP_LEVELS = eINSTANCE.getProject_CleanupLevels();

		/**
		 * The meta object literal for the '<em><b>Flushing Designs</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__FLUSHING_DESIGNS = eINSTANCE.getProject_FlushingDesigns();

		/**
		 * The meta object literal for the '<em><b>Unit System</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__UNIT_SYSTEM = eINSTANCE.getProject_UnitSystem();

		/**
		 * The meta object literal for the '<em><b>Revisions</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__REVISIONS = eINSTANCE.getProject_Revisions();

		/**
		 * The meta object literal for the '<em><b>Excavation Designs</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__EXCAVATION_DESIGNS = eINSTANCE.getProject_ExcavationDesigns();

		/**
		 * The meta object literal for the '<em><b>Price Books</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__PRICE_BOOKS = eINSTANCE.getProject_PriceBooks();

		/**
		 * The meta object literal for the '<em><b>Column Tests</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__COLUMN_TESTS = eINSTANCE.getProject_ColumnTests();

		/**
		 * The meta object literal for the '<em><b>Uncertainty</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__UNCERTAINTY = eINSTANCE.getProject_Uncertainty();

		/**
		 * The meta object literal for the '<em><b>Zone Analysis</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__ZONE_ANALYSIS = eINSTANCE.getProject_ZoneAnalysis();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.SiteImpl <em>Site</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.SiteImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getSite()
		 * @generated
		 */
		EClass SITE = eINSTANCE.getSite();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SITE__NAME = eINSTANCE.getSite_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SITE__DESCRIPTION = eINSTANCE.getSite_Description();

		/**
		 * The meta object literal for the '<em><b>Layers</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SITE__LAYERS = eINSTANCE.getSite_Layers();

		/**
		 * The meta object literal for the '<em><b>Zones</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SITE__ZONES = eINSTANCE.getSite_Zones();

		/**
		 * The meta object literal for the '<em><b>Coordinate Frame</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SITE__COORDINATE_FRAME = eINSTANCE.getSite_CoordinateFrame();

		/**
		 * The meta object literal for the '<em><b>Ground Surface Elevation Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SITE__GROUND_SURFACE_ELEVATION_METRES = eINSTANCE.getSite_GroundSurfaceElevationMetres();

		/**
		 * The meta object literal for the '<em><b>Boundary</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SITE__BOUNDARY = eINSTANCE.getSite_Boundary();

		/**
		 * The meta object literal for the '<em><b>Sampling Locations</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SITE__SAMPLING_LOCATIONS = eINSTANCE.getSite_SamplingLocations();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.SoilLayerImpl <em>Soil Layer</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.SoilLayerImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getSoilLayer()
		 * @generated
		 */
		EClass SOIL_LAYER = eINSTANCE.getSoilLayer();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__NAME = eINSTANCE.getSoilLayer_Name();

		/**
		 * The meta object literal for the '<em><b>Top Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__TOP_DEPTH_METRES = eINSTANCE.getSoilLayer_TopDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Bottom Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__BOTTOM_DEPTH_METRES = eINSTANCE.getSoilLayer_BottomDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Texture Class</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__TEXTURE_CLASS = eINSTANCE.getSoilLayer_TextureClass();

		/**
		 * The meta object literal for the '<em><b>Bulk Density Kg Per Cubic Metre</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE = eINSTANCE.getSoilLayer_BulkDensityKgPerCubicMetre();

		/**
		 * The meta object literal for the '<em><b>Porosity</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__POROSITY = eINSTANCE.getSoilLayer_Porosity();

		/**
		 * The meta object literal for the '<em><b>Water Content</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__WATER_CONTENT = eINSTANCE.getSoilLayer_WaterContent();

		/**
		 * The meta object literal for the '<em><b>Organic Carbon Fraction</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__ORGANIC_CARBON_FRACTION = eINSTANCE.getSoilLayer_OrganicCarbonFraction();

		/**
		 * The meta object literal for the '<em><b>Saturated Conductivity Metres Per Day</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY = eINSTANCE.getSoilLayer_SaturatedConductivityMetresPerDay();

		/**
		 * The meta object literal for the '<em><b>Dispersivity Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__DISPERSIVITY_METRES = eINSTANCE.getSoilLayer_DispersivityMetres();

		/**
		 * The meta object literal for the '<em><b>Swell Factor</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__SWELL_FACTOR = eINSTANCE.getSoilLayer_SwellFactor();

		/**
		 * The meta object literal for the '<em><b>Shrinkage Factor</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__SHRINKAGE_FACTOR = eINSTANCE.getSoilLayer_ShrinkageFactor();

		/**
		 * The meta object literal for the '<em><b>Dispersivity Rule</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__DISPERSIVITY_RULE = eINSTANCE.getSoilLayer_DispersivityRule();

		/**
		 * The meta object literal for the '<em><b>Dispersivity Scale Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__DISPERSIVITY_SCALE_METRES = eINSTANCE.getSoilLayer_DispersivityScaleMetres();

		/**
		 * The meta object literal for the '<em><b>Effective Dispersivity Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__EFFECTIVE_DISPERSIVITY_METRES = eINSTANCE.getSoilLayer_EffectiveDispersivityMetres();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.ContaminantImpl <em>Contaminant</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.ContaminantImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getContaminant()
		 * @generated
		 */
		EClass CONTAMINANT = eINSTANCE.getContaminant();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__NAME = eINSTANCE.getContaminant_Name();

		/**
		 * The meta object literal for the '<em><b>Cas Number</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__CAS_NUMBER = eINSTANCE.getContaminant_CasNumber();

		/**
		 * The meta object literal for the '<em><b>Koc Litres Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__KOC_LITRES_PER_KG = eINSTANCE.getContaminant_KocLitresPerKg();

		/**
		 * The meta object literal for the '<em><b>Kd Entered</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__KD_ENTERED = eINSTANCE.getContaminant_KdEntered();

		/**
		 * The meta object literal for the '<em><b>Kd Litres Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__KD_LITRES_PER_KG = eINSTANCE.getContaminant_KdLitresPerKg();

		/**
		 * The meta object literal for the '<em><b>Diffusion Square Metres Per Second</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND = eINSTANCE.getContaminant_DiffusionSquareMetresPerSecond();

		/**
		 * The meta object literal for the '<em><b>Half Life Days</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__HALF_LIFE_DAYS = eINSTANCE.getContaminant_HalfLifeDays();

		/**
		 * The meta object literal for the '<em><b>Isotherm</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__ISOTHERM = eINSTANCE.getContaminant_Isotherm();

		/**
		 * The meta object literal for the '<em><b>Freundlich Kf Mg Per Kg Per Mg Per Litre To N</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N = eINSTANCE.getContaminant_FreundlichKfMgPerKgPerMgPerLitreToN();

		/**
		 * The meta object literal for the '<em><b>Freundlich Exponent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__FREUNDLICH_EXPONENT = eINSTANCE.getContaminant_FreundlichExponent();

		/**
		 * The meta object literal for the '<em><b>Langmuir Maximum Milligrams Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG = eINSTANCE.getContaminant_LangmuirMaximumMilligramsPerKg();

		/**
		 * The meta object literal for the '<em><b>Langmuir Constant Litres Per Milligram</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM = eINSTANCE.getContaminant_LangmuirConstantLitresPerMilligram();

		/**
		 * The meta object literal for the '<em><b>Water Solubility Milligrams Per Litre</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE = eINSTANCE.getContaminant_WaterSolubilityMilligramsPerLitre();

		/**
		 * The meta object literal for the '<em><b>Nonequilibrium</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__NONEQUILIBRIUM = eINSTANCE.getContaminant_Nonequilibrium();

		/**
		 * The meta object literal for the '<em><b>Beta</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__BETA = eINSTANCE.getContaminant_Beta();

		/**
		 * The meta object literal for the '<em><b>Omega</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__OMEGA = eINSTANCE.getContaminant_Omega();

		/**
		 * The meta object literal for the '<em><b>Mobile Water Fraction</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__MOBILE_WATER_FRACTION = eINSTANCE.getContaminant_MobileWaterFraction();

		/**
		 * The meta object literal for the '<em><b>Mobile Site Fraction</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__MOBILE_SITE_FRACTION = eINSTANCE.getContaminant_MobileSiteFraction();

		/**
		 * The meta object literal for the '<em><b>Mass Transfer Rate Per Day</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY = eINSTANCE.getContaminant_MassTransferRatePerDay();

		/**
		 * The meta object literal for the '<em><b>Property Source</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__PROPERTY_SOURCE = eINSTANCE.getContaminant_PropertySource();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.CleanupLevelImpl <em>Cleanup Level</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.CleanupLevelImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getCleanupLevel()
		 * @generated
		 */
		EClass CLEANUP_LEVEL = eINSTANCE.getCleanupLevel();

		/**
		 * The meta object literal for the '<em><b>Contaminant</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CLEANUP_LEVEL__CONTAMINANT = eINSTANCE.getCleanupLevel_Contaminant();

		/**
		 * The meta object literal for the '<em><b>Soil Level Milligrams Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG = eINSTANCE.getCleanupLevel_SoilLevelMilligramsPerKg();

		/**
		 * The meta object literal for the '<em><b>Basis</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLEANUP_LEVEL__BASIS = eINSTANCE.getCleanupLevel_Basis();

		/**
		 * The meta object literal for the '<em><b>Soil Level Entered</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLEANUP_LEVEL__SOIL_LEVEL_ENTERED = eINSTANCE.getCleanupLevel_SoilLevelEntered();

		/**
		 * The meta object literal for the '<em><b>Porewater Level Entered</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED = eINSTANCE.getCleanupLevel_PorewaterLevelEntered();

		/**
		 * The meta object literal for the '<em><b>Porewater Level Milligrams Per Litre</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE = eINSTANCE.getCleanupLevel_PorewaterLevelMilligramsPerLitre();

		/**
		 * The meta object literal for the '<em><b>Statistic</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLEANUP_LEVEL__STATISTIC = eINSTANCE.getCleanupLevel_Statistic();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.TreatmentZoneImpl <em>Treatment Zone</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.TreatmentZoneImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getTreatmentZone()
		 * @generated
		 */
		EClass TREATMENT_ZONE = eINSTANCE.getTreatmentZone();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__NAME = eINSTANCE.getTreatmentZone_Name();

		/**
		 * The meta object literal for the '<em><b>Area Square Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__AREA_SQUARE_METRES = eINSTANCE.getTreatmentZone_AreaSquareMetres();

		/**
		 * The meta object literal for the '<em><b>Top Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__TOP_DEPTH_METRES = eINSTANCE.getTreatmentZone_TopDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Bottom Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__BOTTOM_DEPTH_METRES = eINSTANCE.getTreatmentZone_BottomDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Source Concentrations</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference TREATMENT_ZONE__SOURCE_CONCENTRATIONS = eINSTANCE.getTreatmentZone_SourceConcentrations();

		/**
		 * The meta object literal for the '<em><b>Footprint</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference TREATMENT_ZONE__FOOTPRINT = eINSTANCE.getTreatmentZone_Footprint();

		/**
		 * The meta object literal for the '<em><b>Effective Area Square Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__EFFECTIVE_AREA_SQUARE_METRES = eINSTANCE.getTreatmentZone_EffectiveAreaSquareMetres();

		/**
		 * The meta object literal for the '<em><b>Volume Cubic Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__VOLUME_CUBIC_METRES = eINSTANCE.getTreatmentZone_VolumeCubicMetres();

		/**
		 * The meta object literal for the '<em><b>Pore Volume Cubic Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__PORE_VOLUME_CUBIC_METRES = eINSTANCE.getTreatmentZone_PoreVolumeCubicMetres();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.SourceConcentrationImpl <em>Source Concentration</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.SourceConcentrationImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getSourceConcentration()
		 * @generated
		 */
		EClass SOURCE_CONCENTRATION = eINSTANCE.getSourceConcentration();

		/**
		 * The meta object literal for the '<em><b>Contaminant</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SOURCE_CONCENTRATION__CONTAMINANT = eINSTANCE.getSourceConcentration_Contaminant();

		/**
		 * The meta object literal for the '<em><b>Soil Concentration Milligrams Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG = eINSTANCE.getSourceConcentration_SoilConcentrationMilligramsPerKg();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.FlushingDesignImpl <em>Flushing Design</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.FlushingDesignImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getFlushingDesign()
		 * @generated
		 */
		EClass FLUSHING_DESIGN = eINSTANCE.getFlushingDesign();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__NAME = eINSTANCE.getFlushingDesign_Name();

		/**
		 * The meta object literal for the '<em><b>Zone</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference FLUSHING_DESIGN__ZONE = eINSTANCE.getFlushingDesign_Zone();

		/**
		 * The meta object literal for the '<em><b>Darcy Flux Metres Per Day</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY = eINSTANCE.getFlushingDesign_DarcyFluxMetresPerDay();

		/**
		 * The meta object literal for the '<em><b>Operating Days Per Week</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK = eINSTANCE.getFlushingDesign_OperatingDaysPerWeek();

		/**
		 * The meta object literal for the '<em><b>Capture Efficiency</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__CAPTURE_EFFICIENCY = eINSTANCE.getFlushingDesign_CaptureEfficiency();

		/**
		 * The meta object literal for the '<em><b>Criterion</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__CRITERION = eINSTANCE.getFlushingDesign_Criterion();

		/**
		 * The meta object literal for the '<em><b>Max Pore Volumes</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__MAX_PORE_VOLUMES = eINSTANCE.getFlushingDesign_MaxPoreVolumes();

		/**
		 * The meta object literal for the '<em><b>Solution Method</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__SOLUTION_METHOD = eINSTANCE.getFlushingDesign_SolutionMethod();

		/**
		 * The meta object literal for the '<em><b>Numerical Cell Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__NUMERICAL_CELL_COUNT = eINSTANCE.getFlushingDesign_NumericalCellCount();

		/**
		 * The meta object literal for the '<em><b>Numerical Relative Tolerance</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE = eINSTANCE.getFlushingDesign_NumericalRelativeTolerance();

		/**
		 * The meta object literal for the '<em><b>Monitoring Interval Days</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS = eINSTANCE.getFlushingDesign_MonitoringIntervalDays();

		/**
		 * The meta object literal for the '<em><b>Amendment Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__AMENDMENT_NAME = eINSTANCE.getFlushingDesign_AmendmentName();

		/**
		 * The meta object literal for the '<em><b>Amendment Dose Kilograms Per Cubic Metre</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE = eINSTANCE.getFlushingDesign_AmendmentDoseKilogramsPerCubicMetre();

		/**
		 * The meta object literal for the '<em><b>Price Book</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference FLUSHING_DESIGN__PRICE_BOOK = eINSTANCE.getFlushingDesign_PriceBook();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.RevisionImpl <em>Revision</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.RevisionImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getRevision()
		 * @generated
		 */
		EClass REVISION = eINSTANCE.getRevision();

		/**
		 * The meta object literal for the '<em><b>Author</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REVISION__AUTHOR = eINSTANCE.getRevision_Author();

		/**
		 * The meta object literal for the '<em><b>Timestamp</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REVISION__TIMESTAMP = eINSTANCE.getRevision_Timestamp();

		/**
		 * The meta object literal for the '<em><b>Summary</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REVISION__SUMMARY = eINSTANCE.getRevision_Summary();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.VertexImpl <em>Vertex</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.VertexImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getVertex()
		 * @generated
		 */
		EClass VERTEX = eINSTANCE.getVertex();

		/**
		 * The meta object literal for the '<em><b>Easting Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VERTEX__EASTING_METRES = eINSTANCE.getVertex_EastingMetres();

		/**
		 * The meta object literal for the '<em><b>Northing Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VERTEX__NORTHING_METRES = eINSTANCE.getVertex_NorthingMetres();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.SamplingLocationImpl <em>Sampling Location</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.SamplingLocationImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getSamplingLocation()
		 * @generated
		 */
		EClass SAMPLING_LOCATION = eINSTANCE.getSamplingLocation();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SAMPLING_LOCATION__NAME = eINSTANCE.getSamplingLocation_Name();

		/**
		 * The meta object literal for the '<em><b>Easting Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SAMPLING_LOCATION__EASTING_METRES = eINSTANCE.getSamplingLocation_EastingMetres();

		/**
		 * The meta object literal for the '<em><b>Northing Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SAMPLING_LOCATION__NORTHING_METRES = eINSTANCE.getSamplingLocation_NorthingMetres();

		/**
		 * The meta object literal for the '<em><b>Ground Elevation Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SAMPLING_LOCATION__GROUND_ELEVATION_METRES = eINSTANCE.getSamplingLocation_GroundElevationMetres();

		/**
		 * The meta object literal for the '<em><b>Samples</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SAMPLING_LOCATION__SAMPLES = eINSTANCE.getSamplingLocation_Samples();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.SampleImpl <em>Sample</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.SampleImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getSample()
		 * @generated
		 */
		EClass SAMPLE = eINSTANCE.getSample();

		/**
		 * The meta object literal for the '<em><b>Top Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SAMPLE__TOP_DEPTH_METRES = eINSTANCE.getSample_TopDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Bottom Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SAMPLE__BOTTOM_DEPTH_METRES = eINSTANCE.getSample_BottomDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Contaminant</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SAMPLE__CONTAMINANT = eINSTANCE.getSample_Contaminant();

		/**
		 * The meta object literal for the '<em><b>Concentration Milligrams Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SAMPLE__CONCENTRATION_MILLIGRAMS_PER_KG = eINSTANCE.getSample_ConcentrationMilligramsPerKg();

		/**
		 * The meta object literal for the '<em><b>Non Detect</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SAMPLE__NON_DETECT = eINSTANCE.getSample_NonDetect();

		/**
		 * The meta object literal for the '<em><b>Detection Limit Milligrams Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SAMPLE__DETECTION_LIMIT_MILLIGRAMS_PER_KG = eINSTANCE.getSample_DetectionLimitMilligramsPerKg();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.ExcavationDesignImpl <em>Excavation Design</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.ExcavationDesignImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getExcavationDesign()
		 * @generated
		 */
		EClass EXCAVATION_DESIGN = eINSTANCE.getExcavationDesign();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXCAVATION_DESIGN__NAME = eINSTANCE.getExcavationDesign_Name();

		/**
		 * The meta object literal for the '<em><b>Zone</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference EXCAVATION_DESIGN__ZONE = eINSTANCE.getExcavationDesign_Zone();

		/**
		 * The meta object literal for the '<em><b>Soil Type</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXCAVATION_DESIGN__SOIL_TYPE = eINSTANCE.getExcavationDesign_SoilType();

		/**
		 * The meta object literal for the '<em><b>Side Slope Horizontal Per Vertical</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL = eINSTANCE.getExcavationDesign_SideSlopeHorizontalPerVertical();

		/**
		 * The meta object literal for the '<em><b>Overdig Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXCAVATION_DESIGN__OVERDIG_METRES = eINSTANCE.getExcavationDesign_OverdigMetres();

		/**
		 * The meta object literal for the '<em><b>Truck Heaped Capacity Cubic Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES = eINSTANCE.getExcavationDesign_TruckHeapedCapacityCubicMetres();

		/**
		 * The meta object literal for the '<em><b>Truck Payload Kilograms</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS = eINSTANCE.getExcavationDesign_TruckPayloadKilograms();

		/**
		 * The meta object literal for the '<em><b>Price Book</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference EXCAVATION_DESIGN__PRICE_BOOK = eINSTANCE.getExcavationDesign_PriceBook();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.PriceBookImpl <em>Price Book</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.PriceBookImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getPriceBook()
		 * @generated
		 */
		EClass PRICE_BOOK = eINSTANCE.getPriceBook();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__NAME = eINSTANCE.getPriceBook_Name();

		/**
		 * The meta object literal for the '<em><b>Currency</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__CURRENCY = eINSTANCE.getPriceBook_Currency();

		/**
		 * The meta object literal for the '<em><b>Reference</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__REFERENCE = eINSTANCE.getPriceBook_Reference();

		/**
		 * The meta object literal for the '<em><b>Items</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PRICE_BOOK__ITEMS = eINSTANCE.getPriceBook_Items();

		/**
		 * The meta object literal for the '<em><b>Scope Contingency Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT = eINSTANCE.getPriceBook_ScopeContingencyPercent();

		/**
		 * The meta object literal for the '<em><b>Bid Contingency Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__BID_CONTINGENCY_PERCENT = eINSTANCE.getPriceBook_BidContingencyPercent();

		/**
		 * The meta object literal for the '<em><b>Project Management Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT = eINSTANCE.getPriceBook_ProjectManagementPercent();

		/**
		 * The meta object literal for the '<em><b>Remedial Design Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__REMEDIAL_DESIGN_PERCENT = eINSTANCE.getPriceBook_RemedialDesignPercent();

		/**
		 * The meta object literal for the '<em><b>Construction Management Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT = eINSTANCE.getPriceBook_ConstructionManagementPercent();

		/**
		 * The meta object literal for the '<em><b>Operating Contingency Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT = eINSTANCE.getPriceBook_OperatingContingencyPercent();

		/**
		 * The meta object literal for the '<em><b>Operating Project Management Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT = eINSTANCE.getPriceBook_OperatingProjectManagementPercent();

		/**
		 * The meta object literal for the '<em><b>Technical Support Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT = eINSTANCE.getPriceBook_TechnicalSupportPercent();

		/**
		 * The meta object literal for the '<em><b>Discount Rate Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__DISCOUNT_RATE_PERCENT = eINSTANCE.getPriceBook_DiscountRatePercent();

		/**
		 * The meta object literal for the '<em><b>Discount Rate Basis</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_BOOK__DISCOUNT_RATE_BASIS = eINSTANCE.getPriceBook_DiscountRateBasis();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.PriceItemImpl <em>Price Item</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.PriceItemImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getPriceItem()
		 * @generated
		 */
		EClass PRICE_ITEM = eINSTANCE.getPriceItem();

		/**
		 * The meta object literal for the '<em><b>Code</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_ITEM__CODE = eINSTANCE.getPriceItem_Code();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_ITEM__NAME = eINSTANCE.getPriceItem_Name();

		/**
		 * The meta object literal for the '<em><b>Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_ITEM__UNIT = eINSTANCE.getPriceItem_Unit();

		/**
		 * The meta object literal for the '<em><b>Rate Per Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_ITEM__RATE_PER_UNIT = eINSTANCE.getPriceItem_RatePerUnit();

		/**
		 * The meta object literal for the '<em><b>Currency</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_ITEM__CURRENCY = eINSTANCE.getPriceItem_Currency();

		/**
		 * The meta object literal for the '<em><b>Source Note</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PRICE_ITEM__SOURCE_NOTE = eINSTANCE.getPriceItem_SourceNote();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.ColumnTestImpl <em>Column Test</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.ColumnTestImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getColumnTest()
		 * @generated
		 */
		EClass COLUMN_TEST = eINSTANCE.getColumnTest();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute COLUMN_TEST__NAME = eINSTANCE.getColumnTest_Name();

		/**
		 * The meta object literal for the '<em><b>Contaminant</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference COLUMN_TEST__CONTAMINANT = eINSTANCE.getColumnTest_Contaminant();

		/**
		 * The meta object literal for the '<em><b>Layer</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference COLUMN_TEST__LAYER = eINSTANCE.getColumnTest_Layer();

		/**
		 * The meta object literal for the '<em><b>Kind</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute COLUMN_TEST__KIND = eINSTANCE.getColumnTest_Kind();

		/**
		 * The meta object literal for the '<em><b>Column Length Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute COLUMN_TEST__COLUMN_LENGTH_METRES = eINSTANCE.getColumnTest_ColumnLengthMetres();

		/**
		 * The meta object literal for the '<em><b>Darcy Flux Metres Per Day</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute COLUMN_TEST__DARCY_FLUX_METRES_PER_DAY = eINSTANCE.getColumnTest_DarcyFluxMetresPerDay();

		/**
		 * The meta object literal for the '<em><b>Water Content</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute COLUMN_TEST__WATER_CONTENT = eINSTANCE.getColumnTest_WaterContent();

		/**
		 * The meta object literal for the '<em><b>Bulk Density Kg Per Cubic Metre</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute COLUMN_TEST__BULK_DENSITY_KG_PER_CUBIC_METRE = eINSTANCE.getColumnTest_BulkDensityKgPerCubicMetre();

		/**
		 * The meta object literal for the '<em><b>Reference Concentration Milligrams Per Litre</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute COLUMN_TEST__REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE = eINSTANCE.getColumnTest_ReferenceConcentrationMilligramsPerLitre();

		/**
		 * The meta object literal for the '<em><b>Points</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference COLUMN_TEST__POINTS = eINSTANCE.getColumnTest_Points();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.ColumnTestPointImpl <em>Column Test Point</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.ColumnTestPointImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getColumnTestPoint()
		 * @generated
		 */
		EClass COLUMN_TEST_POINT = eINSTANCE.getColumnTestPoint();

		/**
		 * The meta object literal for the '<em><b>Pore Volumes</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute COLUMN_TEST_POINT__PORE_VOLUMES = eINSTANCE.getColumnTestPoint_PoreVolumes();

		/**
		 * The meta object literal for the '<em><b>Relative Concentration</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute COLUMN_TEST_POINT__RELATIVE_CONCENTRATION = eINSTANCE.getColumnTestPoint_RelativeConcentration();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.UncertaintySettingsImpl <em>Uncertainty Settings</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.UncertaintySettingsImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getUncertaintySettings()
		 * @generated
		 */
		EClass UNCERTAINTY_SETTINGS = eINSTANCE.getUncertaintySettings();

		/**
		 * The meta object literal for the '<em><b>Enabled</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAINTY_SETTINGS__ENABLED = eINSTANCE.getUncertaintySettings_Enabled();

		/**
		 * The meta object literal for the '<em><b>Run Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAINTY_SETTINGS__RUN_COUNT = eINSTANCE.getUncertaintySettings_RunCount();

		/**
		 * The meta object literal for the '<em><b>Seed</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAINTY_SETTINGS__SEED = eINSTANCE.getUncertaintySettings_Seed();

		/**
		 * The meta object literal for the '<em><b>Sampling Method</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAINTY_SETTINGS__SAMPLING_METHOD = eINSTANCE.getUncertaintySettings_SamplingMethod();

		/**
		 * The meta object literal for the '<em><b>Inputs</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference UNCERTAINTY_SETTINGS__INPUTS = eINSTANCE.getUncertaintySettings_Inputs();

		/**
		 * The meta object literal for the '<em><b>Rank Correlations</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference UNCERTAINTY_SETTINGS__RANK_CORRELATIONS = eINSTANCE.getUncertaintySettings_RankCorrelations();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.UncertainInputImpl <em>Uncertain Input</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.UncertainInputImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getUncertainInput()
		 * @generated
		 */
		EClass UNCERTAIN_INPUT = eINSTANCE.getUncertainInput();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__NAME = eINSTANCE.getUncertainInput_Name();

		/**
		 * The meta object literal for the '<em><b>Target</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference UNCERTAIN_INPUT__TARGET = eINSTANCE.getUncertainInput_Target();

		/**
		 * The meta object literal for the '<em><b>Feature Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__FEATURE_NAME = eINSTANCE.getUncertainInput_FeatureName();

		/**
		 * The meta object literal for the '<em><b>Distribution</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__DISTRIBUTION = eINSTANCE.getUncertainInput_Distribution();

		/**
		 * The meta object literal for the '<em><b>Mean In Feature Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT = eINSTANCE.getUncertainInput_MeanInFeatureUnit();

		/**
		 * The meta object literal for the '<em><b>Standard Deviation In Feature Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT = eINSTANCE.getUncertainInput_StandardDeviationInFeatureUnit();

		/**
		 * The meta object literal for the '<em><b>Median In Feature Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT = eINSTANCE.getUncertainInput_MedianInFeatureUnit();

		/**
		 * The meta object literal for the '<em><b>Geometric Standard Deviation</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION = eINSTANCE.getUncertainInput_GeometricStandardDeviation();

		/**
		 * The meta object literal for the '<em><b>Minimum In Feature Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT = eINSTANCE.getUncertainInput_MinimumInFeatureUnit();

		/**
		 * The meta object literal for the '<em><b>Mode In Feature Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT = eINSTANCE.getUncertainInput_ModeInFeatureUnit();

		/**
		 * The meta object literal for the '<em><b>Maximum In Feature Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT = eINSTANCE.getUncertainInput_MaximumInFeatureUnit();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.RankCorrelationImpl <em>Rank Correlation</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.RankCorrelationImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getRankCorrelation()
		 * @generated
		 */
		EClass RANK_CORRELATION = eINSTANCE.getRankCorrelation();

		/**
		 * The meta object literal for the '<em><b>First</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference RANK_CORRELATION__FIRST = eINSTANCE.getRankCorrelation_First();

		/**
		 * The meta object literal for the '<em><b>Second</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference RANK_CORRELATION__SECOND = eINSTANCE.getRankCorrelation_Second();

		/**
		 * The meta object literal for the '<em><b>Coefficient</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RANK_CORRELATION__COEFFICIENT = eINSTANCE.getRankCorrelation_Coefficient();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl <em>Zone Analysis Settings</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.ZoneAnalysisSettingsImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getZoneAnalysisSettings()
		 * @generated
		 */
		EClass ZONE_ANALYSIS_SETTINGS = eINSTANCE.getZoneAnalysisSettings();

		/**
		 * The meta object literal for the '<em><b>Estimator</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__ESTIMATOR = eINSTANCE.getZoneAnalysisSettings_Estimator();

		/**
		 * The meta object literal for the '<em><b>Non Detect Rule</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE = eINSTANCE.getZoneAnalysisSettings_NonDetectRule();

		/**
		 * The meta object literal for the '<em><b>Inverse Distance Power</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER = eINSTANCE.getZoneAnalysisSettings_InverseDistancePower();

		/**
		 * The meta object literal for the '<em><b>Maximum Neighbours</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS = eINSTANCE.getZoneAnalysisSettings_MaximumNeighbours();

		/**
		 * The meta object literal for the '<em><b>Search Radius Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES = eINSTANCE.getZoneAnalysisSettings_SearchRadiusMetres();

		/**
		 * The meta object literal for the '<em><b>Vertical Distance Factor</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR = eINSTANCE.getZoneAnalysisSettings_VerticalDistanceFactor();

		/**
		 * The meta object literal for the '<em><b>Block Plan Size Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES = eINSTANCE.getZoneAnalysisSettings_BlockPlanSizeMetres();

		/**
		 * The meta object literal for the '<em><b>Block Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES = eINSTANCE.getZoneAnalysisSettings_BlockDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Variogram Model</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL = eINSTANCE.getZoneAnalysisSettings_VariogramModel();

		/**
		 * The meta object literal for the '<em><b>Variogram Nugget Mg Per Kg Squared</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED = eINSTANCE.getZoneAnalysisSettings_VariogramNuggetMgPerKgSquared();

		/**
		 * The meta object literal for the '<em><b>Variogram Sill Mg Per Kg Squared</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED = eINSTANCE.getZoneAnalysisSettings_VariogramSillMgPerKgSquared();

		/**
		 * The meta object literal for the '<em><b>Variogram Range Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES = eINSTANCE.getZoneAnalysisSettings_VariogramRangeMetres();

		/**
		 * The meta object literal for the '<em><b>Delay Years</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__DELAY_YEARS = eINSTANCE.getZoneAnalysisSettings_DelayYears();

		/**
		 * The meta object literal for the '<em><b>Transverse Dispersivity Fraction</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION = eINSTANCE.getZoneAnalysisSettings_TransverseDispersivityFraction();

		/**
		 * The meta object literal for the '<em><b>Hot Spot Multiple</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE = eINSTANCE.getZoneAnalysisSettings_HotSpotMultiple();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.ComplianceCriterion <em>Compliance Criterion</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.ComplianceCriterion
		 * @see eluvia.site.model.impl.SitePackageImpl#getComplianceCriterion()
		 * @generated
		 */
		EEnum COMPLIANCE_CRITERION = eINSTANCE.getComplianceCriterion();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.UnitSystem <em>Unit System</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.UnitSystem
		 * @see eluvia.site.model.impl.SitePackageImpl#getUnitSystem()
		 * @generated
		 */
		EEnum UNIT_SYSTEM = eINSTANCE.getUnitSystem();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.DispersivityRule <em>Dispersivity Rule</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.DispersivityRule
		 * @see eluvia.site.model.impl.SitePackageImpl#getDispersivityRule()
		 * @generated
		 */
		EEnum DISPERSIVITY_RULE = eINSTANCE.getDispersivityRule();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.SorptionIsotherm <em>Sorption Isotherm</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.SorptionIsotherm
		 * @see eluvia.site.model.impl.SitePackageImpl#getSorptionIsotherm()
		 * @generated
		 */
		EEnum SORPTION_ISOTHERM = eINSTANCE.getSorptionIsotherm();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.NonequilibriumEntry <em>Nonequilibrium Entry</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.NonequilibriumEntry
		 * @see eluvia.site.model.impl.SitePackageImpl#getNonequilibriumEntry()
		 * @generated
		 */
		EEnum NONEQUILIBRIUM_ENTRY = eINSTANCE.getNonequilibriumEntry();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.ComplianceStatistic <em>Compliance Statistic</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.ComplianceStatistic
		 * @see eluvia.site.model.impl.SitePackageImpl#getComplianceStatistic()
		 * @generated
		 */
		EEnum COMPLIANCE_STATISTIC = eINSTANCE.getComplianceStatistic();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.SolutionMethod <em>Solution Method</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.SolutionMethod
		 * @see eluvia.site.model.impl.SitePackageImpl#getSolutionMethod()
		 * @generated
		 */
		EEnum SOLUTION_METHOD = eINSTANCE.getSolutionMethod();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.ExcavationSoilType <em>Excavation Soil Type</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.ExcavationSoilType
		 * @see eluvia.site.model.impl.SitePackageImpl#getExcavationSoilType()
		 * @generated
		 */
		EEnum EXCAVATION_SOIL_TYPE = eINSTANCE.getExcavationSoilType();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.ColumnTestKind <em>Column Test Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.ColumnTestKind
		 * @see eluvia.site.model.impl.SitePackageImpl#getColumnTestKind()
		 * @generated
		 */
		EEnum COLUMN_TEST_KIND = eINSTANCE.getColumnTestKind();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.UncertaintySampling <em>Uncertainty Sampling</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.UncertaintySampling
		 * @see eluvia.site.model.impl.SitePackageImpl#getUncertaintySampling()
		 * @generated
		 */
		EEnum UNCERTAINTY_SAMPLING = eINSTANCE.getUncertaintySampling();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.InputDistributionKind <em>Input Distribution Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.InputDistributionKind
		 * @see eluvia.site.model.impl.SitePackageImpl#getInputDistributionKind()
		 * @generated
		 */
		EEnum INPUT_DISTRIBUTION_KIND = eINSTANCE.getInputDistributionKind();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.ZoneEstimatorKind <em>Zone Estimator Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.ZoneEstimatorKind
		 * @see eluvia.site.model.impl.SitePackageImpl#getZoneEstimatorKind()
		 * @generated
		 */
		EEnum ZONE_ESTIMATOR_KIND = eINSTANCE.getZoneEstimatorKind();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.NonDetectValue <em>Non Detect Value</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.NonDetectValue
		 * @see eluvia.site.model.impl.SitePackageImpl#getNonDetectValue()
		 * @generated
		 */
		EEnum NON_DETECT_VALUE = eINSTANCE.getNonDetectValue();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.VariogramShapeKind <em>Variogram Shape Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.VariogramShapeKind
		 * @see eluvia.site.model.impl.SitePackageImpl#getVariogramShapeKind()
		 * @generated
		 */
		EEnum VARIOGRAM_SHAPE_KIND = eINSTANCE.getVariogramShapeKind();

	}

} //SitePackage
