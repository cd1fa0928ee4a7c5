import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A tenant: a laboratory, a design office or a client company. */
@Entity({ name: 'organisations' })
export class OrganisationEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('text')
  name!: string;

  /** Address and contact lines printed under the name on issued reports. */
  @Column('text', { name: 'report_address', default: '' })
  reportAddress!: string;

  /**
   * How the laboratory states the test method on its reports; null prints the default
   * statement (see reports/test-report/test-method.ts).
   */
  @Column('text', { name: 'test_method_statement', nullable: true })
  testMethodStatement!: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
