/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Compliance Statistic</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The statistic of sample results held to a cleanup level.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getComplianceStatistic()
 * @model
 * @generated
 */
public enum ComplianceStatistic implements Enumerator {
	/**
	 * The '<em><b>NOT TO EXCEED</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Every sample at or below the level.
	 * <!-- end-model-doc -->
	 * @see #NOT_TO_EXCEED_VALUE
	 * @generated
	 * @ordered
	 */
	NOT_TO_EXCEED(0, "NOT_TO_EXCEED", "NOT_TO_EXCEED"),

	/**
	 * The '<em><b>MEAN</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The mean of the samples at or below the level.
	 * <!-- end-model-doc -->
	 * @see #MEAN_VALUE
	 * @generated
	 * @ordered
	 */
	MEAN(1, "MEAN", "MEAN"),

	/**
	 * The '<em><b>UPPER CONFIDENCE LIMIT 95</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The 95 % upper confidence limit of the mean at or below the level.
	 * <!-- end-model-doc -->
	 * @see #UPPER_CONFIDENCE_LIMIT_95_VALUE
	 * @generated
	 * @ordered
	 */
	UPPER_CONFIDENCE_LIMIT_95(2, "UPPER_CONFIDENCE_LIMIT_95", "UPPER_CONFIDENCE_LIMIT_95");

	/**
	 * The '<em><b>NOT TO EXCEED</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Every sample at or below the level.
	 * <!-- end-model-doc -->
	 * @see #NOT_TO_EXCEED
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int NOT_TO_EXCEED_VALUE = 0;

	/**
	 * The '<em><b>MEAN</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The mean of the samples at or below the level.
	 * <!-- end-model-doc -->
	 * @see #MEAN
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int MEAN_VALUE = 1;

	/**
	 * The '<em><b>UPPER CONFIDENCE LIMIT 95</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The 95 % upper confidence limit of the mean at or below the level.
	 * <!-- end-model-doc -->
	 * @see #UPPER_CONFIDENCE_LIMIT_95
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int UPPER_CONFIDENCE_LIMIT_95_VALUE = 2;

	/**
	 * An array of all the '<em><b>Compliance Statistic</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final ComplianceStatistic[] VALUES_ARRAY =
		new ComplianceStatistic[] {
			NOT_TO_EXCEED,
			MEAN,
			UPPER_CONFIDENCE_LIMIT_95,
		};

	/**
	 * A public read-only list of all the '<em><b>Compliance Statistic</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<ComplianceStatistic> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Compliance Statistic</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ComplianceStatistic get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ComplianceStatistic result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Compliance Statistic</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ComplianceStatistic getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ComplianceStatistic result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Compliance Statistic</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ComplianceStatistic get(int value) {
		switch (value) {
			case NOT_TO_EXCEED_VALUE: return NOT_TO_EXCEED;
			case MEAN_VALUE: return MEAN;
			case UPPER_CONFIDENCE_LIMIT_95_VALUE: return UPPER_CONFIDENCE_LIMIT_95;
		}
		return null;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final int value;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String name;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String literal;

	/**
	 * Only this class can construct instances.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private ComplianceStatistic(int value, String name, String literal) {
		this.value = value;
		this.name = name;
		this.literal = literal;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getValue() {
	  return value;
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
	public String getLiteral() {
	  return literal;
	}

	/**
	 * Returns the literal value of the enumerator, which is its string representation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		return literal;
	}
	
} //ComplianceStatistic
