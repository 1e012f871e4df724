import { Column, Entity, PrimaryColumn } from 'typeorm'

/** Values the server generates once and keeps, such as the session secret. */
@Entity('app_setting')
export class AppSettingEntity {
  @PrimaryColumn({ type: 'text' })
  key!: string

  @Column({ type: 'text' })
  value!: string
}
